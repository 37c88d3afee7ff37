// One model fitted to one profile: starts, Levenberg–Marquardt, the order of the pKa values, and
// pKa values that run out of the data. Pure numbers; statistics and reporting live elsewhere.

import { levenbergMarquardt, type LmOptions, type LmResult, type LsqProblem, type StopReason } from './lm';
import type { PhModel } from './models';
import type { PhData } from './ph-data';
import { buildMap, clampStart, toFree, toTheta, type FitSpec, type Mapped } from './param-map';
import { FAR, modelJacobian, phProblem } from './ph-problem';

export type { FitSpec } from './param-map';
import { gridStarts } from './starts';

/** A pKa more than this beyond the measured pH range is not determined by the data. */
export const DETERMINED_MARGIN = 2;
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
