import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Assay } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { assayKeys } from './keys';

export type AssayListItem = Assay & { teamName: string };

export const getAssays = (filters: { teamId?: string } = {}, signal?: AbortSignal) =>
  api.get<AssayListItem[]>('/assays', filters, signal);

export const getAssaysQueryOptions = (filters: { teamId?: string } = {}) =>
  queryOptions({ queryKey: assayKeys.list(filters), queryFn: ({ signal }) => getAssays(filters, signal) });

export function useAssays(filters: { teamId?: string } = {}) {
  return useQuery(getAssaysQueryOptions(filters));
}
