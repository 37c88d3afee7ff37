import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StudySummary } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { studyKeys, type StudyFilters } from './keys';

export const getStudies = (filters: StudyFilters = {}, signal?: AbortSignal) =>
  api.get<StudySummary[]>(
    '/studies',
    { teamId: filters.teamId, status: filters.status, mine: filters.mine ? 'true' : undefined },
    signal,
  );

export const getStudiesQueryOptions = (filters: StudyFilters = {}) =>
  queryOptions({ queryKey: studyKeys.list(filters), queryFn: ({ signal }) => getStudies(filters, signal) });

/** Studies of the user's teams, most recently changed first. */
export function useStudies(filters: StudyFilters = {}, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getStudiesQueryOptions(filters), enabled: options.enabled ?? true });
}
