import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BufferSystemInput } from '@shared/chemistry';
import type { BufferDetail } from '@shared/schemas/buffers-types';
import { request } from '@/lib/api-client';
import { bufferKeys } from './keys';

/** Replaces a lab system (PUT: the whole system, same id); built-in systems are refused. */
export const updateBuffer = (id: string, system: BufferSystemInput) =>
  request<BufferDetail>(`/buffers/${encodeURIComponent(id)}`, { method: 'PUT', body: system });

export function useUpdateBuffer(options: { onSuccess?: (buffer: BufferDetail) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, system }: { id: string; system: BufferSystemInput }) => updateBuffer(id, system),
    onSuccess: async (buffer) => {
      await queryClient.invalidateQueries({ queryKey: bufferKeys.all });
      options.onSuccess?.(buffer);
    },
  });
}
