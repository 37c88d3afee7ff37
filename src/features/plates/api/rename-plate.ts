import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export type RenamePlateInput = { plateId: string; name: string };

export const renamePlate = ({ plateId, name }: RenamePlateInput) =>
  api.patch<{ id: string; name: string }>(`/plates/${encodeURIComponent(plateId)}`, { name });

/** Renames a plate; its list and its own page are read again. */
export function useRenamePlate(options: { onSuccess?: (input: RenamePlateInput) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: renamePlate,
    onSuccess: async (_data, input) => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: plateKeys.detail(input.plateId) }),
        queryClient.invalidateQueries({ queryKey: [...plateKeys.all, 'list'] }),
      ]);
      options.onSuccess?.(input);
    },
  });
}
