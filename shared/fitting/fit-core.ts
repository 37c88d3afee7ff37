// One model fitted to one profile: starts, Levenberg–Marquardt, the order of the pKa values, and
// pKa values that run out of the data. Pure numbers; statistics and reporting live elsewhere.

import { levenbergMarquardt, type LmOptions, type LmResult, type LsqProblem, type StopReason } from './lm';
import type { PhModel } from './models';
import type { PhData } from './ph-data';
import { applyMap, FAR, modelJacobian, phProblem, type AffineMap } from './ph-problem';
import { gridStarts } from './starts';

/** A pKa more than this beyond the measured pH range is not determined by the data. */
export const DETERMINED_MARGIN = 2;
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

export interface CoreFit {
  theta: number[];
  /** per parameter: fitted (free), held fixed at a limit, or left undetermined */
  status: ('free' | 'fixed' | 'undetermined')[];
  ssr: number;
  stop: StopReason;
  converged: boolean;
  iterations: number;
  starts: number;
  spec: FitSpec;
}

interface Mapped {
  map: AffineMap | null;
  lower: number[];
  upper: number[];
  /** model parameters fitted, in the order of the free vector */
  free: number[];
  ordered: boolean;
  nLinear: number;
}

/** The free vector u of model parameters θ (inverse of the map: increments for an ordered chain). */
function toFree(mapped: Mapped, theta: ArrayLike<number>): number[] {
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
function toTheta(mapped: Mapped, u: number[]): number[] {
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

function clampStart(u: number[], lower: number[], upper: number[]): number[] {
  for (let k = 0; k < u.length; k++) u[k] = Math.min(upper[k], Math.max(lower[k], u[k]));
  return u;
}

/** Fits one spec from the given start, or from grid starts (restarting when a run fails). */
/** A spec made ready to fit repeatedly (the bootstrap refits the same spec a thousand times). */
export interface PreparedSpec {
  mapped: Mapped;
  problem: LsqProblem;
}

export function prepareSpec(model: PhModel, data: PhData, spec: FitSpec): PreparedSpec {
  const mapped = buildMap(model, data, spec);
  return { mapped, problem: phProblem(model, data, mapped.map) };
}

/** One Levenberg–Marquardt run of a prepared spec from model parameters θ₀. */
export function runFrom(
  prepared: PreparedSpec,
  start: ArrayLike<number>,
  options: LmOptions,
): { theta: number[]; lm: LmResult } {
  const { mapped, problem } = prepared;
  const { lower, upper } = mapped;
  const lm = levenbergMarquardt(problem, clampStart(toFree(mapped, start), lower, upper), {
    ...options,
    lower,
    upper,
  });
  return { theta: toTheta(mapped, lm.theta), lm };
}

export function fitSpec(
  model: PhModel,
  data: PhData,
  spec: FitSpec,
  options: LmOptions & { start?: ArrayLike<number> },
): { theta: number[]; lm: LmResult; starts: number } | null {
  const mapped = buildMap(model, data, spec);
  const { lower, upper } = mapped;
  const problem = phProblem(model, data, mapped.map);
  const lmOptions: LmOptions = { ...options, lower, upper };
  if (options.start) return { ...runFrom({ mapped, problem }, options.start, options), starts: 1 };
  const candidates = gridStarts(model, data, spec.fixed, 4);
  let best: { theta: number[]; lm: LmResult } | null = null;
  let starts = 0;
  for (const cand of candidates) {
    starts++;
    const lm = levenbergMarquardt(problem, clampStart(toFree(mapped, cand.theta), lower, upper), lmOptions);
    const better =
      !best ||
      (lm.converged && !best.lm.converged) ||
      (lm.converged === best.lm.converged && Number.isFinite(lm.ssr) && !(lm.ssr >= best.lm.ssr));
    if (better) best = { theta: toTheta(mapped, lm.theta), lm };
    // A converged run from the best grid point is accepted: the grid has already compared starts.
    if (best && best.lm.converged) break;
  }
  return best ? { ...best, starts } : null;
}

function pKaOrderViolated(model: PhModel, theta: ArrayLike<number>, spec: FitSpec): boolean {
  let prev = -Infinity;
  for (let j = model.nLinear; j < model.names.length; j++) {
    if (spec.fixed[j] !== null) continue;
    if (theta[j] < prev - 1e-12) return true;
    prev = theta[j];
  }
  return false;
}

/**
 * The full fit of one model: natural parameters first; the ordered form when the pKa values
 * crossed; then every pKa beyond DETERMINED_MARGIN of the data on its harmless side is held at an
 * effectively infinite distance (the fit becomes the reduced model it tends to, e.g. the bell
 * becomes the one-limb model) and the rest is refitted. A pKa beyond the margin on the other side
 * cannot be reduced away: it and the activity levels are left undetermined.
 */
export function fitModel(model: PhModel, data: PhData, options: LmOptions = {}): CoreFit | null {
  const p = model.names.length;
  const spec: FitSpec = { fixed: new Array<number | null>(p).fill(null), ordered: false };
  const status: CoreFit['status'] = new Array(p).fill('free');
  let wrongSide = false;
  let run = fitSpec(model, data, spec, options);
  if (!run) return null;
  let starts = run.starts;
  for (let round = 0; round <= p; round++) {
    if (!spec.ordered && pKaOrderViolated(model, run.theta, spec)) {
      spec.ordered = true;
      const again = fitSpec(model, data, spec, options);
      if (!again) return null;
      run = again;
      starts += again.starts;
    }
    let changed = false;
    for (let j = model.nLinear; j < p; j++) {
      if (spec.fixed[j] !== null) continue;
      const t = run.theta[j];
      const below = t < data.lo - DETERMINED_MARGIN;
      const above = t > data.hi + DETERMINED_MARGIN;
      if (!below && !above) continue;
      const rule = model.runaway[j];
      if (rule && ((rule.side < 0 && below) || (rule.side > 0 && above))) {
        const far = rule.side < 0 ? data.lo - FAR : data.hi + FAR;
        for (const other of [j, ...(rule.pKas ?? [])]) {
          spec.fixed[other] = far;
          status[other] = 'fixed';
        }
        for (const level of rule.levels) {
          spec.fixed[level] = 0;
          status[level] = 'undetermined';
        }
        changed = true;
      } else {
        status[j] = 'undetermined';
        wrongSide = true;
      }
    }
    if (!changed) break;
    if (spec.fixed.every((v) => v !== null)) {
      // nothing left to fit: all activity levels vanished with their pKa values
      run = { theta: (spec.fixed as number[]).slice(), lm: run.lm, starts: 0 };
      break;
    }
    const again = fitSpec(model, data, spec, options);
    if (!again) return null;
    run = again;
    starts += again.starts;
  }
  if (wrongSide) {
    // a pKa gone to the side where no simpler model waits takes the activity levels with it
    for (let k = 0; k < model.nLinear; k++) status[k] = 'undetermined';
  }
  markWithoutInfluence(model, data, run.theta, spec, status);
  return {
    theta: run.theta,
    status,
    ssr: run.lm.ssr,
    stop: run.lm.stop,
    converged: run.lm.converged,
    iterations: run.lm.iterations,
    starts,
    spec,
  };
}

/**
 * A fitted parameter with no influence on the fitted curve (a zero Jacobian column, e.g. the
 * pKa values when all activities are zero) is not determined by the data.
 */
function markWithoutInfluence(
  model: PhModel,
  data: PhData,
  theta: ArrayLike<number>,
  spec: FitSpec,
  status: CoreFit['status'],
): void {
  const p = model.names.length;
  const { J } = modelJacobian(model, data, theta);
  const norms = new Array<number>(p).fill(0);
  for (let i = 0; i < data.n; i++) {
    if (!(data.w[i] > 0)) continue;
    for (let j = 0; j < p; j++) norms[j] += data.w[i] * J[i * p + j] * J[i * p + j];
  }
  const largest = Math.max(...norms.filter((_, j) => spec.fixed[j] === null));
  for (let j = 0; j < p; j++) {
    if (spec.fixed[j] === null && status[j] === 'free' && !(norms[j] > 1e-24 * largest))
      status[j] = 'undetermined';
  }
}
