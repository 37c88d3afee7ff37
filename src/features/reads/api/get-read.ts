import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReadData } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { readKeys } from './keys';

/** One read with every well's value (end point) or values (time course) and flags. */
export const getRead = (readId: string, signal?: AbortSignal) =>
  api.get<ReadData>(`/reads/${encodeURIComponent(readId)}`, undefined, signal);

export const getReadQueryOptions = (readId: string) =>
  queryOptions({
    queryKey: readKeys.detail(readId),
    queryFn: ({ signal }) => getRead(readId, signal),
    staleTime: Infinity,
  });

export function useRead(readId: string | null) {
  return useQuery({ ...getReadQueryOptions(readId ?? ''), enabled: Boolean(readId) });
}
