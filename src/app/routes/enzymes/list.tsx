// Enzymes of the user's teams: search, sort, filter by team; writers create new ones.
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '@/components/ui/button';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getEnzymesQueryOptions, useEnzymes } from '@/features/enzymes/api/get-enzymes';
import { EnzymeFormDialog } from '@/features/enzymes/components/enzyme-form-dialog';
import { EnzymesTable } from '@/features/enzymes/components/enzymes-table';
import { useTeams } from '@/features/teams/api/get-teams';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'records:read', () => queryClient.ensureQueryData(getEnzymesQueryOptions()));

export default function EnzymesRoute() {
  const navigate = useNavigate();
  const canWrite = useCan('records:write');
  const [creating, setCreating] = useState(false);
  const enzymes = useEnzymes();
  const teams = useTeams({ enabled: canWrite });
  const header = (
    <PageHeader
      title="Enzymes"
      description="Each enzyme holds its parent (wild type), the variants engineered from it, and their preparations."
      actions={
        canWrite && (
          <Button variant="primary" onClick={() => setCreating(true)}>
            New enzyme
          </Button>
        )
      }
    />
  );
  return (
    <>
      {header}
      {enzymes.isPending ? (
        <Loading label="Loading enzymes…" />
      ) : enzymes.isError ? (
        <QueryError error={enzymes.error} what="the enzymes" onRetry={() => void enzymes.refetch()} />
      ) : (
        <EnzymesTable enzymes={enzymes.data} />
      )}
      {canWrite && (
        <EnzymeFormDialog
          open={creating}
          onClose={() => setCreating(false)}
          teams={teams.data ?? []}
          onSaved={(e) => void navigate(paths.enzyme.href(e.id))}
        />
      )}
    </>
  );
}
