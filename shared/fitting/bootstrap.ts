// Residual bootstrap (Efron & Tibshirani 1993, §9.5 [memory]): new data sets are made from the
// fitted curve plus residuals drawn with replacement (centred and inflated by √(n/(n − p)) so
// that their spread matches s²; Davison & Hinkley 1997, §6.2 [memory]); each is refitted from the
// original estimate. Percentile 95 % intervals of the optimum and the half-activity window follow.
// Seeded: the same seed gives the same intervals.

import type { FitContext } from './describe';
import { DETERMINED_MARGIN, prepareSpec, runFrom, type FitSpec } from './fit-core';
import type { PhModel } from './models';
import type { PhData } from './ph-data';
import { mulberry32, randomIndex } from './prng';
import type { Interval, ProfileFit } from './types';
import { curveShape } from './window';

export interface BootstrapDraws {
  /** per parameter index, the refitted values (scaled units for activity levels) */
  params: number[][];
  pHopt: number[];
  lo: number[];
  hi: number[];
  width: number[];
  undetermined: number;
}

export function residualBootstrap(
  model: PhModel,
  data: PhData,
  spec: FitSpec,
  theta: ArrayLike<number>,
  fitted: Float64Array,
  determined: readonly boolean[],
  nFitted: number,
  resamples: number,
  seed: number,
): BootstrapDraws {
  const random = mulberry32(seed);
  const used: number[] = [];
  for (let i = 0; i < data.n; i++) if (data.w[i] > 0) used.push(i);
  const nu = used.length;
  const inflate = nu > nFitted ? Math.sqrt(nu / (nu - nFitted)) : 1;
  const res = used.map((i) => data.sw[i] * (data.y[i] - fitted[i]));
  const mean = res.reduce((s, r) => s + r, 0) / nu;
  const pool = res.map((r) => (r - mean) * inflate);
  const copy: PhData = { ...data, y: Float64Array.from(data.y) };
  const prepared = prepareSpec(model, copy, spec); // the resamples change only copy.y
  const p = model.names.length;
  const draws: BootstrapDraws = {
    params: Array.from({ length: p }, () => []),
    pHopt: [],
    lo: [],
    hi: [],
    width: [],
    undetermined: 0,
  };
  for (let b = 0; b < resamples; b++) {
    for (const i of used) copy.y[i] = fitted[i] + pool[randomIndex(random, nu)] / data.sw[i];
    const th = runFrom(prepared, theta, { maxIterations: 100 }).theta;
    // a pKa that leaves the data in this resample sends the optimum to that side's infinity
    let away = 0;
    const det = determined.slice();
    for (let j = model.nLinear; j < p; j++) {
      if (spec.fixed[j] !== null) continue;
      if (th[j] < data.lo - DETERMINED_MARGIN) {
        away = away === 1 ? 2 : -1;
        det[j] = false;
      } else if (th[j] > data.hi + DETERMINED_MARGIN) {
        away = away === -1 ? 2 : 1;
        det[j] = false;
      }
    }
    for (let j = 0; j < p; j++) draws.params[j].push(th[j]);
    if (away !== 0) draws.undetermined++;
    const shape = curveShape(model, th, det);
    draws.pHopt.push(shape.pHopt ?? (away === 1 ? Infinity : away === -1 ? -Infinity : NaN));
    draws.lo.push(shape.lo ?? -Infinity);
    draws.hi.push(shape.hi ?? Infinity);
    draws.width.push(shape.lo !== null && shape.hi !== null ? shape.hi - shape.lo : Infinity);
  }
  return draws;
}

/** Percentile interval (2.5 %, 97.5 %); an end that falls on an infinite draw is open (null). */
export function percentile95(values: readonly number[], scale = 1): Interval | null {
  const v = values.filter((x) => !Number.isNaN(x)).sort((a, b) => a - b);
  if (v.length < 20) return null;
  const at = (q: number): number | null => {
    const pos = q * (v.length - 1);
    const i = Math.floor(pos);
    const x = i + 1 < v.length ? v[i] + (pos - i) * (v[i + 1] - v[i]) : v[i];
    return Number.isFinite(x * scale) ? x * scale : null;
  };
  return [at(0.025), at(0.975)];
}

/** Runs the bootstrap and writes its percentile intervals into the report. */
export function attachBootstrap(fit: ProfileFit, ctx: FitContext, resamples: number, seed: number): void {
  const { model, data, core, free, determined } = ctx;
  if (!core.converged || ctx.dof <= 0) return;
  const fitted = ctx.fitted.slice(0, data.n); // ctx.fitted lives in a reused buffer
  const draws = residualBootstrap(
    model,
    data,
    core.spec,
    core.theta,
    fitted,
    determined,
    free.length,
    resamples,
    seed,
  );
  fit.pHopt.boot95 = percentile95(draws.pHopt);
  fit.window.lo.boot95 = percentile95(draws.lo);
  fit.window.hi.boot95 = percentile95(draws.hi);
  fit.window.width.boot95 = percentile95(draws.width);
  model.names.forEach((name, j) => {
    if (determined[j] && free.includes(j))
      fit.parameters[name].boot95 = percentile95(draws.params[j], ctx.units[j]);
  });
  fit.bootstrap = { resamples, seed, undetermined: draws.undetermined };
}
