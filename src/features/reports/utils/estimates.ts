// How a report writes a fitted value and its interval (the interval is chosen by pickInterval in
// src/lib/intervals.ts, as on the analysis screen); the report names the kind beside each table.
import type { Interval } from '@shared/fitting';
import { formatFixed, formatSig } from '@/components/ui/numbers';
/** pH-like values to two decimals, others to three significant figures; an open end says so. */
export function formatEstimate(value: number | null | undefined, phLike: boolean) {
  return phLike ? formatFixed(value, 2) : formatSig(value, 3);
}

export function formatIntervalText(interval: Interval | null | undefined, phLike: boolean) {
  if (!interval) return '';
  const end = (v: number | null) => (v === null ? 'open' : formatEstimate(v, phLike));
  return `${end(interval[0])} to ${end(interval[1])}`;
}
