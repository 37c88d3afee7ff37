import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlateSummary } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

/** Copies a plate's map into a new plate of this study or another study of the same team. */
export type PlateCopyInput = { plateId: string; name: string; studyId: string | null };

export const copyPlate = ({ plateId, ...input }: PlateCopyInput) =>
  api.post<PlateSummary>(`/plates/${encodeURIComponent(plateId)}/copy`, input);

export function useCopyPlate(options: { onSuccess?: (plate: PlateSummary) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: copyPlate,
    onSuccess: async (plate) => {
      await queryClient.invalidateQueries({ queryKey: [...plateKeys.all, 'list'] });
      options.onSuccess?.(plate);
    },
  });
}
