// Cells of the comparison table: a value over its 95 % interval, and a difference to the reference
// over its interval, highlighted only when the interval excludes no difference (`clear`).
import type { ComparisonMetric, MetricDifference, MetricValue } from '@shared/comparison/compare';
import {
  formatDifference,
  formatDifferenceInterval,
  formatMetric,
  formatMetricInterval,
} from '../utils/format';

const none = <span className="text-ink-faint">—</span>;

export type ValueCellProps = { metric: ComparisonMetric; value: MetricValue; unit?: string };

export function ValueCell({ metric, value, unit }: ValueCellProps) {
  if (value.value === null) return none;
  return (
    <span className="inline-flex flex-col items-end leading-tight">
      <span className="tabular-nums">
        {formatMetric(metric, value.value, value.ci95)}
        {unit && <span className="ml-0.5 text-xs text-ink-muted">{unit}</span>}
      </span>
      {value.ci95 && (
        <span className="text-xs whitespace-nowrap text-ink-muted tabular-nums">
          {formatMetricInterval(metric, value.value, value.ci95)}
        </span>
      )}
    </span>
  );
}

export type DifferenceCellProps = {
  metric: ComparisonMetric;
  difference: MetricDifference | null;
  isReference: boolean;
};

export function DifferenceCell({ metric, difference, isReference }: DifferenceCellProps) {
  if (isReference) return <span className="text-sm text-ink-muted">reference</span>;
  if (!difference || difference.value === null) return none;
  const clear = difference.clear;
  return (
    <span
      data-clear={clear || undefined}
      title={
        clear
          ? 'Clear difference: the 95 % interval excludes no difference.'
          : 'Within error: the 95 % interval includes no difference.'
      }
      className={`inline-flex flex-col items-end rounded px-1 leading-tight ${clear ? 'bg-accent-100 font-semibold text-accent-900 print:border print:border-accent-700' : ''}`}
    >
      <span className="tabular-nums">
        {formatDifference(metric, difference.value)}
        {clear && <span className="sr-only"> (clear difference)</span>}
      </span>
      {difference.ci95 && (
        <span
          className={`text-xs whitespace-nowrap tabular-nums ${clear ? 'text-accent-800' : 'text-ink-muted'}`}
        >
          {formatDifferenceInterval(metric, difference.ci95)}
        </span>
      )}
    </span>
  );
}
