// fitCurve: nonlinear least squares for any model y = f(x; θ) — the NIST StRD problems, a
// Michaelis–Menten fit, calibration curves. Numerical Jacobian by central differences unless an
// analytic gradient is given. Several starts: all given starts are run; when the first fails, or
// when asked to probe, scaled copies of the first start are tried as well, and a start that
// converged to a clearly worse sum of squares than another is reported as stalled (a plateau
// such as NIST BoxBOD's from its first start).

import { curveProblem, type CurveModel, type Difference } from './curve-problem';
import { levenbergMarquardt, type LmResult, type StopReason } from './lm';
import { fail, finiteOrNull, ok, type Result } from './result';
import type { Estimate, Flag } from './types';
import { estimate, inverseNormalMatrix } from './uncertainty';

export interface CurveData {
  x: readonly number[];
  y: readonly number[];
  w?: readonly number[] | null;
}

export interface CurveFitOptions {
  /** one start, or several */
  start: readonly number[] | readonly (readonly number[])[];
  lower?: readonly number[];
  upper?: readonly number[];
  /** finite differences when the model has no gradient (default 'central') */
  difference?: Difference;
  /** scaled copies of the first start: true always, false never, default only when the first fails */
  probe?: boolean;
  maxIterations?: number;
}

export interface StartReport {
  start: number[];
  ssr: number | null;
  stop: StopReason;
  iterations: number;
}

export interface CurveFit {
  names: string[];
  parameters: Record<string, Estimate>;
  n: number;
  dof: number;
  ssr: number | null;
  s2: number | null;
  converged: boolean;
  stop: StopReason;
  iterations: number;
  covariance: (number | null)[][];
  correlation: (number | null)[][];
  starts: StartReport[];
  flags: Flag[];
}

const PROBE_FACTORS = [0.1, 10, 0.5, 2];

export function fitCurve(
  data: CurveData,
  model: CurveModel & { names: readonly string[] },
  options: CurveFitOptions,
): Result<CurveFit> {
  try {
    return fitCurveUnguarded(data, model, options);
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return fail('model_error', `The model function failed while fitting: ${detail}`);
  }
}

function fitCurveUnguarded(
  data: CurveData,
  model: CurveModel & { names: readonly string[] },
  options: CurveFitOptions,
): Result<CurveFit> {
  const { x, y } = data;
  if (!Array.isArray(x) || !Array.isArray(y) || x.length === 0) return fail('empty', 'No data were given.');
  if (x.length !== y.length)
    return fail('length_mismatch', `There are ${x.length} x values but ${y.length} y values.`);
  if (![...x, ...y].every(Number.isFinite))
    return fail('not_finite', 'Every x and y must be a finite number.');
  const w = data.w ?? null;
  if (w && w.length !== x.length)
    return fail('length_mismatch', `There are ${x.length} points but ${w.length} weights.`);
  if (w && !w.every(Number.isFinite)) return fail('not_finite', 'Every weight must be a finite number.');
  if (w && w.some((v) => v < 0)) return fail('negative_weight', 'Weights are 1/σ² and must be ≥ 0.');
  const p = model.names.length;
  if (p === 0) return fail('no_parameters', 'The model has no parameters.');
  const raw = options.start;
  const starts: number[][] = (Array.isArray(raw[0]) ? (raw as number[][]) : [raw as number[]]).map((s) => [
    ...s,
  ]);
  if (starts.length === 0 || starts.some((s) => s.length !== p || !s.every(Number.isFinite))) {
    return fail('bad_start', `Each start needs ${p} finite values (${model.names.join(', ')}).`);
  }
  const n = w ? w.filter((v) => v > 0).length : x.length;
  if (n < p) return fail('too_few_points', `The model has ${p} parameters but only ${n} points were given.`);
  const sw = new Float64Array(x.length).map((_, i) => Math.sqrt(w ? w[i] : 1));
  const problem = curveProblem(x, y, sw, p, model, options.difference ?? 'central');
  const lmOptions = {
    lower: options.lower,
    upper: options.upper,
    maxIterations: options.maxIterations ?? 1000,
  };

  const runs: { start: number[]; lm: LmResult }[] = starts.map((s) => ({
    start: s,
    lm: levenbergMarquardt(problem, s, lmOptions),
  }));
  if (options.probe === true || (options.probe === undefined && !runs[0].lm.converged)) {
    for (const k of PROBE_FACTORS) {
      const s = starts[0].map((v) => v * k);
      runs.push({ start: s, lm: levenbergMarquardt(problem, s, lmOptions) });
    }
  }
  const ranked = runs
    .filter((r) => Number.isFinite(r.lm.ssr))
    .sort((a, b) => Number(b.lm.converged) - Number(a.lm.converged) || a.lm.ssr - b.lm.ssr);
  const best = ranked[0] ?? runs[0];
  const flags: Flag[] = [];
  // a start that stopped at a clearly higher SSR than the best ended on a plateau or a local minimum
  const stalled = runs.filter(
    (r) => best.lm.converged && Number.isFinite(r.lm.ssr) && r.lm.ssr > best.lm.ssr * (1 + 1e-6) + 1e-300,
  );
  if (stalled.length > 0) {
    flags.push({
      code: 'stalled_start',
      message: `${stalled.length} start(s) stopped at a higher sum of squares (e.g. ${stalled[0].lm.ssr.toPrecision(6)} against ${best.lm.ssr.toPrecision(6)}): a plateau or a local minimum. The best run is reported.`,
    });
  }
  if (!best.lm.converged)
    flags.push({ code: 'not_converged', message: `The fit did not converge (${best.lm.stop}).` });

  // covariance s²(JᵀWJ)⁻¹ at the best point (J from the problem already carries √w)
  const theta = best.lm.theta;
  const r = new Float64Array(x.length);
  const J = new Float64Array(x.length * p);
  const evaluated = problem.evaluate(theta, r, J);
  const dof = n - p;
  const ssr = best.lm.ssr;
  const s2 = dof > 0 && Number.isFinite(ssr) ? ssr / dof : null;
  const marks = new Float64Array(x.length).map((_, i) => (sw[i] > 0 ? 1 : 0));
  const inv = evaluated
    ? inverseNormalMatrix(
        J,
        marks,
        x.length,
        p,
        model.names.map((_, j) => j),
      )
    : null;
  const cov = inv && s2 !== null ? inv.map((v) => v * s2) : null;
  const parameters: Record<string, Estimate> = {};
  const covariance: (number | null)[][] = [];
  const correlation: (number | null)[][] = [];
  model.names.forEach((name, a) => {
    parameters[name] = estimate(theta[a], cov ? Math.sqrt(cov[a * p + a]) : null, dof);
    covariance.push(model.names.map((_, b) => (cov ? finiteOrNull(cov[a * p + b]) : null)));
    correlation.push(
      model.names.map((_, b) =>
        cov ? finiteOrNull(cov[a * p + b] / Math.sqrt(cov[a * p + a] * cov[b * p + b])) : null,
      ),
    );
  });
  return ok({
    names: [...model.names],
    parameters,
    n,
    dof,
    ssr: finiteOrNull(ssr),
    s2: finiteOrNull(s2),
    converged: best.lm.converged,
    stop: best.lm.stop,
    iterations: best.lm.iterations,
    covariance,
    correlation,
    starts: runs.map((rr) => ({
      start: rr.start,
      ssr: finiteOrNull(rr.lm.ssr),
      stop: rr.lm.stop,
      iterations: rr.lm.iterations,
    })),
    flags,
  });
}
