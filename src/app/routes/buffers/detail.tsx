// One buffer system: every ionization with its sources, forms, cautions. Admins edit or delete
// lab systems; built-in systems keep their published sources and are read-only.
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useDeleteBuffer } from '@/features/buffers/api/delete-buffer';
import { getBufferQueryOptions, useBuffer } from '@/features/buffers/api/get-buffer';
import { BufferDetails } from '@/features/buffers/components/buffer-details';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(queryClient, 'buffers:read', () =>
      queryClient.ensureQueryData(getBufferQueryOptions(params.bufferId ?? '')),
    );

const link =
  'inline-flex h-9 items-center rounded border border-line-strong bg-surface px-3.5 font-semibold hover:bg-canvas';

export default function BufferRoute() {
  const { bufferId = '' } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const canManage = useCan('buffers:manage');
  const buffer = useBuffer(bufferId);
  const [deleting, setDeleting] = useState(false);
  const remove = useDeleteBuffer({
    onSuccess: () => {
      toast.show('Lab buffer deleted.');
      void navigate(paths.buffers.href());
    },
  });
  if (buffer.isPending) return <Loading label="Loading the buffer system…" />;
  if (buffer.isError)
    return (
      <QueryError error={buffer.error} what="this buffer system" onRetry={() => void buffer.refetch()} />
    );
  const b = buffer.data;
  const editable = canManage && !b.builtIn;
  return (
    <>
      <p className="mb-1 text-sm">
        <Link to={paths.buffers.href()} className="text-accent-700 hover:underline">
          Buffer library
        </Link>
      </p>
      <PageHeader
        title={b.name}
        description={
          <span className="flex flex-wrap items-center gap-2">
            {b.builtIn ? <Badge>Built-in</Badge> : <Badge tone="accent">Lab</Badge>}
            <span>
              {b.designerDefault
                ? 'Offered by the series designer.'
                : 'The designer uses it only on request.'}
            </span>
            {b.aliases.length > 0 && <span>Also called {b.aliases.join(', ')}.</span>}
          </span>
        }
        actions={
          editable && (
            <>
              <Link to={paths.bufferEdit.href(b.id)} className={link}>
                Edit lab buffer
              </Link>
              <Button onClick={() => setDeleting(true)}>Delete lab buffer</Button>
            </>
          )
        }
      />
      <BufferDetails buffer={b} />
      <ConfirmDialog
        open={deleting}
        title={`Delete ${b.name}?`}
        confirmLabel="Delete lab buffer"
        busy={remove.isPending}
        error={remove.error?.message}
        onCancel={() => {
          remove.reset();
          setDeleting(false);
        }}
        onConfirm={() => remove.mutate(b.id)}
      >
        <p>The system leaves the library. A system used by a saved buffer series cannot be deleted.</p>
      </ConfirmDialog>
    </>
  );
}
