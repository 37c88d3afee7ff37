// Saved comparisons of the user's teams; writers start a new one from here.
import type { QueryClient } from '@tanstack/react-query';
import { Link } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getComparisonsQueryOptions, useComparisons } from '@/features/comparisons/api/get-comparisons';
import { useAvailableProfiles } from '@/features/comparisons/api/get-profiles';
import { ComparisonsTable } from '@/features/comparisons/components/comparisons-table';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'records:read', () => queryClient.ensureQueryData(getComparisonsQueryOptions()));

const primaryLink =
  'inline-flex h-9 items-center rounded border border-accent-700 bg-accent-700 px-3.5 font-semibold text-white hover:bg-accent-800';

export default function ComparisonsRoute() {
  const canWrite = useCan('records:write');
  const comparisons = useComparisons();
  // The saved list names its profiles by key; the fitted profiles give them their names.
  const profiles = useAvailableProfiles({ includeUnapproved: true });
  const names = new Map(
    (profiles.data ?? []).map((p) => [
      `${p.studyId}:${p.variantId}`,
      { variantName: p.variantName, studyName: p.studyName },
    ]),
  );
  return (
    <>
      <PageHeader
        title="Comparisons"
        description="Profiles of variants side by side, across studies, relative to a reference: overlaid curves, optimum, apparent pKa values, half-activity window and activity, with differences and their intervals."
        actions={
          canWrite && (
            <Link to={paths.comparisonNew.href()} className={primaryLink}>
              New comparison
            </Link>
          )
        }
      />
      {comparisons.isPending ? (
        <Loading label="Loading comparisons…" />
      ) : comparisons.isError ? (
        <QueryError
          error={comparisons.error}
          what="the comparisons"
          onRetry={() => void comparisons.refetch()}
        />
      ) : (
        <ComparisonsTable items={comparisons.data} names={names} />
      )}
    </>
  );
}
