// One assay with units, cautions for a pH series and the substrate-vs-KM wording.
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
import { useDeleteAssay } from '@/features/assays/api/delete-assay';
import { getAssayQueryOptions, useAssay } from '@/features/assays/api/get-assay';
import { AssayDetails } from '@/features/assays/components/assay-details';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(queryClient, 'records:read', () =>
      queryClient.ensureQueryData(getAssayQueryOptions(params.assayId ?? '')),
    );

const link =
  'inline-flex h-9 items-center rounded border border-line-strong bg-surface px-3.5 font-semibold hover:bg-canvas';

export default function AssayRoute() {
  const { assayId = '' } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const canWrite = useCan('records:write');
  const assay = useAssay(assayId);
  const [deleting, setDeleting] = useState(false);
  const remove = useDeleteAssay({
    onSuccess: () => {
      toast.show('Assay deleted.');
      void navigate(paths.assays.href());
    },
  });
  if (assay.isPending) return <Loading label="Loading the assay…" />;
  if (assay.isError)
    return <QueryError error={assay.error} what="this assay" onRetry={() => void assay.refetch()} />;
  const a = assay.data;
  return (
    <>
      <p className="mb-1 text-sm">
        <Link to={paths.assays.href()} className="text-accent-700 hover:underline">
          Assays
        </Link>
      </p>
      <PageHeader
        title={a.name}
        actions={
          canWrite && (
            <>
              <Link to={paths.assayEdit.href(a.id)} className={link}>
                Edit assay
              </Link>
              <Button onClick={() => setDeleting(true)}>Delete assay</Button>
            </>
          )
        }
      />
      <AssayDetails assay={a} />
      <ConfirmDialog
        open={deleting}
        title={`Delete ${a.name}?`}
        confirmLabel="Delete assay"
        busy={remove.isPending}
        error={remove.error?.message}
        onCancel={() => {
          remove.reset();
          setDeleting(false);
        }}
        onConfirm={() => remove.mutate(a.id)}
      >
        <p>
          The assay is removed. An assay used by a study cannot be deleted
          {a.studyCount > 0 ? ` (this one is used by ${a.studyCount})` : ''}.
        </p>
      </ConfirmDialog>
    </>
  );
}
