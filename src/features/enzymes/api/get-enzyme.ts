import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EnzymeDetail } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export const getEnzyme = (id: string, signal?: AbortSignal) =>
  api.get<EnzymeDetail>(`/enzymes/${encodeURIComponent(id)}`, undefined, signal);

export const getEnzymeQueryOptions = (id: string) =>
  queryOptions({ queryKey: enzymeKeys.detail(id), queryFn: ({ signal }) => getEnzyme(id, signal) });

/** One enzyme with its variants (parent first) and their preparations. */
export function useEnzyme(id: string | null | undefined) {
  return useQuery({ ...getEnzymeQueryOptions(id ?? ''), enabled: Boolean(id) });
}
