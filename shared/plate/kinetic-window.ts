/**
 * The automatic linear window of a progress curve (SCIENCE.md §3.1), and the per-window diagnostics.
 *
 * Criterion (exact). Let the usable reads be those after the lag, numeric and within the reader's
 * linear range, in time order, and p the minimum window (default 5 reads).
 *  1. Fit the first p reads by OLS: slope b_p, standard error SE_p. Its confidence interval is
 *     b_p ± t(1 − (1 − conf)/2, p − 2)·max(SE_p, δ/√(12·Sxx_p))  (conf = 0.95 by default), where δ,
 *     the reader's resolution, is estimated as the smallest non-zero step between successive reads:
 *     a rounding error of width δ has SD δ/√12, so a first window of identical or exactly collinear
 *     reads (SE_p = 0) still gets an interval as wide as the data's own precision.
 *  2. For every k = p … N, fit the first k reads. Window k is linear when
 *     (a) its slope b_k lies inside the first window's interval, and
 *     (b) its residuals show no curvature: the quadratic coefficient of a parabola fitted to the same
 *         k reads is not significant, |b2/SE(b2)| ≤ t(1 − α/2, k − 3), α = 0.05 (tested from k ≥ 4).
 *  3. The window is the longest k that is linear. If none is (the first p reads already bend), the
 *     first p reads are used and the result is flagged 'curvature'.
 * Windows grow from the first read, so the result is always an early stretch.
 */
import { fitLine, fitQuadratic, type LineFit } from '../stats/linear-regression';
import { studentTQuantile } from '../stats/t-distribution';

/** Usable reads in time order: times, values and their indices in the input arrays. */
export interface Reads {
  t: Float64Array;
  y: Float64Array;
  index: number[];
}

export interface WindowCriteria {
  minPoints: number;
  confidence: number;
  curvatureAlpha: number;
}

export interface AutoWindow {
  /** Number of reads (from the first usable one) in the chosen window. */
  length: number;
  /** true when even the first window bends. */
  curvedFromStart: boolean;
  firstSlopeInterval: [number, number];
}

const tCache = new Map<string, number>();

/** t quantile, cached: the window search asks for the same few values thousands of times per plate. */
function tCritical(probability: number, dof: number): number {
  const key = `${probability}:${dof}`;
  let v = tCache.get(key);
  if (v === undefined) {
    v = studentTQuantile(probability, dof) ?? Infinity;
    if (tCache.size < 10_000) tCache.set(key, v);
  }
  return v;
}

/** The quadratic-term t statistic of reads [from, to), or null when it cannot be tested (fewer than 4). */
export function curvatureT(reads: Reads, from: number, to: number): number | null {
  if (to - from < 4) return null;
  const fit = fitQuadratic(reads.t, reads.y, from, to);
  return fit ? fit.tQuadratic : null;
}

/** Whether reads [from, to) bend significantly at level α (two-sided test of the quadratic term). */
export function isCurved(reads: Reads, from: number, to: number, alpha: number): boolean {
  const t = curvatureT(reads, from, to);
  if (t === null) return false;
  return Math.abs(t) > tCritical(1 - alpha / 2, to - from - 3);
}

/** δ: the smallest non-zero |y_{i+1} − y_i| of successive reads (0 when every read is the same). */
function readerResolution(reads: Reads): number {
  let delta = Infinity;
  for (let i = 1; i < reads.y.length; i++) {
    const d = Math.abs(reads.y[i] - reads.y[i - 1]);
    if (d > 0 && d < delta) delta = d;
  }
  return Number.isFinite(delta) ? delta : 0;
}

/** Applies the criterion above; null when fewer than minPoints usable reads or no line can be fitted. */
export function findAutoWindow(reads: Reads, criteria: WindowCriteria): AutoWindow | null {
  const p = criteria.minPoints;
  const n = reads.t.length;
  if (n < p) return null;
  const first = fitLine(reads.t, reads.y, 0, p);
  if (!first || first.slopeSe === null) return null;
  const resolutionSe = readerResolution(reads) / Math.sqrt(12 * first.sxx);
  const half = tCritical(1 - (1 - criteria.confidence) / 2, p - 2) * Math.max(first.slopeSe, resolutionSe);
  const lo = first.slope - half;
  const hi = first.slope + half;
  let best = 0;
  for (let k = p; k <= n; k++) {
    const fit = fitLine(reads.t, reads.y, 0, k);
    if (!fit || fit.slope < lo || fit.slope > hi) continue;
    if (isCurved(reads, 0, k, criteria.curvatureAlpha)) continue;
    best = k;
  }
  return { length: best === 0 ? p : best, curvedFromStart: best === 0, firstSlopeInterval: [lo, hi] };
}

/**
 * 'accelerating': some later stretch of minPoints reads, starting after the window ends, is steeper than
 * the window by more than 4 combined standard errors (|b_j| − |b_w| > 4·√(SE_j² + SE_w²) + 1e-9·|b_w|).
 * Stretches inside the window are not compared, so the natural slowing of a progress curve never flags.
 */
export function isAccelerating(reads: Reads, windowEnd: number, window: LineFit, minPoints: number): boolean {
  if (window.slopeSe === null) return false;
  for (let j = windowEnd; j + minPoints <= reads.t.length; j++) {
    const fit = fitLine(reads.t, reads.y, j, j + minPoints);
    if (!fit || fit.slopeSe === null) continue;
    const margin = 4 * Math.hypot(fit.slopeSe, window.slopeSe) + 1e-9 * Math.abs(window.slope);
    if (Math.abs(fit.slope) - Math.abs(window.slope) > margin) return true;
  }
  return false;
}

/** 'non_monotonic': more than a third of the successive steps in [from, to) go against the fitted direction. */
export function isNonMonotonic(reads: Reads, from: number, to: number, slope: number): boolean {
  const steps = to - from - 1;
  if (steps < 2) return false;
  const direction = Math.sign(slope);
  let against = 0;
  for (let i = from; i < to - 1; i++) {
    const d = reads.y[i + 1] - reads.y[i];
    if (direction === 0 ? d !== 0 : d * direction < 0) against++;
  }
  return against > steps / 3;
}
