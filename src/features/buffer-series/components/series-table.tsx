import type { TeamRef } from '@shared/schemas/api-types';
import type { SeriesSummary } from '@shared/schemas/buffer-series';
import { DataTable } from '@/components/ui/data-table';
import { seriesColumns } from './series-columns';

export type SeriesTableProps = { series: SeriesSummary[]; teams: TeamRef[] };

/** Saved series; the list answer has team ids only, the team names come from the caller. */
export function SeriesTable({ series, teams }: SeriesTableProps) {
  const rows = series.map((s) => ({ ...s, teamName: teams.find((t) => t.id === s.teamId)?.name ?? '—' }));
  const teamNames = [...new Set(rows.map((r) => r.teamName))].sort();
  return (
    <DataTable
      data={rows}
      columns={seriesColumns}
      label="Buffer series"
      getRowId={(s) => s.id}
      search={{ label: 'Search', placeholder: 'Name, team or author' }}
      filters={
        teamNames.length > 1
          ? [{ columnId: 'teamName', label: 'Team', options: teamNames.map((t) => ({ value: t, label: t })) }]
          : []
      }
      initialSorting={[{ id: 'updatedAt', desc: true }]}
      empty="No saved series yet."
    />
  );
}
