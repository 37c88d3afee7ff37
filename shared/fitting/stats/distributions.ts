// Student's t and Fisher's F for the fitting engine. The t distribution and the incomplete beta
// function come from shared/stats (one implementation for the whole science core); this module
// adds a cache for the quantiles a fit asks for again and again, and the F upper tail
// (Abramowitz & Stegun 1964, 26.6.2 [memory]):  P(F > f) = I_{d2/(d2 + d1·f)}(d2/2, d1/2).

import {
  regularizedIncompleteBeta,
  studentTCdf as tCdf,
  studentTQuantile as tQuantile,
} from '../../stats/t-distribution';

const quantileCache = new Map<number, Map<number, number>>();

/** The p-quantile of Student's t with ν degrees of freedom; NaN outside 0 < p < 1, ν > 0. */
export function studentTQuantile(p: number, nu: number): number {
  let byNu = quantileCache.get(p);
  const cached = byNu?.get(nu);
  if (cached !== undefined) return cached;
  const t = tQuantile(p, nu) ?? NaN;
  if (!byNu && quantileCache.size < 100) {
    byNu = new Map();
    quantileCache.set(p, byNu);
  }
  if (byNu && byNu.size < 10000) byNu.set(nu, t);
  return t;
}

/** P(T ≤ t); NaN outside the domain. */
export function studentTCdf(t: number, nu: number): number {
  return tCdf(t, nu) ?? NaN;
}

/** Upper tail P(F > f) of Fisher's F with d1, d2 degrees of freedom. */
export function fUpperTail(f: number, d1: number, d2: number): number {
  if (!(d1 > 0) || !(d2 > 0) || Number.isNaN(f)) return NaN;
  if (f <= 0) return 1;
  if (f === Infinity) return 0;
  return regularizedIncompleteBeta(d2 / (d2 + d1 * f), d2 / 2, d1 / 2) ?? NaN;
}
