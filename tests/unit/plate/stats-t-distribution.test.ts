import { gamma } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import {
  NORMAL_QUARTILE,
  regularizedIncompleteBeta,
  studentTCdf,
  studentTQuantile,
  studentTTwoSidedP,
} from '@shared/stats/t-distribution';
import { welchTTest } from '@shared/stats/welch';

/** ∫₀ᵗ f(x)dx of the t density by composite Simpson — a different method from the incomplete beta. */
function simpsonCdfFromZero(t: number, df: number, steps = 20000): number {
  const c = gamma((df + 1) / 2) / (Math.sqrt(df * Math.PI) * gamma(df / 2));
  const f = (x: number) => c * (1 + (x * x) / df) ** (-(df + 1) / 2);
  const h = t / steps;
  let s = f(0) + f(t);
  for (let i = 1; i < steps; i++) s += (i % 2 ? 4 : 2) * f(i * h);
  return (s * h) / 3;
}

describe("Student's t quantiles", () => {
  it('match the closed forms for 1 and 2 degrees of freedom [derived: t = tan(π(p − ½)); t = (2p − 1)/√(2p(1 − p))]', () => {
    for (const p of [0.6, 0.9, 0.975, 0.995]) {
      expect(studentTQuantile(p, 1)!).toBeCloseTo(Math.tan(Math.PI * (p - 0.5)), 9);
      expect(studentTQuantile(p, 2)!).toBeCloseTo((2 * p - 1) / Math.sqrt(2 * p * (1 - p)), 12);
    }
  });

  it('match printed tables of t critical values (NIST/SEMATECH e-Handbook §1.3.6.7.2 [memory])', () => {
    expect(studentTQuantile(0.975, 5)!).toBeCloseTo(2.571, 3);
    expect(studentTQuantile(0.975, 10)!).toBeCloseTo(2.228, 3);
    expect(studentTQuantile(0.975, 30)!).toBeCloseTo(2.042, 3);
    expect(studentTQuantile(0.995, 5)!).toBeCloseTo(4.032, 3);
    expect(studentTQuantile(0.995, 10)!).toBeCloseTo(3.169, 3);
    expect(studentTQuantile(0.975, 1e9)!).toBeCloseTo(1.96, 3);
  });

  it('invert the CDF, and the CDF agrees with Simpson integration of the density [derived]', () => {
    for (const df of [3, 4.5, 7, 25]) {
      for (const p of [0.8, 0.95, 0.975]) {
        const t = studentTQuantile(p, df)!;
        expect(studentTCdf(t, df)!).toBeCloseTo(p, 12);
        expect(0.5 + simpsonCdfFromZero(t, df)).toBeCloseTo(p, 9);
      }
    }
  });

  it('is antisymmetric, and two-sided p-values close the loop', () => {
    expect(studentTQuantile(0.025, 8)!).toBeCloseTo(-studentTQuantile(0.975, 8)!, 12);
    expect(studentTTwoSidedP(studentTQuantile(0.975, 8)!, 8)!).toBeCloseTo(0.05, 12);
    expect(studentTQuantile(0.5, 8)).toBe(0);
  });

  it('gives the normal quartile Φ⁻¹(¾) = 0.6744897501960817 as ν grows [derived]', () => {
    expect(studentTQuantile(0.75, 1e7)!).toBeCloseTo(NORMAL_QUARTILE, 6);
  });

  it('refuses arguments outside the domain with null', () => {
    expect(studentTQuantile(0, 5)).toBeNull();
    expect(studentTQuantile(1, 5)).toBeNull();
    expect(studentTQuantile(0.9, 0)).toBeNull();
    expect(studentTQuantile(Number.NaN, 5)).toBeNull();
    expect(studentTCdf(1, -1)).toBeNull();
    expect(regularizedIncompleteBeta(2, 1, 1)).toBeNull();
  });

  it('gives I_x(1, 1) = x and I_x(a, b) = 1 − I_{1−x}(b, a) [derived]', () => {
    expect(regularizedIncompleteBeta(0.3, 1, 1)!).toBeCloseTo(0.3, 14);
    expect(regularizedIncompleteBeta(0.3, 2.5, 4)! + regularizedIncompleteBeta(0.7, 4, 2.5)!).toBeCloseTo(
      1,
      14,
    );
  });
});

describe("Welch's t test", () => {
  it('gives t and the Welch–Satterthwaite degrees of freedom of a hand-worked example', () => {
    // a: mean 3, variance 2.5; b: mean 7, variance 14 (by hand). s²/n: 0.5 and 2.3333.
    // t = −4/√2.83333 = −2.376354; ν = 2.83333²/(0.5²/4 + 2.33333²/5) = 6.972256 [derived]
    const r = welchTTest([1, 2, 3, 4, 5], [2, 4, 6, 8, 10, 12])!;
    expect(r.t!).toBeCloseTo(-2.376354, 6);
    expect(r.dof!).toBeCloseTo(6.972256, 6);
    expect(r.p).toBeCloseTo(studentTTwoSidedP(-2.376354103, 6.97225573)!, 8);
    expect(r.p).toBeGreaterThan(0.04);
    expect(r.p).toBeLessThan(0.06);
  });
});
