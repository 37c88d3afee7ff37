// Which interval a report shows beside a fitted value: the bootstrap percentile interval when the
// study's bootstrap is current, else the profile-likelihood interval, else the t interval
// (value ± t·SE). The report names the kind beside each table.
import type { Interval } from '@shared/fitting';
import { formatFixed, formatSig } from '@/components/ui/numbers';

export type Estimated = {
  value: number | null;
  ci95: [number, number] | null;
  profile95?: Interval | null;
  boot95?: Interval | null;
};

export type IntervalKind = 'bootstrap' | 'profile' | 't';

export const intervalWords: Record<IntervalKind, string> = {
  bootstrap: '95 % bootstrap percentile interval',
  profile: '95 % profile-likelihood interval',
  t: '95 % t interval (value ± t·SE)',
};

export function chooseInterval(
  e: Estimated | null | undefined,
  bootstrapCurrent: boolean,
): { kind: IntervalKind; interval: Interval } | null {
  if (!e) return null;
  if (bootstrapCurrent && e.boot95) return { kind: 'bootstrap', interval: e.boot95 };
  if (e.profile95) return { kind: 'profile', interval: e.profile95 };
  if (e.ci95) return { kind: 't', interval: e.ci95 };
  return null;
}

/** pH-like values to two decimals, others to three significant figures; an open end says so. */
export function formatEstimate(value: number | null | undefined, phLike: boolean) {
  return phLike ? formatFixed(value, 2) : formatSig(value, 3);
}

export function formatIntervalText(interval: Interval | null | undefined, phLike: boolean) {
  if (!interval) return '';
  const end = (v: number | null) => (v === null ? 'open' : formatEstimate(v, phLike));
  return `${end(interval[0])} to ${end(interval[1])}`;
}
