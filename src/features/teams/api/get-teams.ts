import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TeamSummary } from '@shared/schemas/api-types';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

/** Admins get every team; everyone else the teams they belong to. Each comes with its members. */
export const getTeams = (signal?: AbortSignal) => api.get<TeamSummary[]>('/teams', undefined, signal);

export const getTeamsQueryOptions = () =>
  queryOptions({ queryKey: teamKeys.list(), queryFn: ({ signal }) => getTeams(signal) });

export function useTeams(options: { enabled?: boolean } = {}) {
  return useQuery({ ...getTeamsQueryOptions(), enabled: options.enabled ?? true });
}
