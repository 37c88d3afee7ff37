// The buffer library: everyone reads it; admins add the lab's own systems.
import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getBuffersQueryOptions, useBuffers } from '@/features/buffers/api/get-buffers';
import { BuffersTable } from '@/features/buffers/components/buffers-table';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'buffers:read', () => queryClient.ensureQueryData(getBuffersQueryOptions()));

const primaryLink =
  'inline-flex h-9 items-center rounded border border-accent-700 bg-accent-700 px-3.5 font-semibold text-white hover:bg-accent-800';

export default function BuffersRoute() {
  const canManage = useCan('buffers:manage');
  const buffers = useBuffers();
  return (
    <>
      <PageHeader
        title="Buffer library"
        description="Thermodynamic pKa values (25 °C, I = 0) with their temperature dependence, charge and sources. The designer corrects them to the assay temperature and ionic strength."
        actions={
          canManage && (
            <Link to={paths.bufferNew.href()} className={primaryLink}>
              Add a lab buffer
            </Link>
          )
        }
      />
      {buffers.isPending ? (
        <Loading label="Loading the buffer library…" />
      ) : buffers.isError ? (
        <QueryError error={buffers.error} what="the buffer library" onRetry={() => void buffers.refetch()} />
      ) : (
        <BuffersTable buffers={buffers.data} />
      )}
    </>
  );
}
