// One model fitted to one profile: starts, Levenberg–Marquardt, the order of the pKa values, and
// pKa values that run out of the data. Pure numbers; statistics and reporting live elsewhere.

import { levenbergMarquardt, type LmOptions, type LmResult, type StopReason } from './lm';
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
  toFree: (theta: ArrayLike<number>) => number[];
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
  const lower = new Array<number>(q).fill(-Infinity);
  const upper = new Array<number>(q).fill(Infinity);
  let firstPKa = -1;
  free.forEach((j, k) => {
    if (j < m) return;
    if (ordered && firstPKa >= 0) {
      lower[k] = 0;
      upper[k] = highPKa - lowPKa;
    } else {
      lower[k] = lowPKa;
      upper[k] = highPKa;
      firstPKa = k;
    }
  });
  if (q === p && !ordered) return { map: null, lower, upper, toFree: (t) => Array.from(t) };
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
  const toFree = (theta: ArrayLike<number>): number[] => {
    const u = new Array<number>(q).fill(0);
    let prev: number | null = null;
    free.forEach((j, k) => {
      if (j >= m && ordered) {
        u[k] = prev === null ? theta[j] : Math.max(0, theta[j] - prev);
        prev = theta[j];
      } else {
        u[k] = theta[j];
      }
    });
    return u;
  };
  return { map: { p, q, c, M }, lower, upper, toFree };
}

function clampStart(u: number[], lower: number[], upper: number[]): number[] {
  for (let k = 0; k < u.length; k++) u[k] = Math.min(upper[k], Math.max(lower[k], u[k]));
  return u;
}

/** Fits one spec from the given start, or from grid starts (restarting when a run fails). */
export function fitSpec(
  model: PhModel,
  data: PhData,
  spec: FitSpec,
  options: LmOptions & { start?: ArrayLike<number> },
): { theta: number[]; lm: LmResult; starts: number } | null {
  const { map, lower, upper, toFree } = buildMap(model, data, spec);
  const problem = phProblem(model, data, map);
  const lmOptions: LmOptions = { ...options, lower, upper };
  const toTheta = (u: number[]): number[] => {
    if (!map) return u;
    const theta = new Array<number>(model.names.length).fill(0);
    applyMap(map, u, theta);
    return theta;
  };
  if (options.start) {
    const lm = levenbergMarquardt(problem, clampStart(toFree(options.start), lower, upper), lmOptions);
    return { theta: toTheta(lm.theta), lm, starts: 1 };
  }
  const candidates = gridStarts(model, data, spec.fixed, 4);
  let best: { theta: number[]; lm: LmResult } | null = null;
  let starts = 0;
  for (const cand of candidates) {
    starts++;
    const lm = levenbergMarquardt(problem, clampStart(toFree(cand.theta), lower, upper), lmOptions);
    const better =
      !best ||
      (lm.converged && !best.lm.converged) ||
      (lm.converged === best.lm.converged && Number.isFinite(lm.ssr) && !(lm.ssr >= best.lm.ssr));
    if (better) best = { theta: toTheta(lm.theta), lm };
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
