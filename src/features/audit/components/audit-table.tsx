import { createColumnHelper } from '@tanstack/react-table';
import type { AuditEntry } from '@shared/schemas/api-types';
import { DataTable } from '@/components/ui/data-table';
import { formatDateTimeSeconds } from '@/lib/format';

const column = createColumnHelper<AuditEntry>();

const columns = [
  column.accessor('at', {
    header: 'Time',
    meta: { className: 'w-44 whitespace-nowrap tabular-nums' },
    cell: (c) => formatDateTimeSeconds(c.getValue()),
  }),
  column.accessor((e) => e.actor?.name ?? 'System', {
    id: 'who',
    header: 'Who',
    cell: ({ row }) => row.original.actor?.name ?? <span className="text-ink-muted">System</span>,
  }),
  column.accessor('entity', {
    header: 'Entity',
    cell: ({ row }) => (
      <span>
        {row.original.entity}
        {row.original.entityId && (
          <span className="ml-2 font-mono text-sm text-ink-faint">{row.original.entityId.slice(0, 8)}</span>
        )}
      </span>
    ),
  }),
  column.accessor('action', {
    header: 'Action',
    cell: (c) => <span className="font-semibold">{c.getValue()}</span>,
  }),
];

export type AuditTableProps = {
  entries: AuditEntry[];
  selectedId?: number | null;
  onOpen: (entry: AuditEntry) => void;
};

/** One page of the log, newest first as the server sends it; a row opens its before/after. */
export function AuditTable({ entries, selectedId, onOpen }: AuditTableProps) {
  return (
    <DataTable
      data={entries}
      columns={columns}
      label="Audit log"
      enableSorting={false}
      getRowId={(e) => String(e.id)}
      selectedRowId={selectedId != null ? String(selectedId) : null}
      onRowClick={onOpen}
      empty="No entries match these filters."
    />
  );
}
