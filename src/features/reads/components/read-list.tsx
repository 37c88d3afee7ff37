// The plate's imported reads: what each is, where it came from (file, SHA-256, who and when),
// the raw file to download, and delete. Choosing a read shows it below.
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { ReadSummary } from '@shared/schemas/plates-types';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { formatDateTime } from '@/lib/format';
import { rawFileHref } from '../api/keys';

const column = createColumnHelper<ReadSummary>();

export type ReadListProps = {
  reads: ReadSummary[];
  selectedId: string | null;
  onSelect: (read: ReadSummary) => void;
  onDelete?: (read: ReadSummary) => void;
};

export function ReadList({ reads, selectedId, onSelect, onDelete }: ReadListProps) {
  const columns = useMemo(
    () => [
      column.accessor('kind', {
        header: 'Kind',
        cell: (c) => (c.getValue() === 'kinetic' ? 'Time course' : 'Single read'),
      }),
      column.accessor('label', {
        header: 'Label',
        cell: (c) => <span className="font-semibold">{c.getValue()}</span>,
      }),
      column.accessor('wavelengthNm', {
        header: 'nm',
        meta: { numeric: true },
        cell: (c) => c.getValue() ?? '—',
      }),
      column.accessor((r) => (r.timesS ? r.timesS.length : 1), {
        id: 'points',
        header: 'Time points',
        meta: { numeric: true },
      }),
      column.accessor((r) => r.wellCount - r.missingCount, {
        id: 'wells',
        header: 'Wells with values',
        meta: { numeric: true },
      }),
      column.accessor('fileName', {
        header: 'File',
        cell: (c) => (
          <span>
            {c.getValue()}
            <span
              className="block font-mono text-xs text-ink-muted"
              title={`SHA-256 ${c.row.original.sha256}`}
            >
              {c.row.original.sha256.slice(0, 12)}
            </span>
          </span>
        ),
      }),
      column.accessor('uploadedAt', {
        header: 'Imported',
        cell: (c) => (
          <span className="tabular-nums">
            {formatDateTime(c.getValue())}
            <span className="block text-sm text-ink-muted">{c.row.original.uploadedBy}</span>
          </span>
        ),
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { className: 'text-right whitespace-nowrap' },
        cell: ({ row }) => (
          <span className="inline-flex gap-1.5" onClick={(e) => e.stopPropagation()}>
            <a
              href={rawFileHref(row.original.fileId)}
              download
              className="inline-flex h-7 items-center rounded border border-line-strong bg-surface px-2.5 text-sm font-semibold hover:bg-canvas"
            >
              Raw file<span className="sr-only"> of {row.original.label}</span>
            </a>
            {onDelete && (
              <Button size="sm" onClick={() => onDelete(row.original)}>
                Delete<span className="sr-only"> {row.original.label}</span>
              </Button>
            )}
          </span>
        ),
      }),
    ],
    [onDelete],
  );
  return (
    <DataTable
      data={reads}
      columns={columns}
      label="Imported reads"
      getRowId={(r) => r.id}
      enableSorting={false}
      onRowClick={onSelect}
      selectedRowId={selectedId}
      empty="No reads yet. Import a reader file to add them."
    />
  );
}
