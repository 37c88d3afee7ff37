// Which interval a value is shown with, on the analysis screen and in the printed reports alike. Bootstrap percentile intervals when a current bootstrap
// exists, else profile-likelihood intervals (honest for nonlinear fits, SCIENCE.md §1.7), else the
// Wald interval value ± t(0.975, dof)·SE. The screen always says which one it shows.
import type { Interval } from '@shared/fitting';

export type IntervalKind = 'bootstrap' | 'profile' | 't';

export type Estimated = {
  value: number | null;
  ci95: [number, number] | null;
  profile95?: Interval | null;
  boot95?: Interval | null;
};

export type ChosenInterval = { kind: IntervalKind; interval: Interval };

export function pickInterval(
  e: Estimated | null | undefined,
  bootstrapCurrent: boolean,
): ChosenInterval | null {
  if (!e) return null;
  if (bootstrapCurrent && e.boot95) return { kind: 'bootstrap', interval: e.boot95 };
  if (e.profile95) return { kind: 'profile', interval: e.profile95 };
  if (e.ci95) return { kind: 't', interval: e.ci95 };
  return null;
}

/** The short mark beside an interval, and what it means. */
export const intervalMarks: Record<IntervalKind, { mark: string; words: string }> = {
  t: { mark: 't', words: '95 % t interval (value ± t·SE)' },
  profile: { mark: 'p', words: '95 % profile-likelihood interval' },
  bootstrap: { mark: 'b', words: '95 % bootstrap percentile interval' },
};
