import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AvailableProfile } from '@shared/schemas/comparisons';
import { api } from '@/lib/api-client';
import { comparisonKeys, type ProfileFilter } from './keys';

/** Fitted profiles of the user's teams: approved studies only unless asked for the others. */
export const getProfiles = (filter: ProfileFilter, signal?: AbortSignal) =>
  api.get<AvailableProfile[]>(
    '/comparisons/profiles',
    { teamId: filter.teamId, includeUnapproved: filter.includeUnapproved ? 'true' : undefined },
    signal,
  );

export const getProfilesQueryOptions = (filter: ProfileFilter) =>
  queryOptions({
    queryKey: comparisonKeys.profiles(filter),
    queryFn: ({ signal }) => getProfiles(filter, signal),
  });

export function useAvailableProfiles(filter: ProfileFilter, options: { enabled?: boolean } = {}) {
  return useQuery({
    ...getProfilesQueryOptions(filter),
    enabled: options.enabled ?? true,
    placeholderData: keepPreviousData,
  });
}
