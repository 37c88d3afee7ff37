import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BufferSystemInput } from '@shared/chemistry';
import type { BufferDetail } from '@shared/schemas/buffers-types';
import { api } from '@/lib/api-client';
import { bufferKeys } from './keys';

/** The body is a whole buffer system; the server validates it with shared/chemistry's schema. */
export const createBuffer = (system: BufferSystemInput) => api.post<BufferDetail>('/buffers', system);

export function useCreateBuffer(options: { onSuccess?: (buffer: BufferDetail) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBuffer,
    onSuccess: async (buffer) => {
      await queryClient.invalidateQueries({ queryKey: bufferKeys.all });
      options.onSuccess?.(buffer);
    },
  });
}
