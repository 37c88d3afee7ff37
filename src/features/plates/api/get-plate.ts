import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlateDetail } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

/** The plate with its map, the server's checks and its reads. */
export const getPlate = (plateId: string, signal?: AbortSignal) =>
  api.get<PlateDetail>(`/plates/${encodeURIComponent(plateId)}`, undefined, signal);

export const getPlateQueryOptions = (plateId: string) =>
  queryOptions({ queryKey: plateKeys.detail(plateId), queryFn: ({ signal }) => getPlate(plateId, signal) });

export function usePlate(plateId: string) {
  // The editor keeps its own working copy; a refetch on focus must not look like someone's save.
  return useQuery({ ...getPlateQueryOptions(plateId), refetchOnWindowFocus: false });
}
