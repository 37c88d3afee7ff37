// A saved comparison: the link to share inside the team, exports, the printable report, and for
// writers edit and delete. Viewers read it without any edit control.
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { getComparisonQueryOptions, useComparison } from '@/features/comparisons/api/get-comparison';
import { useComparisons } from '@/features/comparisons/api/get-comparisons';
import { useDeleteComparison } from '@/features/comparisons/api/delete-comparison';
import { ComparisonPanel } from '@/features/comparisons/components/comparison-panel';
import { ComparisonSummary } from '@/features/comparisons/components/comparison-summary';
import { CopyLinkButton } from '@/features/comparisons/components/copy-link-button';
import { ExportButtons } from '@/features/reports/components/export-buttons';
import { useTeams } from '@/features/teams/api/get-teams';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(queryClient, 'records:read', () =>
      queryClient.ensureQueryData(getComparisonQueryOptions(params.comparisonId ?? '')),
    );

const linkButton =
  'inline-flex h-7 items-center rounded border border-line-strong bg-surface px-2.5 text-sm font-semibold hover:bg-canvas';

export default function ComparisonRoute() {
  const { comparisonId = '' } = useParams();
  const comparison = useComparison(comparisonId);
  const list = useComparisons();
  const teams = useTeams();
  const canWrite = useCan('records:write');
  const [deleting, setDeleting] = useState(false);
  const navigate = useNavigate();
  const toast = useToast();
  const remove = useDeleteComparison({
    onSuccess: () => {
      toast.show('Comparison deleted.');
      void navigate(paths.comparisons.href());
    },
  });
  const back = (
    <p className="mb-1 text-sm print:hidden">
      <Link to={paths.comparisons.href()} className="text-accent-700 hover:underline">
        Comparisons
      </Link>
    </p>
  );
  if (comparison.isPending)
    return (
      <>
        {back}
        <Loading label="Comparing the profiles…" />
      </>
    );
  if (comparison.isError)
    return (
      <>
        {back}
        <QueryError
          error={comparison.error}
          what="this comparison"
          onRetry={() => void comparison.refetch()}
        />
      </>
    );
  const c = comparison.data;
  const item = list.data?.find((x) => x.id === c.id);
  return (
    <>
      {back}
      <PageHeader
        title={c.name}
        actions={
          <>
            <CopyLinkButton href={paths.comparison.href(c.id)} />
            <Link to={paths.comparisonReport.href(c.id)} className={linkButton}>
              Printable report
            </Link>
            {canWrite && (
              <>
                <Link to={paths.comparisonEdit.href(c.id)} className={linkButton}>
                  Edit
                </Link>
                <Button size="sm" onClick={() => setDeleting(true)}>
                  Delete
                </Button>
              </>
            )}
          </>
        }
      />
      <div className="mb-5 flex items-start justify-between gap-6">
        <ComparisonSummary
          saved={c}
          view={c.view}
          teamName={teams.data?.find((t) => t.id === c.teamId)?.name}
          createdByName={item?.createdByName}
        />
        <ExportButtons kind="comparison" id={c.id} name={c.name} />
      </div>
      <ComparisonPanel view={c.view} />
      <ConfirmDialog
        open={deleting}
        title={`Delete “${c.name}”?`}
        confirmLabel="Delete comparison"
        busy={remove.isPending}
        error={remove.error?.message}
        onCancel={() => {
          remove.reset();
          setDeleting(false);
        }}
        onConfirm={() => remove.mutate(c.id)}
      >
        <p>The saved comparison and its link go; the studies and their fits stay as they are.</p>
      </ConfirmDialog>
    </>
  );
}
