/**
 * Ordinary least squares for a straight line and for a quadratic, with standard errors.
 *
 * Straight line y = a + b·x (centred two-pass sums, which keep full precision on data far from zero):
 *   b = Sxy/Sxx,  a = ȳ − b·x̄,  SSR = Σ(yᵢ − a − b·xᵢ)²,  s² = SSR/(n − 2)
 *   SE(b) = s/√Sxx,  SE(a) = s·√(1/n + x̄²/Sxx),  cov(a, b) = −x̄·s²/Sxx,  R² = 1 − SSR/Syy
 * Quadratic y = b0 + b1·x + b2·x² in an orthogonal basis {1, u, q} with u = x − x̄ and
 *   q = u² − mean(u²) − (Σu³/Σu²)·u      (Gram–Schmidt; Σq = Σqu = 0)
 * so that the three coefficients are uncorrelated sums, γ = Σ(basis·y)/Σ(basis²), and b2 = γ_q exactly.
 * The t statistic of b2 is the curvature test the kinetic window uses.
 *
 * Both return null when the line or parabola is not determined (too few points, too few distinct x,
 * non-finite input or overflow). Checked against NIST StRD Norris (line) and Pontius (quadratic).
 * Both take an optional range [from, to) of the arrays, so that windows are fitted without copying.
 */

export interface LineFit {
  n: number;
  /** Degrees of freedom of the residuals, n − 2. */
  dof: number;
  slope: number;
  intercept: number;
  /** null when n = 2 (no residual degrees of freedom). */
  slopeSe: number | null;
  interceptSe: number | null;
  /** cov(intercept, slope); null when n = 2. */
  covInterceptSlope: number | null;
  residualSd: number | null;
  ssr: number;
  /** null when every y is equal (Syy = 0). */
  r2: number | null;
  xMean: number;
  yMean: number;
  sxx: number;
}

export interface QuadraticFit {
  n: number;
  dof: number;
  /** [b0, b1, b2] of y = b0 + b1·x + b2·x². */
  coefficients: [number, number, number];
  /** Standard errors of b0, b1, b2; null when n = 3. */
  se: [number, number, number] | null;
  /**
   * b2/SE(b2); null when n = 3. ±Infinity when a parabola fits exactly (b2 ≠ 0, no residual), and 0 when
   * the quadratic term is at the level of rounding (it explains < (1e-13)²·Σy²), so exact lines test flat.
   */
  tQuadratic: number | null;
  residualSd: number | null;
  ssr: number;
  r2: number | null;
}

type Numbers = ArrayLike<number>;

function allFinite(values: Numbers, from: number, to: number): boolean {
  for (let i = from; i < to; i++) if (!Number.isFinite(values[i])) return false;
  return true;
}

/** Running mean, which cannot overflow where the sum would. */
function meanOf(values: Numbers, from: number, to: number): number {
  let m = 0;
  for (let i = from; i < to; i++) m += (values[i] - m) / (i - from + 1);
  return m;
}

/** Checks the range and the data; returns the number of points or −1. */
function rangeSize(x: Numbers, y: Numbers, from: number, to: number, min: number): number {
  if (x.length !== y.length || !Number.isInteger(from) || !Number.isInteger(to)) return -1;
  if (from < 0 || to > x.length || to - from < min) return -1;
  return allFinite(x, from, to) && allFinite(y, from, to) ? to - from : -1;
}

function finiteOrNull(v: number): number | null {
  return Number.isFinite(v) ? v : null;
}

/** OLS straight line through (x, y), over the points [from, to). */
export function fitLine(x: Numbers, y: Numbers, from = 0, to = x.length): LineFit | null {
  const n = rangeSize(x, y, from, to, 2);
  if (n < 0) return null;
  const xMean = meanOf(x, from, to);
  const yMean = meanOf(y, from, to);
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = from; i < to; i++) {
    const dx = x[i] - xMean;
    const dy = y[i] - yMean;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  if (!(sxx > 0) || !Number.isFinite(sxx) || !Number.isFinite(sxy) || !Number.isFinite(syy)) return null;
  const slope = sxy / sxx;
  const intercept = yMean - slope * xMean;
  let ssr = 0;
  for (let i = from; i < to; i++) {
    const r = y[i] - yMean - slope * (x[i] - xMean);
    ssr += r * r;
  }
  if (!Number.isFinite(slope) || !Number.isFinite(intercept) || !Number.isFinite(ssr)) return null;
  const dof = n - 2;
  const s2 = dof > 0 ? ssr / dof : null;
  return {
    n,
    dof,
    slope,
    intercept,
    slopeSe: s2 === null ? null : finiteOrNull(Math.sqrt(s2 / sxx)),
    interceptSe: s2 === null ? null : finiteOrNull(Math.sqrt(s2 * (1 / n + (xMean * xMean) / sxx))),
    covInterceptSlope: s2 === null ? null : finiteOrNull((-xMean * s2) / sxx),
    residualSd: s2 === null ? null : finiteOrNull(Math.sqrt(s2)),
    ssr,
    r2: syy > 0 ? Math.max(0, 1 - ssr / syy) : null,
    xMean,
    yMean,
    sxx,
  };
}

