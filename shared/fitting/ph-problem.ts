// The least-squares problem of one pH profile and one model, seen through an affine map
// θ = c + M·u from the solver's free parameters u to the model's parameters θ. The map expresses,
// without special cases in the solver: parameters held fixed (a pKa that ran out of the data is
// held at an effectively infinite distance), the order pKa1 ≤ pKa2 (u holds pKa1 and the
// non-negative increment Δ) and the linear constraint of a profile-likelihood point.

import type { LsqProblem } from './lm';
import type { PhModel } from './models';
import { LN10, pow10 } from './models/types';
import type { PhData } from './ph-data';

export interface AffineMap {
  /** model parameters */
  p: number;
  /** free parameters */
  q: number;
  c: Float64Array;
  /** p×q row-major */
  M: Float64Array;
}

/** A pKa this far beyond the data has no effect on them at double precision (10^−40 ≪ 10^−16). */
export const FAR = 40;

export function applyMap(map: AffineMap, u: ArrayLike<number>, theta: number[] | Float64Array): void {
  const { p, q, c, M } = map;
  for (let j = 0; j < p; j++) {
    let s = c[j];
    for (let k = 0; k < q; k++) s += M[j * q + k] * u[k];
    theta[j] = s;
  }
}

// Problems are classes, not object literals with closures: one shared method is optimized once
// by the JavaScript engine, where a fresh closure per fit would start cold every time.

/**
 * The bell's problem written out by hand (the command line's hot path): the same equations as
 * models/bell.ts, without a call per point.
 */
class BellProblem implements LsqProblem {
  readonly n: number;
  readonly p = 3;
  constructor(private readonly data: PhData) {
    this.n = data.n;
  }
  evaluate(u: ArrayLike<number>, r: Float64Array, J: Float64Array | null): boolean {
    const { n, h, g, y, sw } = this.data;
    const V = u[0];
    const K1 = pow10(u[1]);
    const K2 = pow10(-u[2]);
    for (let i = 0; i < n; i++) {
      const a = K1 * h[i];
      const b = K2 * g[i];
      const inv = 1 / (1 + a + b);
      const f = V * inv;
      const ri = sw[i] * (y[i] - f);
      if (!Number.isFinite(ri)) return false;
      r[i] = ri;
      if (!J) continue;
      const q = sw[i] * f * LN10 * inv;
      J[3 * i] = sw[i] * inv;
      J[3 * i + 1] = -q * a;
      J[3 * i + 2] = q * b;
    }
    return true;
  }
}

/** Any model, optionally through an affine map of its parameters. */
class MappedProblem implements LsqProblem {
  readonly n: number;
  readonly p: number;
  private readonly theta: Float64Array;
  private readonly grad: Float64Array;
  private readonly k = new Float64Array(4);
  constructor(
    private readonly model: PhModel,
    private readonly data: PhData,
    private readonly map: AffineMap | null,
  ) {
    const p = model.names.length;
    this.n = data.n;
    this.p = map ? map.q : p;
    this.theta = new Float64Array(p);
    this.grad = new Float64Array(p);
  }
  evaluate(u: ArrayLike<number>, r: Float64Array, J: Float64Array | null): boolean {
    const { model, map, theta, grad, k } = this;
    const { n, h, g, y, sw } = this.data;
    const p = theta.length;
    const q = this.p;
    if (map) applyMap(map, u, theta);
    const th = map ? theta : u;
    model.constants(th, k);
    for (let i = 0; i < n; i++) {
      const f = model.point(th, k, h[i], g[i], J ? grad : null);
      const ri = sw[i] * (y[i] - f);
      if (!Number.isFinite(ri)) return false;
      r[i] = ri;
      if (!J) continue;
      const row = i * q;
      if (map) {
        for (let c = 0; c < q; c++) {
          let s = 0;
          for (let j = 0; j < p; j++) s += grad[j] * map.M[j * q + c];
          J[row + c] = sw[i] * s;
        }
      } else {
        for (let c = 0; c < p; c++) J[row + c] = sw[i] * grad[c];
      }
    }
    return true;
  }
}

export function phProblem(model: PhModel, data: PhData, map: AffineMap | null): LsqProblem {
  return model.id === 'bell' && !map ? new BellProblem(data) : new MappedProblem(model, data, map);
}

const jacobianSpace = new Map<
  number,
  { J: Float64Array; f: Float64Array; grad: Float64Array; k: Float64Array }
>();

/**
 * Model Jacobian ∂f/∂θ (row-major, unweighted) and fitted values at θ, in reused buffers that
 * may be longer than n and stay valid until the next call with as many parameters (copy what
 * must be kept).
 */
export function modelJacobian(model: PhModel, data: PhData, theta: ArrayLike<number>) {
  const p = model.names.length;
  let space = jacobianSpace.get(p);
  if (!space || space.f.length < data.n) {
    const size = Math.max(data.n, 64, 2 * (space?.f.length ?? 0));
    space = {
      J: new Float64Array(size * p),
      f: new Float64Array(size),
      grad: new Float64Array(p),
      k: new Float64Array(4),
    };
    jacobianSpace.set(p, space);
  }
  const { J, f, grad, k } = space;
  model.constants(theta, k);
  for (let i = 0; i < data.n; i++) {
    f[i] = model.point(theta, k, data.h[i], data.g[i], grad);
    for (let j = 0; j < p; j++) J[i * p + j] = grad[j];
  }
  return { J, f };
}
