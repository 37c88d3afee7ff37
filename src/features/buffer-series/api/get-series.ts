import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SeriesDetail } from '@shared/schemas/buffer-series';
import { api } from '@/lib/api-client';
import { seriesKeys } from './keys';

export const getSeries = (id: string, signal?: AbortSignal) =>
  api.get<SeriesDetail>(`/buffer-series/${encodeURIComponent(id)}`, undefined, signal);

export const getSeriesQueryOptions = (id: string) =>
  queryOptions({ queryKey: seriesKeys.detail(id), queryFn: ({ signal }) => getSeries(id, signal) });

/** A saved series: its request, the stored design, version, and the studies that use it. */
export function useSeries(id: string | null | undefined) {
  return useQuery({ ...getSeriesQueryOptions(id ?? ''), enabled: Boolean(id) });
}
