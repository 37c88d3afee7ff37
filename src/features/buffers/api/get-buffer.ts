import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BufferDetail } from '@shared/schemas/buffers-types';
import { api } from '@/lib/api-client';
import { bufferKeys } from './keys';

export const getBuffer = (id: string, signal?: AbortSignal) =>
  api.get<BufferDetail>(`/buffers/${encodeURIComponent(id)}`, undefined, signal);

export const getBufferQueryOptions = (id: string) =>
  queryOptions({
    queryKey: bufferKeys.detail(id),
    queryFn: ({ signal }) => getBuffer(id, signal),
    staleTime: 5 * 60_000,
  });

/** One buffer system with every value and its source. */
export function useBuffer(id: string | null | undefined) {
  return useQuery({ ...getBufferQueryOptions(id ?? ''), enabled: Boolean(id) });
}
