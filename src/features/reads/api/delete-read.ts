import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { readKeys } from './keys';

/** Deletes one read; the raw file goes with the last read that came from it. */
export const deleteRead = (readId: string) => api.delete<void>(`/reads/${encodeURIComponent(readId)}`);

export function useDeleteRead(options: { onSuccess?: (readId: string) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteRead,
    onSuccess: async (_data, readId) => {
      queryClient.removeQueries({ queryKey: readKeys.detail(readId) });
      await queryClient.invalidateQueries({ queryKey: [...readKeys.all, 'list'] });
      options.onSuccess?.(readId);
    },
  });
}
