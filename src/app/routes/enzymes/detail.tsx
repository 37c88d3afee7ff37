// One enzyme: what it is, its variants (parent marked, mutations in one-letter notation) and their
// preparations. Writers edit and delete here; viewers read.
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
import { useDeleteEnzyme } from '@/features/enzymes/api/delete-enzyme';
import { getEnzymeQueryOptions, useEnzyme } from '@/features/enzymes/api/get-enzyme';
import { EnzymeFormDialog } from '@/features/enzymes/components/enzyme-form-dialog';
import { EnzymeVariants } from '@/features/enzymes/components/enzyme-variants';
import { useTeams } from '@/features/teams/api/get-teams';
import { useCan, warmCacheFor } from '@/lib/auth';
import { formatDateTime } from '@/lib/format';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(queryClient, 'records:read', () =>
      queryClient.ensureQueryData(getEnzymeQueryOptions(params.enzymeId ?? '')),
    );

export default function EnzymeRoute() {
  const { enzymeId = '' } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const canWrite = useCan('records:write');
  const enzyme = useEnzyme(enzymeId);
  const teams = useTeams({ enabled: canWrite });
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const remove = useDeleteEnzyme({
    onSuccess: () => {
      toast.show('Enzyme deleted.');
      void navigate(paths.enzymes.href());
    },
  });

  if (enzyme.isPending) return <Loading label="Loading the enzyme…" />;
  if (enzyme.isError)
    return <QueryError error={enzyme.error} what="this enzyme" onRetry={() => void enzyme.refetch()} />;
  const e = enzyme.data;
  return (
    <>
      <p className="mb-1 text-sm">
        <Link to={paths.enzymes.href()} className="text-accent-700 hover:underline">
          Enzymes
        </Link>
      </p>
      <PageHeader
        title={e.name}
        description={e.notes || undefined}
        actions={
          canWrite && (
            <>
              <Button onClick={() => setEditing(true)}>Edit enzyme</Button>
              <Button onClick={() => setDeleting(true)}>Delete enzyme</Button>
            </>
          )
        }
      />
      <dl className="mb-6 grid grid-cols-[auto_1fr] gap-x-6 gap-y-1">
        <dt className="text-ink-muted">Team</dt>
        <dd>{e.teamName}</dd>
        <dt className="text-ink-muted">Source organism</dt>
        <dd>{e.organism || '—'}</dd>
        <dt className="text-ink-muted">Studies using it</dt>
        <dd className="tabular-nums">{e.studyCount}</dd>
        <dt className="text-ink-muted">Updated</dt>
        <dd className="tabular-nums">{formatDateTime(e.updatedAt)}</dd>
      </dl>
      <EnzymeVariants enzyme={e} canEdit={canWrite} />
      {canWrite && (
        <EnzymeFormDialog
          open={editing}
          onClose={() => setEditing(false)}
          teams={teams.data ?? []}
          enzyme={e}
        />
      )}
      <ConfirmDialog
        open={deleting}
        title={`Delete ${e.name}?`}
        confirmLabel="Delete enzyme"
        busy={remove.isPending}
        error={remove.error?.message}
        onCancel={() => {
          remove.reset();
          setDeleting(false);
        }}
        onConfirm={() => remove.mutate(e.id)}
      >
        <p>
          The enzyme, its {e.variants.length} variant{e.variants.length === 1 ? '' : 's'} and their
          preparations are removed. An enzyme used by a study cannot be deleted
          {e.studyCount > 0 ? ` (this one is used by ${e.studyCount})` : ''}.
        </p>
      </ConfirmDialog>
    </>
  );
}
