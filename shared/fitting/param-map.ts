// The solver's view of a model's parameters: which are fitted, held or constrained, and the
// affine map θ = c + M·u between the free vector u and the model parameters θ (see ph-problem.ts).

import type { PhModel } from './models';
import type { PhData } from './ph-data';
import type { AffineMap } from './ph-problem';
import { applyMap } from './ph-problem';

/** The box the solver keeps pKa values in, so that a runaway stops quickly at its edge. */
const BOX_MARGIN = 3;

export interface FitSpec {
  /** per model parameter: its fixed value, or null when it is fitted */
  fixed: (number | null)[];
  /** fit the free pKa values as the first one plus non-negative increments (keeps their order) */
  ordered: boolean;
  /** a linear constraint aᵀθ = psi (a profile-likelihood point); not combined with `ordered` */
  constraint?: { a: readonly number[]; psi: number };
}

export interface Mapped {
  map: AffineMap | null;
  lower: number[];
  upper: number[];
  /** model parameters fitted, in the order of the free vector */
  free: number[];
  ordered: boolean;
  nLinear: number;
}

/** The free vector u of model parameters θ (inverse of the map: increments for an ordered chain). */
export function toFree(mapped: Mapped, theta: ArrayLike<number>): number[] {
  const u: number[] = [];
  let prev: number | null = null;
  for (const j of mapped.free) {
    if (j >= mapped.nLinear && mapped.ordered) {
      u.push(prev === null ? theta[j] : Math.max(0, theta[j] - prev));
      prev = theta[j];
    } else {
      u.push(theta[j]);
    }
  }
  return u;
}

/** Model parameters θ of a free vector u. */
export function toTheta(mapped: Mapped, u: number[]): number[] {
  if (!mapped.map) return u;
  const theta = new Array<number>(mapped.map.p).fill(0);
  applyMap(mapped.map, u, theta);
  return theta;
}

export function buildMap(model: PhModel, data: PhData, spec: FitSpec): Mapped {
  const p = model.names.length;
  const m = model.nLinear;
  const lowPKa = data.lo - BOX_MARGIN;
  const highPKa = data.hi + BOX_MARGIN;
  const con = spec.constraint;
  // the constrained parameter (pivot) is solved from the others: θ_k = (ψ − Σ a_j θ_j)/a_k
  let pivot = -1;
  if (con) {
    for (let j = 0; j < p; j++) {
      if (
        spec.fixed[j] === null &&
        con.a[j] !== 0 &&
        (pivot < 0 || Math.abs(con.a[j]) > Math.abs(con.a[pivot]))
      ) {
        pivot = j;
      }
    }
  }
  const ordered = spec.ordered && !con;
  const free: number[] = [];
  for (let j = 0; j < p; j++) if (spec.fixed[j] === null && j !== pivot) free.push(j);
  const q = free.length;
  const lower: number[] = [];
  const upper: number[] = [];
  let chained = false;
  for (const j of free) {
    if (j < m) {
      lower.push(-Infinity);
      upper.push(Infinity);
    } else if (ordered && chained) {
      lower.push(0);
      upper.push(highPKa - lowPKa);
    } else {
      lower.push(lowPKa);
      upper.push(highPKa);
      chained = true;
    }
  }
  const base = { lower, upper, free, ordered, nLinear: m };
  if (q === p && !ordered) return { map: null, ...base };
  const c = new Float64Array(p);
  const M = new Float64Array(p * q);
  for (let j = 0; j < p; j++) c[j] = spec.fixed[j] ?? 0;
  const chain: number[] = []; // free indices k of the pKa chain, in order
  free.forEach((j, k) => {
    if (j >= m && ordered) {
      chain.push(k);
      for (const l of chain) M[j * q + l] = 1;
    } else {
      M[j * q + k] = 1;
    }
  });
  if (con && pivot >= 0) {
    c[pivot] = con.psi / con.a[pivot];
    for (let j = 0; j < p; j++) {
      if (j === pivot || con.a[j] === 0) continue;
      if (spec.fixed[j] !== null) c[pivot] -= (con.a[j] * (spec.fixed[j] as number)) / con.a[pivot];
      else M[pivot * q + free.indexOf(j)] = -con.a[j] / con.a[pivot];
    }
  }
  return { map: { p, q, c, M }, ...base };
}

export function clampStart(u: number[], lower: number[], upper: number[]): number[] {
  for (let k = 0; k < u.length; k++) u[k] = Math.min(upper[k], Math.max(lower[k], u[k]));
  return u;
}

/** Fits one spec from the given start, or from grid starts (restarting when a run fails). */
