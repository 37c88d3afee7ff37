import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export const deletePlate = (plateId: string) => api.delete<void>(`/plates/${encodeURIComponent(plateId)}`);

export function useDeletePlate(options: { onSuccess?: (plateId: string) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePlate,
    onSuccess: async (_data, plateId) => {
      queryClient.removeQueries({ queryKey: plateKeys.detail(plateId) });
      await queryClient.invalidateQueries({ queryKey: [...plateKeys.all, 'list'] });
      options.onSuccess?.(plateId);
    },
  });
}
