import { pickInterval, type Estimated } from '@/lib/intervals';
import { formatEstimate, formatIntervalText } from '../utils/estimates';

export type EstimateCellProps = {
  estimate: Estimated | null | undefined;
  phLike: boolean;
  bootstrapCurrent: boolean;
};

/** A fitted value over its interval, for the report tables. */
export function EstimateCell({ estimate, phLike, bootstrapCurrent }: EstimateCellProps) {
  if (!estimate || estimate.value === null) return <span className="text-ink-faint">—</span>;
  const chosen = pickInterval(estimate, bootstrapCurrent);
  return (
    <span className="inline-flex flex-col items-end leading-tight">
      <span className="tabular-nums">{formatEstimate(estimate.value, phLike)}</span>
      {chosen && (
        <span className="text-xs whitespace-nowrap text-ink-muted tabular-nums">
          {formatIntervalText(chosen.interval, phLike)}
        </span>
      )}
    </span>
  );
}
