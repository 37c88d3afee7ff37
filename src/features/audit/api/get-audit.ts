import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditEntry, Page } from '@shared/schemas/api-types';
import { api } from '@/lib/api-client';
import { dayBoundary } from '@/lib/format';
import type { AuditFilters } from '../utils/audit-filters';
import { auditKeys } from './keys';

type PageParams = { limit: number; offset: number };

/** Days from the filter become the instants they start and end at, in local time. */
export const getAudit = (filters: AuditFilters, page: PageParams, signal?: AbortSignal) =>
  api.get<Page<AuditEntry>>(
    '/audit',
    {
      entity: filters.entity,
      action: filters.action,
      actorId: filters.actorId,
      from: filters.from ? dayBoundary(filters.from, 'start') : undefined,
      to: filters.to ? dayBoundary(filters.to, 'end') : undefined,
      ...page,
    },
    signal,
  );

export const getAuditQueryOptions = (filters: AuditFilters, page: PageParams) =>
  queryOptions({
    queryKey: auditKeys.list(filters, page),
    queryFn: ({ signal }) => getAudit(filters, page, signal),
    staleTime: 0,
    placeholderData: keepPreviousData,
  });

export function useAudit(filters: AuditFilters, page: PageParams) {
  return useQuery(getAuditQueryOptions(filters, page));
}
