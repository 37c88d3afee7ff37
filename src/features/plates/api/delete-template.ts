import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlateTemplate } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export const deleteTemplate = (template: PlateTemplate) =>
  api.delete<void>(`/plate-templates/${encodeURIComponent(template.id)}`);

/** Deletes a team template; plates made from it keep their maps. */
export function useDeleteTemplate(options: { onSuccess?: (template: PlateTemplate) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteTemplate,
    onSuccess: async (_data, template) => {
      await queryClient.invalidateQueries({ queryKey: plateKeys.templates(template.teamId, template.format) });
      options.onSuccess?.(template);
    },
  });
}
