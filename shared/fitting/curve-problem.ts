// A least-squares problem for a generic model y = f(x; θ): analytic Jacobian when given,
// otherwise forward or central finite differences (steps √ε·|θ| and ∛ε·|θ|, the usual choices
// that balance truncation against rounding error; Nocedal & Wright 2006, §8.1).

import type { LsqProblem } from './lm';

export type Difference = 'forward' | 'central';

export interface CurveModel {
  /** f(x; θ) */
  f: (x: number, theta: ArrayLike<number>) => number;
  /** optional analytic gradient ∂f/∂θ at x, written into out */
  gradient?: (x: number, theta: ArrayLike<number>, out: Float64Array) => void;
}

export function curveProblem(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  sqrtW: Float64Array,
  p: number,
  model: CurveModel,
  difference: Difference = 'central',
): LsqProblem {
  const n = x.length;
  const grad = new Float64Array(p);
  const shifted = new Float64Array(p);
  const EPS = 2.220446049250313e-16;
  const scale = difference === 'central' ? Math.cbrt(EPS) : Math.sqrt(EPS);

  function numericGradient(xi: number, theta: ArrayLike<number>, f0: number): boolean {
    shifted.set(theta);
    for (let j = 0; j < p; j++) {
      const h = scale * Math.max(Math.abs(theta[j]), 1e-8);
      shifted[j] = theta[j] + h;
      const up = model.f(xi, shifted);
      if (difference === 'central') {
        shifted[j] = theta[j] - h;
        const down = model.f(xi, shifted);
        grad[j] = (up - down) / (2 * h);
      } else {
        grad[j] = (up - f0) / h;
      }
      shifted[j] = theta[j];
      if (!Number.isFinite(grad[j])) return false;
    }
    return true;
  }

  return {
    n,
    p,
    evaluate(theta, r, J) {
      for (let i = 0; i < n; i++) {
        const fi = model.f(x[i], theta);
        if (!Number.isFinite(fi)) return false;
        r[i] = sqrtW[i] * (y[i] - fi);
        if (!J) continue;
        if (model.gradient) model.gradient(x[i], theta, grad);
        else if (!numericGradient(x[i], theta, fi)) return false;
        for (let j = 0; j < p; j++) {
          const v = sqrtW[i] * grad[j];
          if (!Number.isFinite(v)) return false;
          J[i * p + j] = v;
        }
      }
      return true;
    },
  };
}
