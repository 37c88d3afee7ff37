// Change a saved comparison: the builder opened on it; saving sends the version it was opened at.
// If someone saved in between, the dialog offers to reload the saved version.
import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useComparison } from '@/features/comparisons/api/get-comparison';
import { comparisonKeys } from '@/features/comparisons/api/keys';
import { ComparisonBuilder } from '@/features/comparisons/components/comparison-builder';
import { builderFromSaved } from '@/features/comparisons/utils/builder-state';
import { useTeams } from '@/features/teams/api/get-teams';

export default function EditComparisonRoute() {
  const { comparisonId = '' } = useParams();
  const comparison = useComparison(comparisonId);
  const teams = useTeams();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const toast = useToast();
  if (comparison.isPending || teams.isPending) return <Loading label="Loading the comparison…" />;
  if (comparison.isError)
    return (
      <QueryError error={comparison.error} what="this comparison" onRetry={() => void comparison.refetch()} />
    );
  const saved = comparison.data;
  const team = teams.data?.find((t) => t.id === saved.teamId);
  return (
    <>
      <p className="mb-1 text-sm">
        <Link to={paths.comparison.href(saved.id)} className="text-accent-700 hover:underline">
          Back to the comparison
        </Link>
      </p>
      <PageHeader
        title={`Edit “${saved.name}”`}
        description="Change the profiles, the reference or the global fit; the preview follows."
      />
      <ComparisonBuilder
        // A reload (after someone else's save) starts again from the newer version.
        key={saved.version}
        teams={[{ id: saved.teamId, name: team?.name ?? 'this team' }]}
        initial={builderFromSaved(saved)}
        saved={saved}
        onSaved={(s) => {
          toast.show(`Comparison “${s.name}” saved.`);
          void navigate(paths.comparison.href(s.id));
        }}
        onReload={() => void queryClient.invalidateQueries({ queryKey: comparisonKeys.detail(saved.id) })}
      />
    </>
  );
}
