import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ComparisonInput, ComparisonView } from '@shared/schemas/comparisons';
import { api } from '@/lib/api-client';
import { comparisonKeys } from './keys';

/** Computes a comparison without saving it (a POST that changes nothing, so it is cached as a query). */
export const previewComparison = (input: ComparisonInput) =>
  api.post<ComparisonView>('/comparisons/preview', input);

export const previewQueryOptions = (input: ComparisonInput) =>
  queryOptions({
    queryKey: comparisonKeys.preview(input),
    queryFn: () => previewComparison(input),
    staleTime: 60_000,
  });

/** The live preview of the builder; the previous answer stays on screen while the next one runs. */
export function useComparisonPreview(input: ComparisonInput | null) {
  return useQuery({
    ...previewQueryOptions(input ?? emptyInput),
    enabled: input !== null,
    placeholderData: keepPreviousData,
  });
}

const emptyInput: ComparisonInput = {
  teamId: '',
  entries: [],
  referenceKey: '',
  includeUnapproved: false,
  globalFit: null,
};
