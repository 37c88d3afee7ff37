// Turns a numerical fit into the reported result: activity levels back in the caller's units,
// standard errors and intervals, the optimum and half-activity window with their uncertainty,
// correlations, residual checks and flags.

import { attachBootstrap } from './bootstrap';
import { type CoreFit } from './fit-core';
import { buildFlags } from './flags';
import type { PhModel } from './models';
import type { PhData } from './ph-data';
import { modelJacobian } from './ph-problem';
import { attachProfiles, type Gap } from './profile-likelihood';
import { finiteOrNull, timesOrNull } from './result';
import { runsTest } from './stats/runs-test';
import type { DerivedEstimate, ParameterEstimate, ProfileFit } from './types';
import { estimate, inverseNormalMatrix, quadraticFormOver, t975 } from './uncertainty';
import { ENGINE_VERSION } from './version';
import { curveShape, shapeGradients, type ShapeKey } from './window';

export interface DescribeOptions {
  profile: boolean;
  bootstrap: number;
  seed: number;
  /** 'summary' (bulk runs such as the command line): no residual, fitted or covariance tables
   *  and no uncertainty of the peak and window — only what the results format holds */
  detail: 'full' | 'summary';
}

const mul = timesOrNull;

const derived = (value: number | null, se: number | null, dof: number): DerivedEstimate => {
  const e = estimate(value, se, dof);
  return { value: e.value, se: e.se, ci95: e.ci95, profile95: null, boot95: null };
};

/** Akaike's criterion with the small-sample correction (Hurvich & Tsai 1989), k = p + 1 (σ²). */
export function aicc(ssr: number, n: number, p: number): number | null {
  const k = p + 1;
  if (!(ssr > 0) || n - k - 1 <= 0) return null;
  return finiteOrNull(n * Math.log(ssr / n) + 2 * k + (2 * k * (k + 1)) / (n - k - 1));
}

/** What the interval steps after the report need to know about the fit (scaled units). */
export interface FitContext {
  model: PhModel;
  data: PhData;
  core: CoreFit;
  /** the free parameters, and each parameter's position among them (−1 when held) */
  free: number[];
  at: number[];
  determined: boolean[];
  /** covariance over the free parameters (scaled units), null when singular */
  cov: number[] | null;
  ssr: number;
  s2: number | null;
  dof: number;
  t: number | null;
  /** unit of each parameter: the activity scale for levels, 1 for pKa values */
  units: number[];
  fitted: Float64Array;
}

/** Standard error of parameter j from the covariance of the free parameters (scaled units). */
function standardError(ctx: FitContext, j: number): number | null {
  const { cov, at, free } = ctx;
  return cov && at[j] >= 0 ? finiteOrNull(Math.sqrt(cov[at[j] * free.length + at[j]])) : null;
}

/** Delta method: √(∇gᵀ·cov·∇g) for a gradient over the model parameters. */
function deltaMethodSE(ctx: FitContext, gradient: number[] | null): number | null {
  if (!gradient || !ctx.cov) return null;
  const v = quadraticFormOver(gradient, ctx.cov, ctx.free);
  return v >= 0 ? finiteOrNull(Math.sqrt(v)) : null;
}

function shapeSE(
  ctx: FitContext,
  grads: Record<ShapeKey, number[] | null> | null,
  key: ShapeKey,
  value: number | null,
): number | null {
  return value === null || !grads ? null : deltaMethodSE(ctx, grads[key]);
}

function covarianceTables(ctx: FitContext) {
  const { free, at, determined, cov, units } = ctx;
  const p = at.length;
  const q = free.length;
  const covariance: (number | null)[][] = [];
  const correlation: (number | null)[][] = [];
  for (let a = 0; a < p; a++) {
    const rowC: (number | null)[] = [];
    const rowR: (number | null)[] = [];
    for (let b = 0; b < p; b++) {
      const [ia, ib] = [at[a], at[b]];
      if (!cov || ia < 0 || ib < 0 || !determined[a] || !determined[b]) {
        rowC.push(null);
        rowR.push(null);
        continue;
      }
      rowC.push(finiteOrNull(cov[ia * q + ib] * units[a] * units[b]));
      rowR.push(finiteOrNull(cov[ia * q + ib] / Math.sqrt(cov[ia * q + ia] * cov[ib * q + ib])));
    }
    covariance.push(rowC);
    correlation.push(rowR);
  }
  return { covariance, correlation };
}

/** Successive pKa differences with their standard errors (Δ = pKa2 − pKa1 for the bell). */
function pKaGaps(ctx: FitContext): Gap[] {
  const { model, core, at, determined, cov, free } = ctx;
  const p = model.names.length;
  const q = free.length;
  const gaps: Gap[] = [];
  for (let j = model.nLinear; j + 1 < p; j++) {
    if (!determined[j] || !determined[j + 1]) continue;
    const a = new Array<number>(p).fill(0);
    a[j] = -1;
    a[j + 1] = 1;
    const [ia, ib] = [at[j], at[j + 1]];
    const v = cov && ia >= 0 && ib >= 0 ? cov[ia * q + ia] + cov[ib * q + ib] - 2 * cov[ia * q + ib] : NaN;
    const names: [string, string] = [model.names[j], model.names[j + 1]];
    gaps.push({ names, delta: core.theta[j + 1] - core.theta[j], se: finiteOrNull(Math.sqrt(v)), a });
  }
  return gaps;
}

