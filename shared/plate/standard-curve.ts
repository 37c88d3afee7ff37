/**
 * Standard curves: signal = a + b·concentration fitted by OLS to the standards, then read backwards.
 *
 * Inverse prediction of the concentration behind a mean of m signals y0 (classical calibration;
 * Draper & Smith, Applied Regression Analysis, 3rd ed. 1998, §3.2 [memory]; Miller & Miller,
 * Statistics and Chemometrics for Analytical Chemistry [memory]):
 *   x0 = (y0 − a)/b,    s(x0) = (s/|b|)·√(1/m + 1/n + (y0 − ȳ)²/(b²·Sxx))
 * s is the residual SD of the standards, n their number, ȳ their mean signal. A rate in signal per time
 * converts the same way, r = slope/b, with u(r) = √((u_slope/b)² + (slope·SE(b)/b²)²) (delta method).
 */
import { fitLine } from '../stats/linear-regression';
import { studentTQuantile } from '../stats/t-distribution';
import type { PlateFlag } from './flags';
import { isArray, isFiniteNumber } from './input';
import { fail, finiteOrNull, ok, type PlateResult } from './result';

export interface StandardPoint {
  concentration: number;
  signal: number | null;
}

export interface StandardCurve {
  n: number;
  slope: number;
  intercept: number;
  slopeSe: number;
  interceptSe: number;
  residualSd: number;
  r2: number | null;
  /** Mean signal of the standards (ȳ) and Sxx of their concentrations, for inverse prediction. */
  meanSignal: number;
  sxx: number;
  signalRange: [number, number];
  concentrationRange: [number, number];
  flags: PlateFlag[];
}

/** Fits the standards (missing signals skipped); needs at least 3 standards at 2 or more concentrations. */
export function fitStandardCurve(points: readonly StandardPoint[]): PlateResult<StandardCurve> {
  if (!isArray(points))
    return fail('invalid_input', 'Standards must be a list of { concentration, signal }.');
  const x: number[] = [];
  const y: number[] = [];
  const flags: PlateFlag[] = [];
  for (const p of points) {
    if (typeof p !== 'object' || p === null || !isFiniteNumber(p.concentration)) {
      return fail('invalid_input', 'Every standard needs a numeric concentration.');
    }
    if (!isFiniteNumber(p.signal)) {
      if (!flags.includes('missing_values')) flags.push('missing_values');
      continue;
    }
    x.push(p.concentration);
    y.push(p.signal);
  }
  if (x.length < 3)
    return fail(
      'not_enough_data',
      `A standard curve needs at least 3 standards with a signal (got ${x.length}).`,
    );
  const fit = fitLine(x, y);
  if (!fit || fit.slopeSe === null || fit.interceptSe === null || fit.residualSd === null) {
    return fail('degenerate', 'The standards need at least two different concentrations.');
  }
  if (fit.slope === 0)
    return fail('degenerate', 'The standards show no change of signal with concentration.');
  const tc = studentTQuantile(0.975, fit.dof) ?? Infinity;
  if (Math.abs(fit.slope) <= tc * fit.slopeSe) flags.push('calibration_slope_not_significant');
  return ok({
    n: fit.n,
    slope: fit.slope,
    intercept: fit.intercept,
    slopeSe: fit.slopeSe,
    interceptSe: fit.interceptSe,
    residualSd: fit.residualSd,
    r2: fit.r2,
    meanSignal: fit.yMean,
    sxx: fit.sxx,
    signalRange: [Math.min(...y), Math.max(...y)],
    concentrationRange: [Math.min(...x), Math.max(...x)],
    flags,
  });
}

/** Concentration behind a signal (the mean of `replicates` reads), with its standard error. */
export function concentrationFromSignal(
  curve: StandardCurve,
  signal: number,
  replicates = 1,
): PlateResult<{ concentration: number; se: number | null; flags: PlateFlag[] }> {
  if (!isFiniteNumber(signal))
    return fail('invalid_input', `The signal is not a number (${String(signal)}).`);
  if (!Number.isInteger(replicates) || replicates < 1) {
    return fail('invalid_option', 'The number of replicate reads must be a whole number of at least 1.');
  }
  const b = curve.slope;
  const x0 = (signal - curve.intercept) / b;
  const d = signal - curve.meanSignal;
  const se =
    (curve.residualSd / Math.abs(b)) *
    Math.sqrt(1 / replicates + 1 / curve.n + (d * d) / (b * b * curve.sxx));
  const flags: PlateFlag[] = [];
  if (signal < curve.signalRange[0] || signal > curve.signalRange[1]) flags.push('extrapolated');
  const concentration = finiteOrNull(x0);
  if (concentration === null)
    return fail('degenerate', 'The concentration cannot be computed from these numbers.');
  return ok({ concentration, se: finiteOrNull(se), flags });
}

/** A rate in signal per time converted to concentration per time: r = slope/b (intercept cancels). */
export function rateFromSignalSlope(
  curve: StandardCurve,
  slope: number,
  slopeSe: number | null = null,
): PlateResult<{ rate: number; se: number }> {
  if (!isFiniteNumber(slope)) return fail('invalid_input', `The slope is not a number (${String(slope)}).`);
  const b = curve.slope;
  const us = isFiniteNumber(slopeSe) ? slopeSe : 0;
  const rate = slope / b;
  const se = Math.hypot(us / b, (slope * curve.slopeSe) / (b * b));
  if (!Number.isFinite(rate) || !Number.isFinite(se))
    return fail('degenerate', 'The rate cannot be computed from these numbers.');
  return ok({ rate, se });
}
