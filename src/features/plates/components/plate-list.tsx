// The study's plates: format, reads, version and last change; open, import, rename, copy, delete.
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router';
import type { PlateSummary } from '@shared/schemas/plates-types';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { formatDateTime } from '@/lib/format';

const column = createColumnHelper<PlateSummary>();

export type PlateListProps = {
  plates: PlateSummary[];
  plateHref: (plate: PlateSummary) => string;
  importHref: (plate: PlateSummary) => string;
  /** Given only when the plates may change (role and study status). */
  onCopy?: (plate: PlateSummary) => void;
  onRename?: (plate: PlateSummary) => void;
  onDelete?: (plate: PlateSummary) => void;
  toolbar?: ReactNode;
};

export function PlateList({ plates, plateHref, importHref, onCopy, onRename, onDelete, toolbar }: PlateListProps) {
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Plate',
        cell: (c) => (
          <Link to={plateHref(c.row.original)} className="font-semibold text-accent-700 hover:underline">
            {c.getValue()}
          </Link>
        ),
      }),
      column.accessor('format', { header: 'Wells', meta: { numeric: true } }),
      column.accessor('readCount', { header: 'Reads', meta: { numeric: true } }),
      column.accessor('version', { header: 'Map version', meta: { numeric: true } }),
      column.accessor('updatedAt', {
        header: 'Last change',
        cell: (c) => <span className="tabular-nums">{formatDateTime(c.getValue())}</span>,
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { className: 'text-right whitespace-nowrap' },
        cell: ({ row }) => (
          <span className="inline-flex gap-1.5">
            {onCopy && (
              <Link
                to={importHref(row.original)}
                className="inline-flex h-7 items-center rounded border border-line-strong px-2.5 text-sm font-semibold hover:bg-canvas"
              >
                Import<span className="sr-only"> a reader file into {row.original.name}</span>
              </Link>
            )}
            {onRename && (
              <Button size="sm" onClick={() => onRename(row.original)}>
                Rename<span className="sr-only"> {row.original.name}</span>
              </Button>
            )}
            {onCopy && (
              <Button size="sm" onClick={() => onCopy(row.original)}>
                Copy map<span className="sr-only"> of {row.original.name}</span>
              </Button>
            )}
            {onDelete && (
              <Button size="sm" onClick={() => onDelete(row.original)}>
                Delete<span className="sr-only"> {row.original.name}</span>
              </Button>
            )}
          </span>
        ),
      }),
    ],
    [plateHref, importHref, onCopy, onRename, onDelete],
  );
  return (
    <DataTable
      data={plates}
      columns={columns}
      label="Plates of the study"
      getRowId={(p) => p.id}
      search={{ label: 'Search plates' }}
      toolbar={toolbar}
      empty="No plates yet. Create the first with “New plate”."
    />
  );
}