export function describeFit(
  model: PhModel,
  data: PhData,
  core: CoreFit,
  options: DescribeOptions,
): ProfileFit {
  const p = model.names.length;
  const S = data.scale;
  const theta = core.theta;
  const free: number[] = [];
  const at: number[] = [];
  for (let j = 0; j < p; j++) {
    at.push(core.spec.fixed[j] === null ? free.length : -1);
    if (core.spec.fixed[j] === null) free.push(j);
  }
  const determined = core.status.map((s) => s === 'free');
  const q = free.length;
  const n = data.nUsed;
  const dof = n - q;

  const full = options.detail === 'full';
  const { J, f } = modelJacobian(model, data, theta);
  let ssr = 0;
  const raw = new Float64Array(data.n); // residuals in the solver's units, for the runs test
  const residuals: (number | null)[] = [];
  const fitted: (number | null)[] = [];
  for (let i = 0; i < data.n; i++) {
    const r = data.y[i] - f[i];
    raw[i] = r;
    if (data.w[i] > 0) ssr += data.w[i] * r * r;
    if (!full) continue;
    residuals.push(finiteOrNull(r * S));
    fitted.push(finiteOrNull(f[i] * S));
  }
  const s2 = dof > 0 ? ssr / dof : null;
  const inv = q > 0 ? inverseNormalMatrix(J, data.w, data.n, p, free) : null;
  const cov = inv && s2 !== null ? inv.map((x) => x * s2) : null;
  const ctx: FitContext = {
    model,
    data,
    core,
    free,
    at,
    determined,
    cov,
    ssr,
    s2,
    dof,
    t: t975(dof),
    units: model.names.map((_, j) => (j < model.nLinear ? S : 1)),
    fitted: f,
  };
  const parameters: Record<string, ParameterEstimate> = {};
  for (let j = 0; j < p; j++) {
    const known = determined[j];
    const u = ctx.units[j];
    const e = estimate(known ? theta[j] * u : null, known ? mul(standardError(ctx, j), u) : null, dof);
    const status = known ? 'fitted' : 'not_determined';
    parameters[model.names[j]] = {
      value: e.value,
      se: e.se,
      ci95: e.ci95,
      status,
      profile95: null,
      boot95: null,
    };
  }

  // optimum, peak and half-activity window with delta-method errors
  const shape = curveShape(model, theta, determined);
  const grads = cov && (full || shape.pHopt !== null) ? shapeGradients(model, theta, determined, free) : null;
  const wgrads = full ? grads : null;
  const width = shape.lo !== null && shape.hi !== null ? shape.hi - shape.lo : null;
  const pHopt = derived(shape.pHopt, shapeSE(ctx, grads, 'pHopt', shape.pHopt), dof);
  const peak = derived(mul(shape.peak, S), mul(shapeSE(ctx, wgrads, 'peak', shape.peak), S), dof);
  const window = {
    lo: derived(shape.lo, shapeSE(ctx, wgrads, 'lo', shape.lo), dof),
    hi: derived(shape.hi, shapeSE(ctx, wgrads, 'hi', shape.hi), dof),
    width: derived(width, shapeSE(ctx, wgrads, 'width', width), dof),
  };

  const gaps = pKaGaps(ctx);
  const deltaGap =
    model.names[model.nLinear] === 'pKa1' ? gaps.find((g) => g.names[0] === 'pKa1') : undefined;
  const delta =
    model.names[model.nLinear] === 'pKa1'
      ? derived(deltaGap?.delta ?? null, deltaGap?.se ?? null, dof)
      : null;
  const runs = runsTest(data.pH, raw, data.w);
  const flags = buildFlags({
    model,
    theta,
    status: core.status,
    lo: data.lo,
    hi: data.hi,
    n,
    nFitted: q,
    distinctPH: data.distinctPH,
    converged: core.converged,
    stop: core.stop,
    gaps,
    t: ctx.t,
    runs,
  });

  const fit: ProfileFit = {
    engine: { name: 'bellwether', version: ENGINE_VERSION },
    model: model.id,
    parameterNames: [...model.names],
    n,
    pHRange: [data.lo, data.hi],
    nFitted: q,
    dof,
    converged: core.converged,
    stop: core.stop,
    iterations: core.iterations,
    starts: core.starts,
    parameters,
    ssr: finiteOrNull(ssr * S * S),
    s2: finiteOrNull(s2 === null ? null : s2 * S * S),
    aicc: aicc(ssr * S * S, n, q),
    pHopt,
    peak,
    delta,
    window,
    ...(full ? covarianceTables(ctx) : { covariance: [], correlation: [] }),
    fitted,
    residuals,
    runs,
    flags,
    alternative: null,
    selection: null,
    bootstrap: null,
  };
  if (options.profile) attachProfiles(fit, ctx, deltaGap ?? null);
  if (options.bootstrap > 0) attachBootstrap(fit, ctx, options.bootstrap, options.seed);
  return fit;
}
