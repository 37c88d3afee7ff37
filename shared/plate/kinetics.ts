/**
 * Initial rates from kinetic reads: the OLS slope of signal against time over a window
 * (SCIENCE.md §3.1), chosen automatically (kinetic-window.ts states the criterion) or by the user.
 *
 * Times are in the trace's own unit (reader blocks give seconds, `times_s`), so the slope is signal per
 * that unit. Reads that are null or not numbers are skipped ('missing_values'); reads above the reader's
 * linear range are left out ('above_linear_range'; default 2.5 absorbance units, common practice;
 * pass null for no limit, e.g. fluorescence). Reads earlier than first time + lag are skipped.
 */
import { fitLine, type LineFit } from '../stats/linear-regression';
import { studentTQuantile } from '../stats/t-distribution';
import type { PlateFlag } from './flags';
import { isArray, isFiniteNumber } from './input';
import {
  curvatureT,
  findAutoWindow,
  isAccelerating,
  isCurved,
  isNonMonotonic,
  type Reads,
} from './kinetic-window';
import { fail, finiteOrNull, ok, type PlateResult } from './result';
import { checkRateOptions, type RateOptions, type ResolvedRateOptions } from './rate-options';

export type { RateOptions } from './rate-options';

export interface KineticTrace {
  times: readonly number[];
  values: readonly (number | null)[];
}

export interface InitialRate {
  method: 'auto' | 'user';
  /** Signal per time unit; null when no rate could be computed (see flags). */
  slope: number | null;
  slopeSe: number | null;
  /** Fitted signal at time 0 of the time axis. */
  intercept: number | null;
  r2: number | null;
  /** Reads in the fit. */
  n: number;
  /** Times of the first and last read in the fit. */
  window: { start: number; end: number } | null;
  /** Indices (into times/values) of the first and last read in the fit. */
  indices: { first: number; last: number } | null;
  /** Automatic method only: the first window's slope interval that longer windows had to stay inside. */
  firstSlopeInterval: [number, number] | null;
  /** t statistic of the quadratic term over the window (curvature test). */
  curvatureT: number | null;
  flags: PlateFlag[];
}

function validateTrace(trace: unknown): string | null {
  if (typeof trace !== 'object' || trace === null) return 'A kinetic trace needs times and values.';
  const { times, values } = trace as Record<string, unknown>;
  if (!isArray(times) || !isArray(values))
    return 'A kinetic trace needs a list of times and a list of values.';
  return null;
}

function emptyRate(method: InitialRate['method'], flags: PlateFlag[], n = 0): InitialRate {
  return {
    method,
    slope: null,
    slopeSe: null,
    intercept: null,
    r2: null,
    n,
    window: null,
    indices: null,
    firstSlopeInterval: null,
    curvatureT: null,
    flags,
  };
}

/** Reads eligible for a fit, with the flags raised while selecting them. */
function usableReads(trace: KineticTrace, options: ResolvedRateOptions, flags: Set<PlateFlag>): Reads {
  const t: number[] = [];
  const y: number[] = [];
  const index: number[] = [];
  if (trace.times.length === 0) return { t: new Float64Array(0), y: new Float64Array(0), index };
  const from = trace.times[0] + options.lag;
  for (let i = 0; i < trace.times.length; i++) {
    const time = trace.times[i];
    if (time < from) continue;
    if (options.window && (time < options.window.start || time > options.window.end)) continue;
    const value = trace.values[i];
    if (!isFiniteNumber(value)) {
      flags.add('missing_values');
      continue;
    }
    if (options.linearRangeMax !== null && value > options.linearRangeMax) {
      flags.add('above_linear_range');
      continue;
    }
    t.push(time);
    y.push(value);
    index.push(i);
  }
  return { t: Float64Array.from(t), y: Float64Array.from(y), index };
}

function describe(
  reads: Reads,
  length: number,
  fit: LineFit,
  flags: Set<PlateFlag>,
  options: ResolvedRateOptions,
): void {
  if (fit.r2 === null) flags.add('constant_signal');
  if (isCurved(reads, 0, length, options.curvatureAlpha)) flags.add('curvature');
  if (isNonMonotonic(reads, 0, length, fit.slope)) flags.add('non_monotonic');
  const tc = fit.dof > 0 ? studentTQuantile(0.975, fit.dof) : null;
  if (fit.slopeSe !== null && tc !== null && Math.abs(fit.slope) <= tc * fit.slopeSe)
    flags.add('slope_not_significant');
}

/** Initial rate of one well's kinetic trace. */
export function initialRate(trace: KineticTrace, options: RateOptions = {}): PlateResult<InitialRate> {
  const traceProblem = validateTrace(trace);
  if (traceProblem) return fail('invalid_input', traceProblem);
  const resolved = checkRateOptions(options);
  if (!resolved.ok) return resolved;
  const opts = resolved.value;
  const { times, values } = trace;
  if (times.length !== values.length) {
    return fail('length_mismatch', `The trace has ${times.length} times but ${values.length} values.`);
  }
  for (let i = 0; i < times.length; i++) {
    if (!isFiniteNumber(times[i]))
      return fail('invalid_input', `Time ${i + 1} is not a number (${String(times[i])}).`);
    if (i > 0 && !(times[i] > times[i - 1])) {
      return fail(
        'unsorted_times',
        `Times must increase: time ${i + 1} (${times[i]}) follows ${times[i - 1]}.`,
      );
    }
  }
  const method = opts.window ? 'user' : 'auto';
  const flags = new Set<PlateFlag>();
  const reads = usableReads(trace, opts, flags);
  const available = reads.t.length;
  if (available < opts.minPoints) return ok(emptyRate(method, [...flags, 'too_few_points'], available));

  let length = available;
  let firstSlopeInterval: [number, number] | null = null;
  if (!opts.window) {
    const auto = findAutoWindow(reads, opts);
    if (!auto) return ok(emptyRate(method, [...flags, 'not_computable'], available));
    length = auto.length;
    firstSlopeInterval = auto.firstSlopeInterval;
  }
  const fit = fitLine(reads.t, reads.y, 0, length);
  if (!fit) return ok(emptyRate(method, [...flags, 'not_computable'], length));
  describe(reads, length, fit, flags, opts);
  if (isAccelerating(reads, length, fit, opts.minPoints)) flags.add('accelerating');
  const interval = firstSlopeInterval?.every(Number.isFinite) ? firstSlopeInterval : null;
  return ok({
    method,
    slope: finiteOrNull(fit.slope),
    slopeSe: finiteOrNull(fit.slopeSe),
    intercept: finiteOrNull(fit.intercept),
    r2: finiteOrNull(fit.r2),
    n: fit.n,
    window: { start: reads.t[0], end: reads.t[length - 1] },
    indices: { first: reads.index[0], last: reads.index[length - 1] },
    firstSlopeInterval: interval,
    curvatureT: finiteOrNull(curvatureT(reads, 0, length)),
    flags: [...flags],
  });
}

/** Initial rates of every well of a kinetic block (one time axis, values per well). */
export function initialRates(
  times: readonly number[],
  wells: Readonly<Record<string, readonly (number | null)[]>>,
  options: RateOptions = {},
): PlateResult<Record<string, PlateResult<InitialRate>>> {
  if (!isArray(times)) return fail('invalid_input', 'A kinetic block needs a list of times.');
  if (typeof wells !== 'object' || wells === null)
    return fail('invalid_input', 'A kinetic block needs values per well.');
  const out: Record<string, PlateResult<InitialRate>> = {};
  for (const [well, values] of Object.entries(wells)) out[well] = initialRate({ times, values }, options);
  return ok(out);
}
