import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BufferSummary } from '@shared/schemas/buffers-types';
import { api } from '@/lib/api-client';
import { bufferKeys } from './keys';

export const getBuffers = (signal?: AbortSignal) => api.get<BufferSummary[]>('/buffers', undefined, signal);

export const getBuffersQueryOptions = () =>
  queryOptions({
    queryKey: bufferKeys.list(),
    queryFn: ({ signal }) => getBuffers(signal),
    staleTime: 5 * 60_000,
  });

/** Every buffer system, built-in and lab-added, ordered by their first pKa. */
export function useBuffers() {
  return useQuery(getBuffersQueryOptions());
}
