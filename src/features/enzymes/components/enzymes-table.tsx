import type { ReactNode } from 'react';
import type { EnzymeSummary } from '@shared/schemas/records-types';
import { DataTable } from '@/components/ui/data-table';
import { enzymeColumns } from './enzyme-columns';

export type EnzymesTableProps = { enzymes: EnzymeSummary[]; toolbar?: ReactNode };

export function EnzymesTable({ enzymes, toolbar }: EnzymesTableProps) {
  const teams = [...new Set(enzymes.map((e) => e.teamName))].sort();
  return (
    <DataTable
      data={enzymes}
      columns={enzymeColumns}
      label="Enzymes"
      getRowId={(e) => e.id}
      search={{ label: 'Search', placeholder: 'Name, organism or team' }}
      filters={
        teams.length > 1
          ? [{ columnId: 'teamName', label: 'Team', options: teams.map((t) => ({ value: t, label: t })) }]
          : []
      }
      initialSorting={[{ id: 'name', desc: false }]}
      empty="No enzymes yet."
      toolbar={toolbar}
    />
  );
}
