// Saved buffer series of the user's teams; writers design new ones.
import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getSeriesListQueryOptions, useSeriesList } from '@/features/buffer-series/api/get-series-list';
import { SeriesTable } from '@/features/buffer-series/components/series-table';
import { useTeams } from '@/features/teams/api/get-teams';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'records:read', () => queryClient.ensureQueryData(getSeriesListQueryOptions()));

const primaryLink =
  'inline-flex h-9 items-center rounded border border-accent-700 bg-accent-700 px-3.5 font-semibold text-white hover:bg-accent-800';

export default function BufferSeriesListRoute() {
  const canWrite = useCan('records:write');
  const series = useSeriesList();
  const teams = useTeams();
  return (
    <>
      <PageHeader
        title="Buffer series"
        description="The pH points of a study, each with its buffer system, concentration, ionic strength and recipe."
        actions={
          canWrite && (
            <Link to={paths.bufferSeriesNew.href()} className={primaryLink}>
              Design a series
            </Link>
          )
        }
      />
      {series.isPending ? (
        <Loading label="Loading buffer series…" />
      ) : series.isError ? (
        <QueryError error={series.error} what="the buffer series" onRetry={() => void series.refetch()} />
      ) : (
        <SeriesTable series={series.data} teams={teams.data ?? []} />
      )}
    </>
  );
}
