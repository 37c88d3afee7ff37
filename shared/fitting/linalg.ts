// Small dense linear algebra for the normal equations of a few parameters (p ≤ ~10).
// Matrices are row-major Float64Arrays of size p×p. Everything works in place on caller buffers
// so the fitting loop allocates nothing.

/**
 * Solves (A + λ·diag(d)) x = b by Cholesky on the Jacobi-scaled matrix (unit diagonal), which
 * keeps the factorization accurate when the parameters have very different scales.
 * L (p×p) and s (p) are work space. Returns false when the matrix is not positive definite.
 */
export function dampedCholeskySolve(
  A: Float64Array,
  d: Float64Array,
  lambda: number,
  b: Float64Array,
  x: Float64Array,
  p: number,
  L: Float64Array,
  s: Float64Array, // scaling 1/sqrt(diag)
): boolean {
  for (let i = 0; i < p; i++) {
    const di = A[i * p + i] + lambda * d[i];
    if (!(di > 0) || !Number.isFinite(di)) return false;
    s[i] = 1 / Math.sqrt(di);
  }
  for (let i = 0; i < p; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = (A[i * p + j] + (i === j ? lambda * d[i] : 0)) * s[i] * s[j];
      for (let k = 0; k < j; k++) sum -= L[i * p + k] * L[j * p + k];
      if (i === j) {
        if (!(sum > 1e-15)) return false;
        L[i * p + i] = Math.sqrt(sum);
      } else {
        L[i * p + j] = sum / L[j * p + j];
      }
    }
  }
  // forward: L y = s∘b ; back: Lᵀ z = y ; x = s∘z
  for (let i = 0; i < p; i++) {
    let sum = b[i] * s[i];
    for (let k = 0; k < i; k++) sum -= L[i * p + k] * x[k];
    x[i] = sum / L[i * p + i];
  }
  for (let i = p - 1; i >= 0; i--) {
    let sum = x[i];
    for (let k = i + 1; k < p; k++) sum -= L[k * p + i] * x[k];
    x[i] = sum / L[i * p + i];
  }
  for (let i = 0; i < p; i++) x[i] *= s[i];
  return true;
}

/**
 * Inverse of a symmetric positive definite matrix (for the covariance s²(JᵀJ)⁻¹), by Gauss–Jordan
 * with partial pivoting on the Jacobi-scaled matrix. Returns null when it is numerically singular
 * (a pivot below `tol` relative to the unit diagonal), i.e. a parameter the data do not determine.
 */
export function invertSymmetric(A: ArrayLike<number>, p: number, tol = 1e-13): number[] | null {
  // plain arrays: for a few parameters they are cheaper to create than typed arrays
  const s = new Array<number>(p).fill(0);
  for (let i = 0; i < p; i++) {
    const di = A[i * p + i];
    if (!(di > 0) || !Number.isFinite(di)) return null;
    s[i] = 1 / Math.sqrt(di);
  }
  const m = new Array<number>(p * 2 * p).fill(0);
  const w = 2 * p;
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < p; j++) m[i * w + j] = A[i * p + j] * s[i] * s[j];
    m[i * w + p + i] = 1;
  }
  for (let c = 0; c < p; c++) {
    let piv = c;
    for (let r = c + 1; r < p; r++) if (Math.abs(m[r * w + c]) > Math.abs(m[piv * w + c])) piv = r;
    if (!(Math.abs(m[piv * w + c]) > tol)) return null;
    if (piv !== c) {
      for (let k = 0; k < w; k++) {
        const t = m[c * w + k];
        m[c * w + k] = m[piv * w + k];
        m[piv * w + k] = t;
      }
    }
    const inv = 1 / m[c * w + c];
    for (let k = 0; k < w; k++) m[c * w + k] *= inv;
    for (let r = 0; r < p; r++) {
      if (r === c) continue;
      const f = m[r * w + c];
      if (f === 0) continue;
      for (let k = 0; k < w; k++) m[r * w + k] -= f * m[c * w + k];
    }
  }
  const out = new Array<number>(p * p).fill(0);
  for (let i = 0; i < p; i++) for (let j = 0; j < p; j++) out[i * p + j] = m[i * w + p + j] * s[i] * s[j];
  for (let i = 0; i < p; i++) if (!Number.isFinite(out[i * p + i]) || out[i * p + i] < 0) return null;
  return out;
}

/** JᵀJ (p×p) and Jᵀr (p) from a row-major n×p Jacobian, into caller buffers. */
export function normalEquations(
  J: Float64Array,
  r: Float64Array,
  n: number,
  p: number,
  A: Float64Array,
  g: Float64Array,
): void {
  A.fill(0, 0, p * p);
  g.fill(0, 0, p);
  for (let i = 0; i < n; i++) {
    const row = i * p;
    const ri = r[i];
    for (let a = 0; a < p; a++) {
      const ja = J[row + a];
      g[a] += ja * ri;
      for (let b = 0; b <= a; b++) A[a * p + b] += ja * J[row + b];
    }
  }
  for (let a = 0; a < p; a++) for (let b = 0; b < a; b++) A[b * p + a] = A[a * p + b];
}
