// Assays of the user's teams; writers define new ones.
import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getAssaysQueryOptions, useAssays } from '@/features/assays/api/get-assays';
import { AssaysTable } from '@/features/assays/components/assays-table';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'records:read', () => queryClient.ensureQueryData(getAssaysQueryOptions()));

const primaryLink =
  'inline-flex h-9 items-center rounded border border-accent-700 bg-accent-700 px-3.5 font-semibold text-white hover:bg-accent-800';

export default function AssaysRoute() {
  const canWrite = useCan('records:write');
  const assays = useAssays();
  return (
    <>
      <PageHeader
        title="Assays"
        description="How activity is read: substrate and its concentration, read mode, detection, quantitation and temperature."
        actions={
          canWrite && (
            <Link to={paths.assayNew.href()} className={primaryLink}>
              New assay
            </Link>
          )
        }
      />
      {assays.isPending ? (
        <Loading label="Loading assays…" />
      ) : assays.isError ? (
        <QueryError error={assays.error} what="the assays" onRetry={() => void assays.refetch()} />
      ) : (
        <AssaysTable assays={assays.data} />
      )}
    </>
  );
}
