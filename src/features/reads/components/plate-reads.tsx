// The reads section of the plate page: the list, the chosen read, and deleting a read.
import { useState } from 'react';
import type { ReadSummary } from '@shared/schemas/plates-types';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { useDeleteRead } from '../api/delete-read';
import { useReads } from '../api/get-reads';
import { ReadList } from './read-list';
import { ReadViewer } from './read-viewer';

export type PlateReadsProps = {
  plateId: string;
  format: 96 | 384;
  canDelete: boolean;
  onChanged?: () => void;
};

export function PlateReads({ plateId, format, canDelete, onChanged }: PlateReadsProps) {
  const toast = useToast();
  const reads = useReads(plateId);
  const [selected, setSelected] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<ReadSummary | null>(null);
  const remove = useDeleteRead({
    onSuccess: (id) => {
      toast.show(`Read “${deleting?.label}” deleted.`);
      setDeleting(null);
      if (selected === id) setSelected(null);
      onChanged?.();
    },
  });
  if (reads.isPending) return <Loading label="Loading the reads…" />;
  if (reads.isError)
    return <QueryError error={reads.error} what="the reads" onRetry={() => void reads.refetch()} />;
  const shown =
    selected && reads.data.some((r) => r.id === selected) ? selected : (reads.data[0]?.id ?? null);
  const sameFile = deleting ? reads.data.filter((r) => r.fileId === deleting.fileId).length : 0;
  return (
    <div className="space-y-3">
      <ReadList
        reads={reads.data}
        selectedId={shown}
        onSelect={(r) => setSelected(r.id)}
        onDelete={canDelete ? setDeleting : undefined}
      />
      {shown && <ReadViewer key={shown} readId={shown} format={format} />}
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete the read “${deleting?.label ?? ''}”?`}
        confirmLabel="Delete read"
        busy={remove.isPending}
        error={remove.error?.message}
        onConfirm={() => deleting && remove.mutate(deleting.id)}
        onCancel={() => {
          setDeleting(null);
          remove.reset();
        }}
      >
        <p>
          Its well values are removed.{' '}
          {sameFile <= 1
            ? `It is the last read from ${deleting?.fileName}, so the raw file is removed too.`
            : `The raw file ${deleting?.fileName} stays for its other ${sameFile - 1} read(s).`}
        </p>
      </ConfirmDialog>
    </div>
  );
}
