// Profile-likelihood intervals (e.g. Bates & Watts 1988, §6.1 [memory]; the method of R's
// confint for nls). For a quantity ψ = aᵀθ, every other parameter is refitted with ψ held; the
// 95 % interval holds the ψ whose profile sum of squares satisfies
//   S(ψ) − S(θ̂) ≤ s²·t²(0.975, n − p)
// i.e. the signed root τ(ψ) = ±√(S(ψ) − S(θ̂))/s stays within ±t. Unlike the Wald interval it
// follows the curvature of the model: for pKa values near the edge of the data it is lopsided,
// and when the profile never rises enough before the pKa leaves the data that end is open (null).

import type { FitContext } from './describe';
import { fitSpec, type FitSpec } from './fit-core';
import type { PhModel } from './models';
import type { PhData } from './ph-data';
import { PH_LIMITS } from './ph-data';
import { timesOrNull } from './result';
import type { Interval, ProfileFit } from './types';

export interface ProfileTarget {
  /** ψ = aᵀθ */
  a: number[];
  estimate: number;
  /** Wald standard error, used to size the first steps */
  se: number | null;
  /** where the search stops; `closed` ends are returned as the limit itself (e.g. Δ ≥ 0) */
  lower: { limit: number; closed: boolean };
  upper: { limit: number; closed: boolean };
}

export function profileInterval(
  model: PhModel,
  data: PhData,
  spec: FitSpec,
  theta: ArrayLike<number>,
  ssrMin: number,
  s2: number,
  t: number,
  target: ProfileTarget,
): Interval {
  const base: FitSpec = { fixed: spec.fixed, ordered: false };
  const ssrAt = (psi: number, warm: ArrayLike<number>): { excess: number; theta: number[] } | null => {
    const run = fitSpec(
      model,
      data,
      { ...base, constraint: { a: target.a, psi } },
      { start: warm, maxIterations: 100 },
    );
    if (!run || !Number.isFinite(run.lm.ssr)) return null;
    return { excess: Math.max(0, run.lm.ssr - ssrMin), theta: run.theta };
  };
  const tau = (excess: number): number => Math.sqrt(excess / s2);

  const side = (dir: -1 | 1): number | null => {
    const bound = dir < 0 ? target.lower : target.upper;
    let step = t * (target.se && target.se > 0 ? target.se : 0.1 * Math.max(1, Math.abs(target.estimate)));
    let prev = target.estimate;
    let prevTau = 0;
    let warm: ArrayLike<number> = theta;
    for (let i = 0; i < 40; i++) {
      let psi = prev + dir * step;
      const atLimit = dir < 0 ? psi <= bound.limit : psi >= bound.limit;
      if (atLimit) psi = bound.limit;
      const at = ssrAt(psi, warm);
      if (!at) return null;
      const tauHere = tau(at.excess);
      if (tauHere >= t) return refine(prev, prevTau, psi, tauHere, warm);
      if (atLimit) return bound.closed ? bound.limit : null;
      prev = psi;
      prevTau = tauHere;
      warm = at.theta;
      step *= 2;
    }
    return null;
  };

  // regula falsi (Illinois variant) on τ(ψ) − t between a (below t) and b (above t)
  const refine = (a: number, ta: number, b: number, tb: number, warm: ArrayLike<number>): number => {
    let fa = ta - t;
    let fb = tb - t;
    let side = 0;
    let x = b;
    for (let i = 0; i < 30; i++) {
      x = (a * fb - b * fa) / (fb - fa);
      const at = ssrAt(x, warm);
      if (!at) return x;
      const fx = tau(at.excess) - t;
      if (Math.abs(fx) < 1e-7 || Math.abs(b - a) < 1e-10 * (1 + Math.abs(x))) return x;
      if (fx * fb > 0) {
        b = x;
        fb = fx;
        if (side === 1) fa /= 2;
        side = 1;
      } else {
        a = x;
        fa = fx;
        if (side === -1) fb /= 2;
        side = -1;
      }
    }
    return x;
  };

  return [side(-1), side(1)];
}

/** A successive pKa difference (Δ for the bell) as the linear form aᵀθ. */
export interface Gap {
  names: [string, string];
  delta: number;
  se: number | null;
  a: number[];
}

/** Profile-likelihood intervals of every fitted parameter and of Δ, written into the report. */
export function attachProfiles(fit: ProfileFit, ctx: FitContext, deltaGap: Gap | null): void {
  const { model, data, core, s2, t, ssr } = ctx;
  if (s2 === null || !(s2 > 0) || t === null || !core.converged) return;
  const p = model.names.length;
  const box = { lo: data.lo - 3, hi: data.hi + 3 };
  const run = (target: ProfileTarget): Interval =>
    profileInterval(model, data, core.spec, core.theta, ssr, s2, t, target);
  for (const j of ctx.free) {
    if (!ctx.determined[j]) continue;
    const a = new Array<number>(p).fill(0);
    a[j] = 1;
    const estimate = core.theta[j];
    const se = ctx.cov ? Math.sqrt(ctx.cov[ctx.at[j] * ctx.free.length + ctx.at[j]]) : null;
    const far = 1e3 * (se ?? Math.max(1, Math.abs(estimate)));
    const isPKa = j >= model.nLinear;
    const iv = run({
      a,
      estimate,
      se,
      lower: { limit: isPKa ? Math.max(box.lo, PH_LIMITS.min - 3) : estimate - far, closed: false },
      upper: { limit: isPKa ? box.hi : estimate + far, closed: false },
    });
    fit.parameters[model.names[j]].profile95 = [
      timesOrNull(iv[0], ctx.units[j]),
      timesOrNull(iv[1], ctx.units[j]),
    ];
  }
  if (fit.delta && deltaGap) {
    // Δ ≥ 0 is enforced, so its lower end can be the bound itself
    fit.delta.profile95 = run({
      a: deltaGap.a,
      estimate: deltaGap.delta,
      se: deltaGap.se,
      lower: { limit: 0, closed: true },
      upper: { limit: box.hi - box.lo, closed: false },
    });
  }
}
