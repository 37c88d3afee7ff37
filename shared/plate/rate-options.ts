/**
 * Options of the initial-rate computation, their defaults and their checks.
 */
import { isFiniteNumber } from './input';
import { fail, ok, type PlateResult } from './result';

export interface RateOptions {
  /** A user-chosen window: reads with start ≤ t ≤ end are fitted; no automatic search. */
  window?: { start: number; end: number };
  /** Skip reads earlier than the first read's time + lag (mixing, temperature equilibration). Default 0. */
  lag?: number;
  /** Fewest reads in a window; at least 3. Default 5. */
  minPoints?: number;
  /** Upper end of the reader's linear range; null for none. Default 2.5 absorbance units (common practice). */
  linearRangeMax?: number | null;
  /** Confidence level of the first window's slope interval. Default 0.95. */
  confidence?: number;
  /** Significance level of the curvature test. Default 0.05. */
  curvatureAlpha?: number;
}

export interface ResolvedRateOptions {
  window: { start: number; end: number } | null;
  lag: number;
  minPoints: number;
  linearRangeMax: number | null;
  confidence: number;
  curvatureAlpha: number;
}

export const DEFAULT_LINEAR_RANGE_MAX = 2.5;
export const DEFAULT_MIN_POINTS = 5;

function inOpenUnit(v: unknown): boolean {
  return isFiniteNumber(v) && v > 0 && v < 1;
}

export function checkRateOptions(options: unknown): PlateResult<ResolvedRateOptions> {
  if (options === undefined || options === null) options = {};
  if (typeof options !== 'object') return fail('invalid_option', 'Rate options must be an object.');
  const o = options as Record<string, unknown>;
  const minPoints = o.minPoints ?? DEFAULT_MIN_POINTS;
  if (!Number.isInteger(minPoints) || (minPoints as number) < 3) {
    return fail(
      'invalid_option',
      `The minimum number of reads must be a whole number of at least 3 (got ${String(minPoints)}).`,
    );
  }
  const lag = o.lag ?? 0;
  if (!isFiniteNumber(lag) || lag < 0)
    return fail('invalid_option', `The lag must be zero or a positive time (got ${String(lag)}).`);
  const linearRangeMax = o.linearRangeMax === undefined ? DEFAULT_LINEAR_RANGE_MAX : o.linearRangeMax;
  if (linearRangeMax !== null && !isFiniteNumber(linearRangeMax)) {
    return fail(
      'invalid_option',
      `The linear-range limit must be a number or null (got ${String(linearRangeMax)}).`,
    );
  }
  const confidence = o.confidence ?? 0.95;
  const curvatureAlpha = o.curvatureAlpha ?? 0.05;
  if (!inOpenUnit(confidence))
    return fail('invalid_option', `Confidence must lie between 0 and 1 (got ${String(confidence)}).`);
  if (!inOpenUnit(curvatureAlpha)) {
    return fail(
      'invalid_option',
      `The curvature test level must lie between 0 and 1 (got ${String(curvatureAlpha)}).`,
    );
  }
  let window: ResolvedRateOptions['window'] = null;
  if (o.window !== undefined && o.window !== null) {
    const w = o.window as Record<string, unknown>;
    if (typeof w !== 'object' || !isFiniteNumber(w.start) || !isFiniteNumber(w.end) || w.start > w.end) {
      return fail('invalid_option', 'A rate window needs a start time and an end time, start not after end.');
    }
    window = { start: w.start, end: w.end };
  }
  return ok({
    window,
    lag,
    minPoints: minPoints as number,
    linearRangeMax: linearRangeMax as number | null,
    confidence: confidence as number,
    curvatureAlpha: curvatureAlpha as number,
  });
}