/** OLS parabola through (x, y), over the points [from, to), in the orthogonal basis described above. */
export function fitQuadratic(x: Numbers, y: Numbers, from = 0, to = x.length): QuadraticFit | null {
  const n = rangeSize(x, y, from, to, 3);
  if (n < 0) return null;
  const xMean = meanOf(x, from, to);
  const yMean = meanOf(y, from, to);
  let suu = 0;
  let suuu = 0;
  for (let i = from; i < to; i++) {
    const u = x[i] - xMean;
    suu += u * u;
    suuu += u * u * u;
  }
  const su2 = suu / n; // mean(u²)
  if (!(suu > 0) || !Number.isFinite(suu) || !Number.isFinite(suuu)) return null;
  const k = suuu / suu;
  let sqq = 0;
  let suy = 0;
  let sqy = 0;
  let syy = 0;
  for (let i = from; i < to; i++) {
    const u = x[i] - xMean;
    const q = u * u - su2 - k * u;
    const dy = y[i] - yMean;
    sqq += q * q;
    suy += u * dy;
    sqy += q * dy;
    syy += dy * dy;
  }
  // Fewer than three distinct x make q vanish (to rounding) relative to u².
  if (!(sqq > 1e-24 * suu * suu) || !Number.isFinite(sqq) || !Number.isFinite(sqy)) return null;
  const g1 = suy / suu;
  const g2 = sqy / sqq;
  let ssr = 0;
  for (let i = from; i < to; i++) {
    const u = x[i] - xMean;
    const r = y[i] - yMean - g1 * u - g2 * (u * u - su2 - k * u);
    ssr += r * r;
  }
  // Back to powers of x: y = ȳ + g1·u + g2·q with u = x − x̄ (rows of T map γ = [ȳ, g1, g2] to b).
  const t0 = [1, -xMean, -su2 + k * xMean + xMean * xMean];
  const t1 = [0, 1, -k - 2 * xMean];
  const gamma = [yMean, g1, g2];
  const b0 = t0[0] * gamma[0] + t0[1] * gamma[1] + t0[2] * gamma[2];
  const b1 = t1[1] * gamma[1] + t1[2] * gamma[2];
  if (![b0, b1, g2, ssr].every(Number.isFinite)) return null;
  const dof = n - 3;
  let se: [number, number, number] | null = null;
  let tQuadratic: number | null = null;
  let residualSd: number | null = null;
  if (dof > 0) {
    const s2 = ssr / dof;
    const varGamma = [s2 / n, s2 / suu, s2 / sqq];
    const v0 = t0[0] ** 2 * varGamma[0] + t0[1] ** 2 * varGamma[1] + t0[2] ** 2 * varGamma[2];
    const v1 = t1[1] ** 2 * varGamma[1] + t1[2] ** 2 * varGamma[2];
    se = [Math.sqrt(v0), Math.sqrt(v1), Math.sqrt(varGamma[2])];
    if (!se.every(Number.isFinite)) se = null;
    residualSd = finiteOrNull(Math.sqrt(s2));
    const seQ = Math.sqrt(varGamma[2]);
    const explained = (sqy * sqy) / sqq;
    const sumY2 = syy + n * yMean * yMean;
    if (explained <= 1e-26 * sumY2) tQuadratic = 0;
    else tQuadratic = seQ > 0 ? g2 / seQ : g2 > 0 ? Infinity : -Infinity;
    if (Number.isNaN(tQuadratic)) tQuadratic = null;
  }
  return {
    n,
    dof,
    coefficients: [b0, b1, g2],
    se,
    tQuadratic,
    residualSd,
    ssr,
    r2: syy > 0 ? Math.max(0, 1 - ssr / syy) : null,
  };
}
