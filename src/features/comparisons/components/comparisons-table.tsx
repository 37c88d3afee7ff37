// Saved comparisons of the user's teams: name, reference, profiles, who saved it and when.
import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router';
import { DataTable } from '@/components/ui/data-table';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import type { SavedComparisonItem } from '../api/get-comparisons';

/** A profile's words, from the list of available profiles (the saved list carries keys only). */
export type ProfileNames = Map<string, { variantName: string; studyName: string }>;

type Row = SavedComparisonItem & { reference: string; profiles: string };

const column = createColumnHelper<Row>();

const columns = [
  column.accessor('name', {
    header: 'Comparison',
    cell: ({ row }) => (
      <Link
        to={paths.comparison.href(row.original.id)}
        className="font-semibold text-accent-700 hover:underline"
      >
        {row.original.name}
      </Link>
    ),
  }),
  column.accessor('reference', { header: 'Reference' }),
  column.accessor('profiles', {
    header: 'Profiles',
    cell: ({ row }) => (
      <span>
        <span className="font-semibold tabular-nums">{row.original.entries.length}</span>{' '}
        <span className="text-ink-muted">{row.original.profiles}</span>
        {row.original.includeUnapproved && (
          <span className="ml-1 text-sm text-warn-800">(may include unapproved)</span>
        )}
      </span>
    ),
  }),
  column.accessor('createdByName', { header: 'Saved by' }),
  column.accessor('updatedAt', {
    header: 'Changed',
    meta: { numeric: true, className: 'whitespace-nowrap' },
    cell: (c) => formatDate(c.getValue()),
  }),
];

export type ComparisonsTableProps = { items: SavedComparisonItem[]; names: ProfileNames };

export function ComparisonsTable({ items, names }: ComparisonsTableProps) {
  const label = (key: string) => {
    const n = names.get(key);
    return n ? n.variantName : 'a profile no longer available';
  };
  const rows: Row[] = items.map((c) => ({
    ...c,
    reference: names.get(c.referenceKey)
      ? `${names.get(c.referenceKey)!.variantName} — ${names.get(c.referenceKey)!.studyName}`
      : '—',
    profiles: c.entries.map((e) => label(`${e.studyId}:${e.variantId}`)).join(', '),
  }));
  return (
    <DataTable
      data={rows}
      columns={columns}
      label="Saved comparisons"
      getRowId={(r) => r.id}
      search={{ label: 'Search', placeholder: 'Name, variant or person' }}
      initialSorting={[{ id: 'updatedAt', desc: true }]}
      empty="No saved comparisons yet."
    />
  );
}
