import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlateDetail } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { analysisKeys } from './keys';

/** A plate's reads (the analysis uses one per plate; the settings panel lets a scientist choose). */
export const getPlateReads = async (plateId: string, signal?: AbortSignal) =>
  (await api.get<PlateDetail>(`/plates/${encodeURIComponent(plateId)}`, undefined, signal)).reads;

export const getPlateReadsQueryOptions = (plateId: string) =>
  queryOptions({
    queryKey: analysisKeys.plateReads(plateId),
    queryFn: ({ signal }) => getPlateReads(plateId, signal),
  });

export function usePlateReads(plateId: string | null) {
  return useQuery({ ...getPlateReadsQueryOptions(plateId ?? ''), enabled: Boolean(plateId) });
}
