import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { bufferKeys } from './keys';

export const deleteBuffer = (id: string) => api.delete<void>(`/buffers/${encodeURIComponent(id)}`);

export function useDeleteBuffer(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteBuffer,
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: bufferKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: bufferKeys.all });
      options.onSuccess?.();
    },
  });
}
