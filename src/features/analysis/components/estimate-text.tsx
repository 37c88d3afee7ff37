// A fitted value over its interval, with a mark saying which interval it is (t, p, b).
import { formatInterval, formatNumber, sigFor, type NumberStyle } from '../utils/format-estimate';
import { intervalMarks } from '@/lib/intervals';
import type { EstimateCell } from '../utils/parameter-rows';

export type EstimateTextProps = { cell: EstimateCell | null; style: NumberStyle | 'auto' };

export function EstimateText({ cell, style }: EstimateTextProps) {
  if (!cell) return <span className="text-ink-faint">—</span>;
  if (cell.notDetermined) {
    return (
      <span
        className="text-sm text-warn-800"
        title="The data do not fix this value (e.g. a pKa beyond the measured range)."
      >
        {cell.name ? `${cell.name}: ` : ''}not determined
      </span>
    );
  }
  const numberStyle = style === 'auto' ? { sig: sigFor(cell.value, cell.interval) } : style;
  const mark = cell.kind ? intervalMarks[cell.kind] : null;
  return (
    <span className="inline-flex flex-col items-end leading-tight">
      <span className="tabular-nums">
        {cell.name && <span className="mr-1 text-xs text-ink-muted">{cell.name}</span>}
        {formatNumber(cell.value, numberStyle)}
      </span>
      {cell.interval && (
        <span className="text-xs whitespace-nowrap text-ink-muted tabular-nums">
          {formatInterval(cell.interval, numberStyle)}
          {mark && (
            <abbr title={mark.words} className="ml-1 no-underline">
              {mark.mark}
            </abbr>
          )}
        </span>
      )}
    </span>
  );
}
