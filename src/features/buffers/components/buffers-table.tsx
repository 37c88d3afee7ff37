import type { ReactNode } from 'react';
import type { BufferSummary } from '@shared/schemas/buffers-types';
import { DataTable } from '@/components/ui/data-table';
import { bufferColumns } from './buffer-columns';

export type BuffersTableProps = { buffers: BufferSummary[]; toolbar?: ReactNode };

export function BuffersTable({ buffers, toolbar }: BuffersTableProps) {
  return (
    <DataTable
      data={buffers}
      columns={bufferColumns}
      label="Buffer systems"
      getRowId={(b) => b.id}
      search={{ label: 'Search', placeholder: 'Name or alias' }}
      filters={[
        {
          columnId: 'origin',
          label: 'Origin',
          options: [
            { value: 'Built-in', label: 'Built-in' },
            { value: 'Lab', label: 'Lab' },
          ],
        },
      ]}
      initialSorting={[{ id: 'pKa25', desc: false }]}
      empty="The library is empty."
      toolbar={toolbar}
    />
  );
}
