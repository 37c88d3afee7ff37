// A fitted value with its interval, as the tables write it: "3.73 (3.69 to 3.77)". Intervals of
// nonlinear fits need not be symmetric, so both ends are written; an open end says "open".
import type { Interval } from '@shared/fitting';
import { formatFixed, formatSig } from '@/components/ui/numbers';

export type NumberStyle = { decimals: number } | { sig: number };

export function formatNumber(value: number | null | undefined, style: NumberStyle): string {
  return 'decimals' in style ? formatFixed(value, style.decimals) : formatSig(value, style.sig);
}

/** Significant figures for a value from the width of its interval: two figures of the half-width. */
export function sigFor(value: number | null, interval: Interval | null, fallback = 3): number {
  if (value === null || !interval || interval[0] === null || interval[1] === null) return fallback;
  const half = Math.abs(interval[1] - interval[0]) / 2;
  if (!(half > 0) || value === 0) return fallback;
  const figures = Math.floor(Math.log10(Math.abs(value))) - Math.floor(Math.log10(half)) + 2;
  return Math.min(6, Math.max(2, figures));
}

export function formatInterval(interval: Interval | null, style: NumberStyle): string {
  if (!interval) return '';
  const [lo, hi] = interval;
  const end = (v: number | null) => (v === null ? 'open' : formatNumber(v, style));
  return `${end(lo)} to ${end(hi)}`;
}
