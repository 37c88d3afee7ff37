import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SavedComparison } from '@shared/schemas/comparisons';
import { api } from '@/lib/api-client';
import { comparisonKeys } from './keys';

/** A saved comparison as the list gives it: with the name of whoever saved it first. */
export type SavedComparisonItem = SavedComparison & { createdByName: string };

export const getComparisons = (teamId?: string, signal?: AbortSignal) =>
  api.get<SavedComparisonItem[]>('/comparisons', { teamId }, signal);

export const getComparisonsQueryOptions = (teamId?: string) =>
  queryOptions({
    queryKey: comparisonKeys.list(teamId),
    queryFn: ({ signal }) => getComparisons(teamId, signal),
  });

/** Saved comparisons of the user's teams, most recently changed first. */
export function useComparisons(teamId?: string) {
  return useQuery(getComparisonsQueryOptions(teamId));
}
