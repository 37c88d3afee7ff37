// Model values for charts: evaluateModel, and curveWithBand — the fitted curve with its 95 %
// confidence band by the delta method, f ± t(0.975, dof)·√(∇fᵀ·cov·∇f), on a pH grid.

import { MODEL_IDS, MODELS, type ModelId } from './models';
import { fail, finiteOrNull, ok, type Result } from './result';
import type { ProfileFit } from './types';
import { t975 } from './uncertainty';

/** Stand-in for a pKa that is not determined: far enough that its term is exactly negligible. */
const FAR_PKA = 100;

function thetaFrom(model: ModelId, values: Record<string, number | null> | readonly (number | null)[]) {
  const m = MODELS[model];
  return m.names.map((name, j) => {
    const v = Array.isArray(values) ? values[j] : (values as Record<string, number | null>)[name];
    if (v !== null && v !== undefined) return typeof v === 'number' ? v : NaN; // NaN, ±Infinity stay invalid
    const side = m.runaway[j]?.side;
    if (j >= m.nLinear && side) return side * FAR_PKA;
    return j < m.nLinear ? 0 : NaN;
  });
}

/**
 * Activity of a model at the given pH values. A pKa given as null is taken as not determined
 * (at an infinite distance on its usual side); an activity level given as null as zero.
 */
export function evaluateModel(
  model: ModelId,
  parameters: Record<string, number | null> | readonly (number | null)[],
  pH: readonly number[],
): Result<(number | null)[]> {
  if (!MODEL_IDS.includes(model)) return fail('unknown_model', `Unknown model '${String(model)}'.`);
  if (!Array.isArray(pH)) return fail('not_finite', 'pH must be an array of numbers.');
  const m = MODELS[model];
  const theta = thetaFrom(model, parameters);
  if (theta.some((x) => !Number.isFinite(x))) {
    return fail('not_finite', `Every parameter of ${model} (${m.names.join(', ')}) needs a finite value.`);
  }
  const k = new Float64Array(4);
  m.constants(theta, k);
  return ok(
    pH.map((x) => (Number.isFinite(x) ? finiteOrNull(m.point(theta, k, 10 ** -x, 10 ** x, null)) : null)),
  );
}

export interface CurveBand {
  pH: number[];
  v: (number | null)[];
  /** lower and upper ends of the 95 % confidence band of the mean curve; null where unknown */
  lower: (number | null)[];
  upper: (number | null)[];
}

/** The fitted curve and its pointwise 95 % confidence band on a pH grid (default: data ± 0.5). */
export function curveWithBand(
  fit: ProfileFit,
  grid: { from?: number; to?: number; points?: number } = {},
): Result<CurveBand> {
  if (!fit || !MODEL_IDS.includes(fit.model))
    return fail('unknown_model', 'This is not a fit of a known model.');
  const from = grid.from ?? fit.pHRange[0] - 0.5;
  const to = grid.to ?? fit.pHRange[1] + 0.5;
  const points = grid.points ?? 101;
  if (!Number.isFinite(from) || !Number.isFinite(to) || !(to > from)) {
    return fail('bad_option', 'The pH grid needs finite ends with from < to.');
  }
  if (!Number.isInteger(points) || points < 2 || points > 100_000) {
    return fail('bad_option', 'The pH grid needs from 2 to 100,000 points.');
  }
  const model = MODELS[fit.model];
  const values = Object.fromEntries(model.names.map((n) => [n, fit.parameters[n]?.value ?? null]));
  const theta = thetaFrom(fit.model, values);
  if (theta.some((x) => !Number.isFinite(x)))
    return fail('not_finite', 'The fit has no usable parameter values.');
  const t = t975(fit.dof);
  const p = model.names.length;
  const k = new Float64Array(4);
  const g = new Float64Array(p);
  model.constants(theta, k);
  const band: CurveBand = { pH: [], v: [], lower: [], upper: [] };
  for (let i = 0; i < points; i++) {
    const x = from + ((to - from) * i) / (points - 1);
    const f = model.point(theta, k, 10 ** -x, 10 ** x, g);
    let variance: number | null = 0;
    for (let a = 0; a < p && variance !== null; a++) {
      for (let b = 0; b < p; b++) {
        const c = fit.covariance[a]?.[b];
        if (c === null || c === undefined) {
          if (
            fit.parameters[model.names[a]].status === 'fitted' &&
            fit.parameters[model.names[b]].status === 'fitted'
          ) {
            variance = null;
            break;
          }
          continue;
        }
        variance += g[a] * c * g[b];
      }
    }
    const half = variance !== null && t !== null && variance >= 0 ? t * Math.sqrt(variance) : null;
    band.pH.push(x);
    band.v.push(finiteOrNull(f));
    band.lower.push(half === null ? null : finiteOrNull(f - half));
    band.upper.push(half === null ? null : finiteOrNull(f + half));
  }
  return ok(band);
}
