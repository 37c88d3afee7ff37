import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AssayDetail } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { assayKeys } from './keys';

export const getAssay = (id: string, signal?: AbortSignal) =>
  api.get<AssayDetail>(`/assays/${encodeURIComponent(id)}`, undefined, signal);

export const getAssayQueryOptions = (id: string) =>
  queryOptions({ queryKey: assayKeys.detail(id), queryFn: ({ signal }) => getAssay(id, signal) });

/** One assay with its team, the studies that use it, and the server's cautions for a pH series. */
export function useAssay(id: string | null | undefined) {
  return useQuery({ ...getAssayQueryOptions(id ?? ''), enabled: Boolean(id) });
}
