// The audit log: who changed what and when, with filters in the address and a paged table; a row
// opens the before/after of that change.
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import type { AuditEntry } from '@shared/schemas/api-types';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Pager } from '@/components/ui/pager';
import { Loading } from '@/components/ui/spinner';
import { getAuditQueryOptions, useAudit } from '@/features/audit/api/get-audit';
import { AuditEntryDialog } from '@/features/audit/components/audit-entry-dialog';
import { AuditFilterForm } from '@/features/audit/components/audit-filter-form';
import { AuditTable } from '@/features/audit/components/audit-table';
import { filtersFromSearch, filtersToSearch } from '@/features/audit/utils/audit-filters';
import { useUsers } from '@/features/users/api/get-users';
import { warmCacheFor } from '@/lib/auth';

const limit = 50;
const offsetFrom = (search: URLSearchParams) =>
  Math.max(0, Number.parseInt(search.get('offset') ?? '0', 10) || 0);

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) => {
    const search = new URL(request.url).searchParams;
    return warmCacheFor(queryClient, 'audit:read', () =>
      queryClient.ensureQueryData(
        getAuditQueryOptions(filtersFromSearch(search), { limit, offset: offsetFrom(search) }),
      ),
    );
  };

export default function AuditRoute() {
  const [search, setSearch] = useSearchParams();
  const filters = filtersFromSearch(search);
  const offset = offsetFrom(search);
  const audit = useAudit(filters, { limit, offset });
  const people = useUsers();
  const [open, setOpen] = useState<AuditEntry | null>(null);

  return (
    <>
      <PageHeader
        title="Audit log"
        description="Every change in Bellwether, who made it and when, with the record before and after. Newest first."
      />
      <AuditFilterForm
        key={search.toString()}
        value={filters}
        people={people.data ?? []}
        onChange={(next) => setSearch(filtersToSearch(next))}
      />
      {audit.isPending ? (
        <Loading label="Loading the audit log…" />
      ) : audit.isError ? (
        <QueryError error={audit.error} what="the audit log" onRetry={() => void audit.refetch()} />
      ) : (
        <>
          <AuditTable entries={audit.data.items} selectedId={open?.id} onOpen={setOpen} />
          <Pager
            offset={offset}
            limit={limit}
            total={audit.data.total}
            onChange={(o) => setSearch(filtersToSearch(filters, o))}
          />
        </>
      )}
      <AuditEntryDialog entry={open} onClose={() => setOpen(null)} />
    </>
  );
}
