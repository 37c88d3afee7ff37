// A new comparison: the builder with a live preview; saving opens the saved comparison's page.
import { useNavigate } from 'react-router';
import { Notice, QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { ComparisonBuilder } from '@/features/comparisons/components/comparison-builder';
import { emptyBuilder } from '@/features/comparisons/utils/builder-state';
import { useTeams } from '@/features/teams/api/get-teams';

export default function NewComparisonRoute() {
  const teams = useTeams();
  const navigate = useNavigate();
  const toast = useToast();
  const header = (
    <PageHeader
      title="New comparison"
      description="Choose profiles from the studies of a team (approved ones unless you ask for the others) and the reference; the preview follows every choice."
    />
  );
  if (teams.isPending)
    return (
      <>
        {header}
        <Loading label="Loading your teams…" />
      </>
    );
  if (teams.isError)
    return (
      <>
        {header}
        <QueryError error={teams.error} what="your teams" onRetry={() => void teams.refetch()} />
      </>
    );
  if (teams.data.length === 0) {
    return (
      <>
        {header}
        <Notice tone="info" title="You belong to no team yet">
          Comparisons are made inside a team. Ask an admin to add you to one.
        </Notice>
      </>
    );
  }
  const choices = teams.data.map((t) => ({ id: t.id, name: t.name }));
  return (
    <>
      {header}
      <ComparisonBuilder
        teams={choices}
        initial={emptyBuilder(choices.length === 1 ? choices[0].id : '')}
        onSaved={(saved) => {
          toast.show(`Comparison “${saved.name}” saved.`);
          void navigate(paths.comparison.href(saved.id));
        }}
      />
    </>
  );
}
