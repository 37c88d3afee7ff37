/**
 * Welch's two-sample t test (unequal variances; Welch 1947, Biometrika 34:28 [memory]):
 *   t = (x̄₁ − x̄₂)/√(s₁²/n₁ + s₂²/n₂)
 *   ν = (s₁²/n₁ + s₂²/n₂)² / ((s₁²/n₁)²/(n₁ − 1) + (s₂²/n₂)²/(n₂ − 1))   (Welch–Satterthwaite)
 * Returns null with fewer than two values in a group. When both variances are zero the test is exact:
 * p = 0 if the means differ, 1 if they are equal.
 */
import { mean, sampleVariance } from 'simple-statistics';
import { studentTTwoSidedP } from './t-distribution';

export interface WelchResult {
  difference: number;
  t: number | null;
  dof: number | null;
  p: number;
}

export function welchTTest(a: readonly number[], b: readonly number[]): WelchResult | null {
  if (a.length < 2 || b.length < 2) return null;
  const difference = mean([...a]) - mean([...b]);
  const va = sampleVariance([...a]) / a.length;
  const vb = sampleVariance([...b]) / b.length;
  if (![difference, va, vb].every(Number.isFinite)) return null;
  const v = va + vb;
  if (v === 0) return { difference, t: null, dof: null, p: difference === 0 ? 1 : 0 };
  const t = difference / Math.sqrt(v);
  const dof = (v * v) / ((va * va) / (a.length - 1) + (vb * vb) / (b.length - 1));
  const p = studentTTwoSidedP(t, dof);
  return p === null ? null : { difference, t, dof, p };
}
