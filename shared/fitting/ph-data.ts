// Checks and prepares one activity-against-pH profile for fitting. Activities are divided by
// their largest magnitude so that the solver sees numbers near 1 whatever the units (the fit is
// equivariant: only the activity levels and the sums of squares are scaled back).

import { pow10 } from './models/types';
import { fail, ok, type Result } from './result';

export interface ProfileInput {
  pH: readonly number[];
  v: readonly number[];
  /** optional weights 1/σ², same length; 0 leaves a point out */
  w?: readonly number[] | null;
}

export interface PhData {
  n: number;
  /** points with a positive weight */
  nUsed: number;
  pH: Float64Array;
  /** 10^(−pH) */
  h: Float64Array;
  /** 10^pH */
  g: Float64Array;
  /** activities divided by `scale` */
  y: Float64Array;
  /** √w */
  sw: Float64Array;
  w: Float64Array;
  scale: number;
  lo: number;
  hi: number;
  distinctPH: number;
}

/** pH values outside this span are not pH values an assay can have. */
export const PH_LIMITS = { min: -2, max: 16 } as const;

function isNumberArray(a: unknown): a is readonly number[] {
  return Array.isArray(a) && a.every((x) => typeof x === 'number');
}

export function prepareProfile(input: ProfileInput, minPoints: number): Result<PhData> {
  if (input === null || typeof input !== 'object') return fail('empty', 'No data were given.');
  const { pH, v, w } = input;
  if (!isNumberArray(pH) || !isNumberArray(v)) {
    return fail('not_finite', 'pH and activity must be arrays of numbers.');
  }
  if (pH.length === 0) return fail('empty', 'The profile has no points.');
  if (pH.length !== v.length) {
    return fail('length_mismatch', `There are ${pH.length} pH values but ${v.length} activities.`);
  }
  if (w !== undefined && w !== null) {
    if (!isNumberArray(w)) return fail('not_finite', 'Weights must be an array of numbers.');
    if (w.length !== pH.length) {
      return fail('length_mismatch', `There are ${pH.length} points but ${w.length} weights.`);
    }
  }
  const n = pH.length;
  const store = new Float64Array(6 * n); // one allocation for all six arrays
  const data: PhData = {
    n,
    nUsed: 0,
    pH: store.subarray(0, n),
    h: store.subarray(n, 2 * n),
    g: store.subarray(2 * n, 3 * n),
    y: store.subarray(3 * n, 4 * n),
    sw: store.subarray(4 * n, 5 * n),
    w: store.subarray(5 * n, 6 * n),
    scale: 1,
    lo: Infinity,
    hi: -Infinity,
    distinctPH: 0,
  };
  let scale = 0;
  for (let i = 0; i < n; i++) {
    const wi = w ? w[i] : 1;
    if (!Number.isFinite(pH[i]) || !Number.isFinite(v[i])) {
      return fail('not_finite', `Point ${i + 1} has a missing or non-finite pH or activity.`);
    }
    if (!Number.isFinite(wi)) return fail('not_finite', `Weight ${i + 1} is not a finite number.`);
    if (wi < 0)
      return fail('negative_weight', `Weight ${i + 1} is negative; weights are 1/σ² and must be ≥ 0.`);
    if (pH[i] < PH_LIMITS.min || pH[i] > PH_LIMITS.max) {
      return fail(
        'ph_out_of_range',
        `pH ${pH[i]} at point ${i + 1} is outside ${PH_LIMITS.min}…${PH_LIMITS.max}.`,
      );
    }
    data.pH[i] = pH[i];
    data.h[i] = pow10(-pH[i]);
    data.g[i] = pow10(pH[i]);
    data.w[i] = wi;
    data.sw[i] = Math.sqrt(wi);
    if (wi > 0) {
      data.nUsed++;
      data.lo = Math.min(data.lo, pH[i]);
      data.hi = Math.max(data.hi, pH[i]);
      scale = Math.max(scale, Math.abs(v[i]));
    }
  }
  if (data.nUsed === 0) return fail('empty', 'Every point has weight 0; nothing is left to fit.');
  data.distinctPH = countDistinct(data);
  if (data.distinctPH < 2) {
    return fail('single_ph', `All points are at pH ${data.lo}; a pH profile needs at least two pH values.`);
  }
  if (data.nUsed < minPoints) {
    return fail(
      'too_few_points',
      `The model has ${minPoints} parameters but only ${data.nUsed} points were given; it needs at least as many points as parameters.`,
    );
  }
  data.scale = scale > 0 && Number.isFinite(scale) ? scale : 1;
  for (let i = 0; i < n; i++) data.y[i] = v[i] / data.scale;
  return ok(data);
}

function countDistinct(data: PhData): number {
  // profiles usually come sorted by pH: then counting changes suffices
  let count = 0;
  let last = NaN;
  for (let i = 0; i < data.n; i++) {
    if (!(data.w[i] > 0)) continue;
    if (data.pH[i] < last) {
      const seen = new Set<number>();
      for (let k = 0; k < data.n; k++) if (data.w[k] > 0) seen.add(data.pH[k]);
      return seen.size;
    }
    if (data.pH[i] !== last) count++;
    last = data.pH[i];
  }
  return count;
}
