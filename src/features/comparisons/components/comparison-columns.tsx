// Columns of the comparison table: the profile (variant and study, with its marks), then each
// quantity with its interval and its difference to the reference. Values are sorted as numbers;
// a missing value sorts last.
import { createColumnHelper } from '@tanstack/react-table';
import { comparisonMetrics, type ComparisonMetric, type ComparisonRow } from '@shared/comparison/compare';
import { Badge } from '@/components/ui/badge';
import type { ProfileStyle } from '../utils/colors';
import { modelWords } from '../utils/format';
import { DifferenceCell, ValueCell } from './metric-cells';
import { LineSwatch } from './line-swatch';

const column = createColumnHelper<ComparisonRow>();

/** Short column titles; the long names come from shared/comparison (metricLabels). */
export const metricHeaders: Record<ComparisonMetric, string> = {
  pHopt: 'pH optimum',
  pKa1: 'apparent pKa1',
  pKa2: 'apparent pKa2',
  windowLo: 'half-activity low pH',
  windowHi: 'half-activity high pH',
  windowWidth: 'half-activity width',
  maxActivity: 'maximum activity',
};

export const differenceHeaders: Record<ComparisonMetric, string> = {
  pHopt: 'Δ optimum',
  pKa1: 'Δ pKa1',
  pKa2: 'Δ pKa2',
  windowLo: 'Δ low pH',
  windowHi: 'Δ high pH',
  windowWidth: 'Δ width',
  maxActivity: 'max. activity vs reference',
};

export type ColumnChoice = { id: string; label: string };

/** Every choosable column, in table order. */
export const choosableColumns: ColumnChoice[] = comparisonMetrics.flatMap((m) => [
  { id: m, label: metricHeaders[m] },
  {
    id: `d_${m}`,
    label:
      m === 'maxActivity'
        ? 'maximum activity relative to the reference'
        : `${differenceHeaders[m]} (difference to the reference)`,
  },
]);

export const defaultColumns = [
  'pHopt',
  'd_pHopt',
  'pKa1',
  'd_pKa1',
  'pKa2',
  'd_pKa2',
  'windowWidth',
  'd_windowWidth',
  'd_maxActivity',
];

const numeric = (value: number | null) => value ?? undefined;

export function comparisonColumns(styles: Record<string, ProfileStyle>, units: Record<string, string>) {
  return [
    column.accessor('variantName', {
      header: 'Variant',
      cell: ({ row }) => <ProfileCell row={row.original} style={styles[row.original.key]} />,
    }),
    column.accessor('studyName', {
      id: 'study',
      header: 'Study',
      cell: ({ row }) => (
        <span className="inline-flex flex-col gap-0.5">
          <span>{row.original.studyName}</span>
          {!row.original.approved && (
            <span>
              <Badge tone="warning">not approved</Badge>
            </span>
          )}
        </span>
      ),
    }),
    ...comparisonMetrics.flatMap((m) => [
      column.accessor((r) => numeric(r.metrics[m].value), {
        id: m,
        header: metricHeaders[m],
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: ({ row }) => (
          <ValueCell
            metric={m}
            value={row.original.metrics[m]}
            unit={m === 'maxActivity' ? units[row.original.key] : undefined}
          />
        ),
      }),
      column.accessor((r) => numeric(r.differences[m]?.value ?? null), {
        id: `d_${m}`,
        header: differenceHeaders[m],
        sortUndefined: 'last',
        meta: { numeric: true, className: 'border-r border-line' },
        cell: ({ row }) => (
          <DifferenceCell
            metric={m}
            difference={row.original.differences[m]}
            isReference={row.original.isReference}
          />
        ),
      }),
    ]),
  ];
}

function ProfileCell({ row, style }: { row: ComparisonRow; style?: ProfileStyle }) {
  return (
    <div className="min-w-36">
      <p className="flex items-center gap-1.5 font-semibold whitespace-nowrap">
        <LineSwatch style={style} />
        {row.variantName}
      </p>
      <p className="mt-0.5 flex flex-wrap gap-1">
        {row.isReference && <Badge tone="accent">reference</Badge>}
        {row.model && <span className="text-xs text-ink-muted">{modelWords[row.model] ?? row.model}</span>}
      </p>
      {row.error && <p className="mt-1 max-w-56 text-sm text-danger-600">{row.error}</p>}
      {row.comparability.length > 0 && (
        <p className="mt-1" title={row.comparability.join(' ')}>
          <Badge tone="warning">not directly comparable</Badge>
        </p>
      )}
    </div>
  );
}
