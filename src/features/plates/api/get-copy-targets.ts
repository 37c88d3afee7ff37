import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StudySummary } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export type CopyTarget = Pick<StudySummary, 'id' | 'name' | 'status'>;

/** The team's studies, for "copy this map into…" (only editable ones accept a new plate). */
export const getCopyTargets = async (teamId: string, signal?: AbortSignal): Promise<CopyTarget[]> =>
  (await api.get<StudySummary[]>('/studies', { teamId }, signal)).map(({ id, name, status }) => ({
    id,
    name,
    status,
  }));

export const getCopyTargetsQueryOptions = (teamId: string) =>
  queryOptions({
    queryKey: plateKeys.copyTargets(teamId),
    queryFn: ({ signal }) => getCopyTargets(teamId, signal),
  });

export function useCopyTargets(teamId: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getCopyTargetsQueryOptions(teamId), enabled: options.enabled ?? true });
}
