/**
 * Student's t distribution: CDF, upper tail, two-sided p-value and quantile.
 *
 * simple-statistics (7.12) has no t quantile, and its `probit` is an approximation good to only about
 * three digits, so both are computed here from the regularized incomplete beta function:
 *   P(T > t) = ½ · I_x(ν/2, ½),  x = ν/(ν + t²),  t ≥ 0            (Abramowitz & Stegun 26.7.1 [memory])
 * I_x(a, b) is evaluated by its continued fraction (DLMF 8.17.22) with the modified Lentz method, using
 * the symmetry I_x(a, b) = 1 − I_{1−x}(b, a) where the fraction converges slowly.
 * The quantile solves P(T > t) = q by safeguarded Newton steps (bisection when a step leaves the bracket).
 *
 * Functions return null for arguments outside their domain (ν ≤ 0, p outside (0, 1), non-finite input).
 */
import { gammaln } from 'simple-statistics';

const EPS = 1e-15;
const TINY = 1e-300;
const MAX_ITER = 500;

/** ln B(a, b) = ln Γ(a) + ln Γ(b) − ln Γ(a + b). */
function logBeta(a: number, b: number): number {
  return gammaln(a) + gammaln(b) - gammaln(a + b);
}

/** Continued fraction of I_x(a, b) (DLMF 8.17.22), modified Lentz evaluation. */
function betaContinuedFraction(a: number, b: number, x: number): number {
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAX_ITER; m++) {
    const m2 = 2 * m;
    // even step: d_{2m} = m(b − m)x / ((a + 2m − 1)(a + 2m))
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    // odd step: d_{2m+1} = −(a + m)(a + b + m)x / ((a + 2m)(a + 2m + 1))
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPS) break;
  }
  return h;
}

/** Regularized incomplete beta function I_x(a, b) for a, b > 0 and 0 ≤ x ≤ 1. */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number | null {
  if (!(a > 0) || !(b > 0) || !(x >= 0) || !(x <= 1) || !Number.isFinite(a) || !Number.isFinite(b))
    return null;
  if (x === 0) return 0;
  if (x === 1) return 1;
  const logFront = a * Math.log(x) + b * Math.log1p(-x) - logBeta(a, b);
  if (x < (a + 1) / (a + b + 2)) {
    return (Math.exp(logFront) * betaContinuedFraction(a, b, x)) / a;
  }
  return 1 - (Math.exp(logFront) * betaContinuedFraction(b, a, 1 - x)) / b;
}

function validDf(df: number): boolean {
  return typeof df === 'number' && df > 0 && !Number.isNaN(df);
}

/**
 * Above ν = 1e7 the t quantile differs from the normal one by about (z³ + z)/(4ν) < 3e-7 for |z| < 3,
 * while ln Γ differences of huge arguments lose digits; so ν is capped there (ν = ∞ gives the normal
 * limit to that accuracy).
 */
const DF_CAP = 1e7;

/** P(T > t) (upper tail), any finite t. */
function upperTail(t: number, rawDf: number): number {
  const df = Math.min(rawDf, DF_CAP);
  const t2 = t * t;
  // For small t use x' = t²/(ν + t²) to keep precision: P(T > t) = ½ − ½·I_{x'}(½, ν/2).
  if (t2 < df) {
    const i = regularizedIncompleteBeta(t2 / (df + t2), 0.5, df / 2) ?? 0;
    return t >= 0 ? 0.5 - 0.5 * i : 0.5 + 0.5 * i;
  }
  const i = regularizedIncompleteBeta(df / (df + t2), df / 2, 0.5) ?? 0;
  return t >= 0 ? 0.5 * i : 1 - 0.5 * i;
}

/** Cumulative distribution P(T ≤ t) of Student's t with ν = df degrees of freedom (ν may be fractional). */
export function studentTCdf(t: number, df: number): number | null {
  if (!validDf(df) || Number.isNaN(t)) return null;
  if (t === Infinity) return 1;
  if (t === -Infinity) return 0;
  return 1 - upperTail(t, df);
}

/** Two-sided p-value P(|T| ≥ |t|). */
export function studentTTwoSidedP(t: number, df: number): number | null {
  if (!validDf(df) || Number.isNaN(t)) return null;
  if (!Number.isFinite(t)) return 0;
  return Math.min(1, 2 * upperTail(Math.abs(t), df));
}

/** Density of Student's t, used for Newton steps. */
function density(t: number, rawDf: number): number {
  const df = Math.min(rawDf, DF_CAP);
  const logC = gammaln((df + 1) / 2) - gammaln(df / 2) - 0.5 * Math.log(df * Math.PI);
  return Math.exp(logC - ((df + 1) / 2) * Math.log1p((t * t) / df));
}

/** Upper-tail quantile: t ≥ 0 with P(T > t) = q, 0 < q ≤ ½. */
function upperQuantile(q: number, df: number): number {
  // Closed forms [derived from the CDFs]: ν = 1 (Cauchy) t = tan(π(½ − q)); ν = 2 t = (1 − 2q)/√(2q(1 − q)).
  if (df === 1) return Math.tan(Math.PI * (0.5 - q));
  if (df === 2) return (1 - 2 * q) / Math.sqrt(2 * q * (1 - q));
  let lo = 0;
  let hi = 1;
  while (upperTail(hi, df) > q && hi < 1e300) hi *= 2;
  let t = Math.min(hi, Math.max(lo, hi / 2));
  for (let i = 0; i < 200; i++) {
    const f = upperTail(t, df) - q; // decreasing in t
    if (f > 0) lo = t;
    else hi = t;
    const g = density(t, df);
    let next = g > 0 ? t + f / g : Number.NaN;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - t) <= 1e-14 * Math.max(1, Math.abs(t)) || hi - lo <= 1e-15 * Math.max(1, hi)) {
      return next;
    }
    t = next;
  }
  return t;
}

/** Quantile t_p(ν): P(T ≤ t) = p. E.g. the 95 % two-sided interval uses studentTQuantile(0.975, ν). */
export function studentTQuantile(p: number, df: number): number | null {
  if (!validDf(df) || !(p > 0) || !(p < 1)) return null;
  if (p === 0.5) return 0;
  return p > 0.5 ? upperQuantile(1 - p, df) : -upperQuantile(p, df);
}

/** Φ⁻¹(¾) = 0.6744897501960817: the normal quartile, behind MAD scaling and modified z-scores [derived]. */
export const NORMAL_QUARTILE = 0.6744897501960817;
