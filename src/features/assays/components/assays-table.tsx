import type { AssayListItem } from '../api/get-assays';
import { DataTable } from '@/components/ui/data-table';
import { detectionLabels, readModeLabels } from '../utils/assay-words';
import { assayColumns } from './assay-columns';

export type AssaysTableProps = { assays: AssayListItem[] };

export function AssaysTable({ assays }: AssaysTableProps) {
  const teams = [...new Set(assays.map((a) => a.teamName))].sort();
  const options = (labels: Record<string, string>) =>
    Object.values(labels).map((l) => ({ value: l, label: l }));
  return (
    <DataTable
      data={assays}
      columns={assayColumns}
      label="Assays"
      getRowId={(a) => a.id}
      search={{ label: 'Search', placeholder: 'Name, substrate or team' }}
      filters={[
        { columnId: 'readMode', label: 'Read mode', options: options(readModeLabels) },
        { columnId: 'detection', label: 'Detection', options: options(detectionLabels) },
        ...(teams.length > 1
          ? [{ columnId: 'teamName', label: 'Team', options: teams.map((t) => ({ value: t, label: t })) }]
          : []),
      ]}
      initialSorting={[{ id: 'name', desc: false }]}
      empty="No assays yet."
    />
  );
}
