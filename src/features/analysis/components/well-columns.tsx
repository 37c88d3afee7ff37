import { createColumnHelper } from '@tanstack/react-table';
import type { Units, WellRow } from '@shared/analysis';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { flagLabel, flagSentence, roleWords, windowSourceWords } from '../utils/words';

export type WellTableRow = WellRow & { variantName: string };

const col = createColumnHelper<WellTableRow>();
const num = (v: number | null) => v ?? Number.NEGATIVE_INFINITY;

export function wellColumns(units: Units, flagText: Record<string, string>) {
  return [
    col.accessor('well', {
      header: 'Well',
      sortingFn: (a, b) => wellOrder(a.original.well) - wellOrder(b.original.well),
      cell: (c) => {
        const r = c.row.original;
        return (
          <span className="inline-flex items-center gap-1 font-semibold whitespace-nowrap">
            {r.well}
            {r.outlier && (
              <abbr
                title={`Outlier within its replicates (modified z-score ${formatSig(r.outlierScore, 2)}); a flag only`}
                className="rounded bg-warn-50 px-1 text-xs font-normal text-warn-800 no-underline"
              >
                outlier
              </abbr>
            )}
          </span>
        );
      },
    }),
    col.accessor((r) => (r.role === 'sample' ? r.variantName : (roleWords[r.role] ?? r.role)), {
      id: 'variant',
      header: 'Variant or role',
      cell: (c) => {
        const r = c.row.original;
        return r.role === 'sample' ? (
          r.variantName
        ) : (
          <span className="text-ink-muted italic">{roleWords[r.role] ?? r.role}</span>
        );
      },
    }),
    col.accessor((r) => num(r.pH), {
      id: 'pH',
      header: 'pH',
      meta: { numeric: true },
      cell: (c) => formatFixed(c.row.original.pH, 2),
    }),
    col.accessor((r) => num(r.signal), {
      id: 'signal',
      header: `Signal (${units.signal})`,
      meta: { numeric: true },
      cell: (c) => formatSig(c.row.original.signal, 3),
    }),
    col.accessor((r) => r.window?.endS ?? -1, {
      id: 'window',
      header: 'Window (s)',
      meta: { numeric: true },
      cell: (c) => {
        const w = c.row.original.window;
        if (!w || w.startS === null || w.endS === null) return '—';
        const set = w.source === 'well' || w.source === 'variant' || w.source === 'plate';
        return (
          <span
            className="whitespace-nowrap"
            title={`Rate window ${w.startS}–${w.endS} s, ${windowSourceWords[w.source]}`}
          >
            {set && (
              <span className="mr-1 rounded bg-accent-100 px-1 text-xs text-accent-900">{w.source}</span>
            )}
            {w.startS}–{w.endS}
          </span>
        );
      },
    }),
    col.accessor((r) => num(r.r2), {
      id: 'r2',
      header: 'r²',
      meta: { numeric: true },
      cell: (c) => formatFixed(c.row.original.r2, 3),
    }),
    col.accessor((r) => num(r.blank?.mean ?? null), {
      id: 'blank',
      header: 'Blank',
      meta: { numeric: true },
      cell: (c) => formatSig(c.row.original.blank?.mean, 3),
    }),
    col.accessor((r) => num(r.corrected), {
      id: 'corrected',
      header: 'Corrected',
      meta: { numeric: true },
      cell: (c) => formatSig(c.row.original.corrected, 3),
    }),
    col.accessor((r) => num(r.activity), {
      id: 'activity',
      header: `Activity (${units.activity})`,
      meta: { numeric: true },
      cell: (c) => {
        const r = c.row.original;
        return (
          <span className="whitespace-nowrap">
            {formatSig(r.activity, 3)}
            {r.activitySe !== null && (
              <span className="text-xs text-ink-muted"> ± {formatSig(r.activitySe, 2)}</span>
            )}
          </span>
        );
      },
    }),
    col.accessor((r) => r.flags.length, {
      id: 'flags',
      header: 'Flags',
      cell: (c) => {
        const flags = c.row.original.flags.filter((f) => f !== 'outlier');
        if (flags.length === 0) return null;
        return (
          <span
            className="block max-w-28 truncate text-xs text-warn-800"
            title={flags.map((f) => flagSentence(flagText, f)).join('\n')}
          >
            {flags.map(flagLabel).join(', ')}
          </span>
        );
      },
    }),
    col.accessor((r) => (r.excluded ? 1 : 0), {
      id: 'excluded',
      header: 'Excluded',
      cell: (c) => {
        const r = c.row.original;
        if (!r.excluded) return null;
        return (
          <span className="block max-w-32 truncate text-xs" title={r.exclusion?.reason}>
            <span className="font-semibold">excluded</span>: {r.exclusion?.reason}
          </span>
        );
      },
    }),
  ];
}

/** A1, A2, …, A12, B1: row letter first, then the column number. */
export function wellOrder(well: string) {
  return (well.charCodeAt(0) - 65) * 100 + Number(well.slice(1));
}
