import type { ReactNode } from 'react';
import type { StudySummary } from '@shared/schemas/records-types';
import { studyStatuses, studyStatusLabels } from '@shared/schemas/studies';
import { DataTable } from '@/components/ui/data-table';
import { studyColumns } from './study-columns';

export type StudiesTableProps = { studies: StudySummary[]; toolbar?: ReactNode; empty?: ReactNode };

export function StudiesTable({ studies, toolbar, empty = 'No studies yet.' }: StudiesTableProps) {
  const teams = [...new Set(studies.map((s) => s.teamName))].sort();
  return (
    <DataTable
      data={studies}
      columns={studyColumns}
      label="Studies"
      getRowId={(s) => s.id}
      search={{ label: 'Search', placeholder: 'Name, enzyme, assay or owner' }}
      filters={[
        {
          columnId: 'status',
          label: 'Status',
          options: studyStatuses.map((s) => ({ value: studyStatusLabels[s], label: studyStatusLabels[s] })),
        },
        ...(teams.length > 1
          ? [{ columnId: 'teamName', label: 'Team', options: teams.map((t) => ({ value: t, label: t })) }]
          : []),
      ]}
      initialSorting={[{ id: 'updatedAt', desc: true }]}
      empty={empty}
      toolbar={toolbar}
    />
  );
}
