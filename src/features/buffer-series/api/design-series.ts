import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { DesignedSeries, SeriesRequest } from '@shared/schemas/buffer-series';
import { api } from '@/lib/api-client';
import { seriesKeys } from './keys';

/** Designing computes and stores nothing (POST only because the request is a body). */
export const designSeries = (request: SeriesRequest) =>
  api.post<DesignedSeries>('/buffer-series/design', request);

export const designSeriesQueryOptions = (request: SeriesRequest) =>
  queryOptions({
    queryKey: seriesKeys.design(request),
    queryFn: () => designSeries(request),
    staleTime: Infinity,
  });

/** The designer's proposal for a request; null asks for nothing (the inputs are not valid yet). */
export function useSeriesDesign(request: SeriesRequest | null) {
  return useQuery({
    ...designSeriesQueryOptions(request ?? ({} as SeriesRequest)),
    enabled: request !== null,
    placeholderData: keepPreviousData,
  });
}
