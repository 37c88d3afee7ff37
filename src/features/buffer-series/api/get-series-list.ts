import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SeriesSummary } from '@shared/schemas/buffer-series';
import { api } from '@/lib/api-client';
import { seriesKeys } from './keys';

export const getSeriesList = (filters: { teamId?: string } = {}, signal?: AbortSignal) =>
  api.get<SeriesSummary[]>('/buffer-series', filters, signal);

export const getSeriesListQueryOptions = (filters: { teamId?: string } = {}) =>
  queryOptions({
    queryKey: seriesKeys.list(filters),
    queryFn: ({ signal }) => getSeriesList(filters, signal),
  });

/** Saved buffer series of the user's teams, most recently changed first. */
export function useSeriesList(filters: { teamId?: string } = {}, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getSeriesListQueryOptions(filters), enabled: options.enabled ?? true });
}
