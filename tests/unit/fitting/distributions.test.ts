import { describe, expect, it } from 'vitest';
import { fUpperTail, runsTest, studentTCdf, studentTQuantile } from '@shared/fitting';

describe("Student's t quantile", () => {
  it('is exact where closed forms exist: ν = 1 (Cauchy, tan(π(p − ½))) and ν = 2 ((2p − 1)/√(2p(1 − p))) [derived]', () => {
    for (const p of [0.6, 0.9, 0.95, 0.975, 0.995]) {
      expect(studentTQuantile(p, 1)).toBeCloseTo(Math.tan(Math.PI * (p - 0.5)), 9);
      expect(studentTQuantile(p, 2)).toBeCloseTo((2 * p - 1) / Math.sqrt(2 * p * (1 - p)), 11);
    }
  });
  it('matches the published t table (two-sided 95 %, one-sided 95 %, two-sided 99 %) [memory: standard t tables, e.g. NIST/SEMATECH e-Handbook 1.3.6.7.2]', () => {
    const table: [number, number, number, number][] = [
      // ν, t(0.975), t(0.95), t(0.995)
      [1, 12.706, 6.314, 63.657],
      [2, 4.303, 2.92, 9.925],
      [3, 3.182, 2.353, 5.841],
      [5, 2.571, 2.015, 4.032],
      [10, 2.228, 1.812, 3.169],
      [20, 2.086, 1.725, 2.845],
      [30, 2.042, 1.697, 2.75],
      [60, 2.0, 1.671, 2.66],
      [120, 1.98, 1.658, 2.617],
    ];
    for (const [nu, t975, t95, t995] of table) {
      expect(studentTQuantile(0.975, nu)).toBeCloseTo(t975, 3);
      expect(studentTQuantile(0.95, nu)).toBeCloseTo(t95, 3);
      expect(studentTQuantile(0.995, nu)).toBeCloseTo(t995, 3);
    }
  });
  it('tends to the normal quantile 1.959964 as ν grows [pub: z(0.975) = 1.959964]', () => {
    expect(studentTQuantile(0.975, 1e7)).toBeCloseTo(1.959964, 5);
  });
  it('inverts the distribution function, also for fractional ν and the lower tail', () => {
    for (const nu of [0.5, 1.5, 4.2, 37]) {
      for (const p of [0.001, 0.2, 0.7, 0.999])
        expect(studentTCdf(studentTQuantile(p, nu), nu)).toBeCloseTo(p, 10);
    }
  });
  it('returns NaN for impossible arguments', () => {
    expect(studentTQuantile(0, 5)).toBeNaN();
    expect(studentTQuantile(0.5, 0)).toBeNaN();
  });
});

describe('F distribution', () => {
  it('P(F(1, ν) > t²) equals the two-sided t tail [derived]; the F(2, d) tail is (1 + 2f/d)^(−d/2) [derived]', () => {
    const t = studentTQuantile(0.975, 10);
    expect(fUpperTail(t * t, 1, 10)).toBeCloseTo(0.05, 12);
    expect(fUpperTail(3, 2, 20)).toBeCloseTo((1 + (2 * 3) / 20) ** -10, 12);
  });
  it('matches the F table: F(0.95; 2, 10) = 4.103, F(0.95; 3, 20) = 3.098 [memory: standard F tables]', () => {
    expect(fUpperTail(4.103, 2, 10)).toBeCloseTo(0.05, 4);
    expect(fUpperTail(3.098, 3, 20)).toBeCloseTo(0.05, 4);
  });
});

describe('Wald–Wolfowitz runs test (exact distribution)', () => {
  it('two runs in 5 + 5 signs: P = 2/C(10, 5) = 0.0079 [derived]', () => {
    const r = runsTest([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], [1, 1, 1, 1, 1, -1, -1, -1, -1, -1]);
    expect(r?.runs).toBe(2);
    expect(r?.expected).toBe(6);
    expect(r?.pValue).toBeCloseTo(2 / 252, 12);
  });
  it('alternating signs are not flagged; residuals are taken in order of pH, not input order', () => {
    expect(runsTest([1, 2, 3, 4, 5, 6], [1, -1, 1, -1, 1, -1])?.pValue).toBeCloseTo(1, 12);
    const shuffled = runsTest([6, 1, 5, 2, 4, 3], [-1, 1, -1, 1, -1, 1]);
    expect(shuffled?.runs).toBe(2);
  });
  it('needs two signs of each kind', () => {
    expect(runsTest([1, 2, 3], [1, 1, -1])).toBeNull();
  });
});
