// Studies of the user's teams: status in PRODUCT.md's words, filters by status and "only mine".
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getStudiesQueryOptions, useStudies } from '@/features/studies/api/get-studies';
import { StudiesTable } from '@/features/studies/components/studies-table';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'records:read', () => queryClient.ensureQueryData(getStudiesQueryOptions()));

const primaryLink =
  'inline-flex h-9 items-center rounded border border-accent-700 bg-accent-700 px-3.5 font-semibold text-white hover:bg-accent-800';

export default function StudiesRoute() {
  const canWrite = useCan('records:write');
  const [mine, setMine] = useState(false);
  const studies = useStudies({ mine: mine || undefined });
  const mineToggle = (
    <label className="flex items-center gap-1.5">
      <input
        type="checkbox"
        className="size-4 accent-accent-700"
        checked={mine}
        onChange={(e) => setMine(e.target.checked)}
      />
      Only mine
    </label>
  );
  return (
    <>
      <PageHeader
        title="Studies"
        description="One pH-profile experiment each: an assay, a buffer series, a set of variants and their plates."
        actions={
          canWrite && (
            <Link to={paths.studyNew.href()} className={primaryLink}>
              New study
            </Link>
          )
        }
      />
      {studies.isPending ? (
        <Loading label="Loading studies…" />
      ) : studies.isError ? (
        <QueryError error={studies.error} what="the studies" onRetry={() => void studies.refetch()} />
      ) : (
        <StudiesTable
          studies={studies.data}
          toolbar={mineToggle}
          empty={mine ? 'You own no studies yet.' : 'No studies yet.'}
        />
      )}
    </>
  );
}
