import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ComparisonView, SavedComparison } from '@shared/schemas/comparisons';
import { api } from '@/lib/api-client';
import { comparisonKeys } from './keys';

/** A saved comparison with its view, computed afresh from the stored fits. */
export type SavedComparisonDetail = SavedComparison & { view: ComparisonView };

export const getComparison = (id: string, signal?: AbortSignal) =>
  api.get<SavedComparisonDetail>(`/comparisons/${encodeURIComponent(id)}`, undefined, signal);

export const getComparisonQueryOptions = (id: string) =>
  queryOptions({
    queryKey: comparisonKeys.detail(id),
    queryFn: ({ signal }) => getComparison(id, signal),
  });

export function useComparison(id: string | null | undefined) {
  return useQuery({ ...getComparisonQueryOptions(id ?? ''), enabled: Boolean(id) });
}
