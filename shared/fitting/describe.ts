// Turns a numerical fit into the reported result: activity levels back in the caller's units,
// standard errors and intervals, the optimum and half-activity window with their uncertainty,
// correlations, residual checks and flags.

import { percentile95, residualBootstrap } from './bootstrap';
import { type CoreFit } from './fit-core';
import { buildFlags } from './flags';
import type { PhModel } from './models';
import { PH_LIMITS, type PhData } from './ph-data';
import { modelJacobian } from './ph-problem';
import { profileInterval, type ProfileTarget } from './profile-likelihood';
import { finiteOrNull } from './result';
import { runsTest } from './stats/runs-test';
import type { DerivedEstimate, Interval, ParameterEstimate, ProfileFit } from './types';
import { estimate, inverseNormalMatrix, quadraticFormOver, t975 } from './uncertainty';
import { ENGINE_VERSION } from './version';
import { curveShape, shapeGradients, type ShapeKey } from './window';

export interface DescribeOptions {
  profile: boolean;
  bootstrap: number;
  seed: number;
}

const mul = (x: number | null, k: number): number | null => (x === null ? null : finiteOrNull(x * k));

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

export function describeFit(
  model: PhModel,
  data: PhData,
  core: CoreFit,
  options: DescribeOptions,
): ProfileFit {
  const p = model.names.length;
  const m = model.nLinear;
  const S = data.scale;
  const unit = (j: number): number => (j < m ? S : 1);
  const theta = core.theta;
  const free: number[] = [];
  const at: number[] = []; // position of each parameter among the free ones, −1 when fixed
  for (let j = 0; j < p; j++) {
    at.push(core.spec.fixed[j] === null ? free.length : -1);
    if (core.spec.fixed[j] === null) free.push(j);
  }
  const determined = core.status.map((s) => s === 'free');
  const q = free.length;
  const n = data.nUsed;
  const dof = n - q;

  const { J, f } = modelJacobian(model, data, theta);
  let ssr = 0;
  const residuals: (number | null)[] = [];
  const fitted: (number | null)[] = [];
  for (let i = 0; i < data.n; i++) {
    const r = data.y[i] - f[i];
    if (data.w[i] > 0) ssr += data.w[i] * r * r;
    residuals.push(finiteOrNull(r * S));
    fitted.push(finiteOrNull(f[i] * S));
  }
  const s2 = dof > 0 ? ssr / dof : null;
  const inv = q > 0 ? inverseNormalMatrix(J, data.w, data.n, p, free) : null;
  const cov = inv && s2 !== null ? inv.map((x) => x * s2) : null;
  const t = t975(dof);

  // covariance in the caller's units, p×p with nulls for parameters not fitted
  const covariance: (number | null)[][] = [];
  const correlation: (number | null)[][] = [];
  for (let a = 0; a < p; a++) {
    const rowC: (number | null)[] = [];
    const rowR: (number | null)[] = [];
    const ia = at[a];
    for (let b = 0; b < p; b++) {
      const ib = at[b];
      if (!cov || ia < 0 || ib < 0 || !determined[a] || !determined[b]) {
        rowC.push(null);
        rowR.push(null);
        continue;
      }
      rowC.push(finiteOrNull(cov[ia * q + ib] * unit(a) * unit(b)));
      rowR.push(finiteOrNull(cov[ia * q + ib] / Math.sqrt(cov[ia * q + ia] * cov[ib * q + ib])));
    }
    covariance.push(rowC);
    correlation.push(rowR);
  }
  const seOf = (j: number): number | null => {
    const i = at[j];
    return cov && i >= 0 ? finiteOrNull(Math.sqrt(cov[i * q + i])) : null;
  };

  const parameters: Record<string, ParameterEstimate> = {};
  model.names.forEach((name, j) => {
    const known = determined[j];
    parameters[name] = {
      ...estimate(known ? theta[j] * unit(j) : null, known ? mul(seOf(j), unit(j)) : null, dof),
      status: known ? 'fitted' : 'not_determined',
      profile95: null,
      boot95: null,
    };
  });

  // optimum, peak and half-activity window with delta-method errors
  const shape = curveShape(model, theta, determined);
  const grads = cov ? shapeGradients(model, theta, determined, free) : null;
  const seFor = (key: ShapeKey, value: number | null): number | null => {
    const g = grads?.[key];
    if (value === null || !g || !cov) return null;
    const v = quadraticFormOver(g, cov, free);
    return v >= 0 ? finiteOrNull(Math.sqrt(v)) : null;
  };
  const width = shape.lo !== null && shape.hi !== null ? shape.hi - shape.lo : null;
  const pHopt = derived(shape.pHopt, seFor('pHopt', shape.pHopt), dof);
  const peak = derived(mul(shape.peak, S), mul(seFor('peak', shape.peak), S), dof);
  const window = {
    lo: derived(shape.lo, seFor('lo', shape.lo), dof),
    hi: derived(shape.hi, seFor('hi', shape.hi), dof),
    width: derived(width, seFor('width', width), dof),
  };

  // successive pKa differences (Δ for the bell)
  const gaps: { names: [string, string]; delta: number; se: number | null; a: number[] }[] = [];
  for (let j = m; j + 1 < p; j++) {
    if (!determined[j] || !determined[j + 1]) continue;
    const a = new Array<number>(p).fill(0);
    a[j] = -1;
    a[j + 1] = 1;
    const ia = at[j];
    const ib = at[j + 1];
    const v = cov && ia >= 0 && ib >= 0 ? cov[ia * q + ia] + cov[ib * q + ib] - 2 * cov[ia * q + ib] : NaN;
    gaps.push({
      names: [model.names[j], model.names[j + 1]],
      delta: theta[j + 1] - theta[j],
      se: finiteOrNull(Math.sqrt(v)),
      a,
    });
  }
  const deltaGap = model.names[m] === 'pKa1' ? gaps.find((g) => g.names[0] === 'pKa1') : undefined;
  const delta =
    model.names[m] === 'pKa1' ? derived(deltaGap?.delta ?? null, deltaGap?.se ?? null, dof) : null;

  const runs = runsTest(data.pH, residuals, data.w);
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
    t,
    runs,
  });

  // profile-likelihood intervals: every fitted parameter, and Δ
  if (options.profile && s2 !== null && s2 > 0 && t !== null && core.converged) {
    const box = { lo: data.lo - 3, hi: data.hi + 3 };
    const targetFor = (
      a: number[],
      est: number,
      se: number | null,
      isPKa: boolean,
      isGap: boolean,
    ): ProfileTarget => {
      const far = 1e3 * (se ?? Math.max(1, Math.abs(est)));
      if (isGap)
        return {
          a,
          estimate: est,
          se,
          lower: { limit: 0, closed: true },
          upper: { limit: box.hi - box.lo, closed: false },
        };
      if (isPKa)
        return {
          a,
          estimate: est,
          se,
          lower: { limit: Math.max(box.lo, PH_LIMITS.min - 3), closed: false },
          upper: { limit: box.hi, closed: false },
        };
      return {
        a,
        estimate: est,
        se,
        lower: { limit: est - far, closed: false },
        upper: { limit: est + far, closed: false },
      };
    };
    const scaleInterval = (iv: Interval, k: number): Interval => [mul(iv[0], k), mul(iv[1], k)];
    for (const j of free) {
      if (!determined[j]) continue;
      const a = new Array<number>(p).fill(0);
      a[j] = 1;
      const iv = profileInterval(
        model,
        data,
        core.spec,
        theta,
        ssr,
        s2,
        t,
        targetFor(a, theta[j], seOf(j), j >= m, false),
      );
      parameters[model.names[j]].profile95 = scaleInterval(iv, unit(j));
    }
    if (delta && deltaGap) {
      delta.profile95 = scaleInterval(
        profileInterval(
          model,
          data,
          core.spec,
          theta,
          ssr,
          s2,
          t,
          targetFor(deltaGap.a, deltaGap.delta, deltaGap.se, false, true),
        ),
        1,
      );
    }
  }

  let bootstrap: ProfileFit['bootstrap'] = null;
  if (options.bootstrap > 0 && core.converged && dof > 0) {
    const draws = residualBootstrap(
      model,
      data,
      core.spec,
      theta,
      Float64Array.from(f), // f lives in a scratch buffer
      determined,
      q,
      options.bootstrap,
      options.seed,
    );
    pHopt.boot95 = percentile95(draws.pHopt);
    window.lo.boot95 = percentile95(draws.lo);
    window.hi.boot95 = percentile95(draws.hi);
    window.width.boot95 = percentile95(draws.width);
    model.names.forEach((name, j) => {
      if (determined[j] && free.includes(j)) parameters[name].boot95 = percentile95(draws.params[j], unit(j));
    });
    bootstrap = { resamples: options.bootstrap, seed: options.seed, undetermined: draws.undetermined };
  }

  return {
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
    covariance,
    correlation,
    fitted,
    residuals,
    runs,
    flags,
    alternative: null,
    bootstrap,
  };
}
