// Standard errors and intervals. Covariance cov = s²(JᵀWJ)⁻¹ with s² = SSR/(n − p), the form
// NIST StRD certifies and scipy/R report; derived quantities by the delta method,
// var(g(θ)) ≈ ∇gᵀ·cov·∇g (e.g. Bates & Watts 1988, §2.3 [memory]).

import { invertSymmetric } from './linalg';
import { studentTQuantile } from './stats/distributions';
import type { Estimate } from './types';
import { finiteOrNull } from './result';

/** (JᵀWJ)⁻¹ over the columns `free` of a row-major n×p Jacobian; null when singular. */
export function inverseNormalMatrix(
  J: Float64Array,
  w: Float64Array,
  n: number,
  p: number,
  free: readonly number[],
): number[] | null {
  const q = free.length;
  const A = new Array<number>(q * q).fill(0);
  for (let i = 0; i < n; i++) {
    if (!(w[i] > 0)) continue;
    for (let a = 0; a < q; a++) {
      const ja = J[i * p + free[a]] * w[i];
      for (let b = 0; b <= a; b++) A[a * q + b] += ja * J[i * p + free[b]];
    }
  }
  for (let a = 0; a < q; a++) for (let b = 0; b < a; b++) A[b * q + a] = A[a * q + b];
  return invertSymmetric(A, q);
}

/** Two-sided 95 % quantile of Student's t. */
export function t975(dof: number): number | null {
  return dof > 0 ? studentTQuantile(0.975, dof) : null;
}

export function estimate(value: number | null, se: number | null, dof: number): Estimate {
  const v = finiteOrNull(value);
  const s = finiteOrNull(se);
  const t = t975(dof);
  if (v === null || s === null || t === null) return { value: v, se: s, ci95: null };
  const a = v - t * s;
  const b = v + t * s;
  return { value: v, se: s, ci95: Number.isFinite(a) && Number.isFinite(b) ? [a, b] : null };
}

/** gᵀ·C·g where g is indexed by model parameter and C by the free parameters `free`. */
export function quadraticFormOver(
  g: ArrayLike<number>,
  C: ArrayLike<number>,
  free: readonly number[],
): number {
  const q = free.length;
  let s = 0;
  for (let a = 0; a < q; a++) for (let b = 0; b < q; b++) s += g[free[a]] * C[a * q + b] * g[free[b]];
  return s;
}
