// The comparison table on the shared data table: sort by any quantity, search, filter by study,
// choose the columns. Differences are highlighted only when their interval excludes no difference.
import { useMemo, useState } from 'react';
import type { ComparisonResult } from '@shared/comparison/compare';
import { DataTable } from '@/components/ui/data-table';
import type { ProfileStyle } from '../utils/colors';
import { ColumnChooser } from './column-chooser';
import { choosableColumns, comparisonColumns, defaultColumns } from './comparison-columns';

export type ComparisonTableProps = {
  result: ComparisonResult;
  units: Record<string, string>;
  styles: Record<string, ProfileStyle>;
};

export function ComparisonTable({ result, units, styles }: ComparisonTableProps) {
  const [visible, setVisible] = useState<Set<string>>(() => new Set(defaultColumns));
  const all = useMemo(() => comparisonColumns(styles, units), [styles, units]);
  // Hidden columns are left out of the table (the fixed Variant and Study columns always stay).
  const studies = [...new Set(result.rows.map((r) => r.studyName))].sort();
  // One study: it is named above the table, so its column goes.
  const columns = all.filter(
    (c) =>
      (c.id !== 'study' || studies.length > 1) &&
      (!choosableColumns.some((x) => x.id === c.id) || visible.has(c.id ?? '')),
  );
  return (
    <div>
      <DataTable
        data={result.rows}
        columns={columns}
        label="Comparison of profiles"
        getRowId={(r) => r.key}
        search={{ label: 'Search', placeholder: 'Variant or study' }}
        filters={
          studies.length > 1
            ? [{ columnId: 'study', label: 'Study', options: studies.map((s) => ({ value: s, label: s })) }]
            : []
        }
        empty="No profiles chosen."
        toolbar={<ColumnChooser columns={choosableColumns} visible={visible} onChange={setVisible} />}
      />
      <NotComparable rows={result.rows} />
      <p className="mt-2 max-w-5xl text-sm text-ink-muted">
        Values with their 95 % intervals (t interval, value ± t·SE of each fit). {result.method} Highlighted:
        a clear difference. Maximum activity is compared as a ratio to the reference’s.
      </p>
    </div>
  );
}

function NotComparable({ rows }: { rows: ComparisonResult['rows'] }) {
  const flagged = rows.filter((r) => r.comparability.length > 0);
  if (flagged.length === 0) return null;
  return (
    <ul
      aria-label="Not directly comparable"
      className="mt-2 space-y-0.5 rounded border border-warn-200 bg-warn-50 px-3 py-2 text-sm text-warn-800"
    >
      {flagged.map((r) => (
        <li key={r.key}>
          <span className="font-semibold">
            {r.variantName} ({r.studyName})
          </span>
          {r.comparability.length > 0 &&
            `: not directly comparable with the reference. ${r.comparability.join(' ')}`}
          {r.error && ` ${r.error}`}
        </li>
      ))}
    </ul>
  );
}
