import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReadData } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { analysisKeys } from './keys';

/** One read with every well's time course; reads never change once imported. */
export const getReadTraces = (readId: string, signal?: AbortSignal) =>
  api.get<ReadData>(`/reads/${encodeURIComponent(readId)}`, undefined, signal);

export const getReadTracesQueryOptions = (readId: string) =>
  queryOptions({
    queryKey: analysisKeys.read(readId),
    queryFn: ({ signal }) => getReadTraces(readId, signal),
    staleTime: Infinity,
  });

export function useReadTraces(readId: string | null) {
  return useQuery({ ...getReadTracesQueryOptions(readId ?? ''), enabled: Boolean(readId) });
}
