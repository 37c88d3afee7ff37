import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EnzymeSummary } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export const getEnzymes = (filters: { teamId?: string } = {}, signal?: AbortSignal) =>
  api.get<EnzymeSummary[]>('/enzymes', filters, signal);

export const getEnzymesQueryOptions = (filters: { teamId?: string } = {}) =>
  queryOptions({ queryKey: enzymeKeys.list(filters), queryFn: ({ signal }) => getEnzymes(filters, signal) });

/** Enzymes of the user's teams (every team for admins). */
export function useEnzymes(filters: { teamId?: string } = {}) {
  return useQuery(getEnzymesQueryOptions(filters));
}
