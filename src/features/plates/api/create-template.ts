import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlateMap } from '@shared/plate-map/schema';
import type { PlateTemplate } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export type TemplateInput = { teamId: string; name: string; format: 96 | 384; map: PlateMap };

export const createTemplate = (input: TemplateInput) => api.post<PlateTemplate>('/plate-templates', input);

export function useCreateTemplate(options: { onSuccess?: (template: PlateTemplate) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTemplate,
    onSuccess: async (template) => {
      await queryClient.invalidateQueries({
        queryKey: plateKeys.templates(template.teamId, template.format),
      });
      options.onSuccess?.(template);
    },
  });
}
