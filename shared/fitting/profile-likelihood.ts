// Profile-likelihood intervals (e.g. Bates & Watts 1988, §6.1 [memory]; the method of R's
// confint for nls). For a quantity ψ = aᵀθ, every other parameter is refitted with ψ held; the
// 95 % interval holds the ψ whose profile sum of squares satisfies
//   S(ψ) − S(θ̂) ≤ s²·t²(0.975, n − p)
// i.e. the signed root τ(ψ) = ±√(S(ψ) − S(θ̂))/s stays within ±t. Unlike the Wald interval it
// follows the curvature of the model: for pKa values near the edge of the data it is lopsided,
// and when the profile never rises enough before the pKa leaves the data that end is open (null).

import { fitSpec, type FitSpec } from './fit-core';
import type { PhModel } from './models';
import type { PhData } from './ph-data';
import type { Interval } from './types';

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
