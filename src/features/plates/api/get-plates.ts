import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlateSummary } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export const getPlates = (studyId: string, signal?: AbortSignal) =>
  api.get<PlateSummary[]>(`/studies/${encodeURIComponent(studyId)}/plates`, undefined, signal);

export const getPlatesQueryOptions = (studyId: string) =>
  queryOptions({ queryKey: plateKeys.list(studyId), queryFn: ({ signal }) => getPlates(studyId, signal) });

export function usePlates(studyId: string) {
  return useQuery(getPlatesQueryOptions(studyId));
}
