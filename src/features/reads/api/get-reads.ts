import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReadSummary } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { readKeys } from './keys';

/** The plate's reads, newest file first. */
export const getReads = (plateId: string, signal?: AbortSignal) =>
  api.get<ReadSummary[]>(`/plates/${encodeURIComponent(plateId)}/reads`, undefined, signal);

export const getReadsQueryOptions = (plateId: string) =>
  queryOptions({ queryKey: readKeys.list(plateId), queryFn: ({ signal }) => getReads(plateId, signal) });

export function useReads(plateId: string) {
  return useQuery(getReadsQueryOptions(plateId));
}
