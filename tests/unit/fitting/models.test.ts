import { describe, expect, it } from 'vitest';
import { evaluateModel } from '@shared/fitting';
import { bellHalfWidth, bellPeak } from '@shared/fitting/models/bell';
import { MODELS } from '@shared/fitting/models';
import { depressedCubicRoot } from '@shared/fitting/models/three';
import { valueAt } from '@shared/fitting/models/types';
import { prepareProfile } from '@shared/fitting/ph-data';
import { phProblem } from '@shared/fitting/ph-problem';
import { gridStarts } from '@shared/fitting/starts';
import { curveShape } from '@shared/fitting/window';

const values = (model: Parameters<typeof evaluateModel>[0], params: number[], pH: number[]): number[] => {
  const r = evaluateModel(model, params, pH);
  if (!r.ok) throw new Error(r.error.message);
  return r.value as number[];
};

describe('one ionization (SCIENCE.md §1.1)', () => {
  it('rising limb, V = 1, pKa = 6: pH 5 → 0.090909, 6 → 0.5, 7 → 0.909091 [derived]', () => {
    const v = values('acid', [1, 6], [5, 6, 7]);
    expect(v[0]).toBeCloseTo(0.090909, 6);
    expect(v[1]).toBeCloseTo(0.5, 12);
    expect(v[2]).toBeCloseTo(0.909091, 6);
  });
  it('falling limb mirrors it about the pKa', () => {
    const v = values('base', [1, 6], [5, 6, 7]);
    expect(v[0]).toBeCloseTo(0.909091, 6);
    expect(v[2]).toBeCloseTo(0.090909, 6);
  });
  it('half activity at pH = pKa: the window is bounded at the pKa and open on the plateau side', () => {
    expect(curveShape(MODELS.acid, [1, 6], [true, true])).toEqual({
      pHopt: null,
      peak: null,
      lo: 6,
      hi: null,
    });
    expect(curveShape(MODELS.base, [1, 6], [true, true])).toEqual({
      pHopt: null,
      peak: null,
      lo: null,
      hi: 6,
    });
  });
});

describe('the bell (SCIENCE.md §1.2)', () => {
  it('V = 100, pKa1 = 5, pKa2 = 8 gives the check values at pH 3 … 10 [derived]', () => {
    const pH = [3, 4, 5, 6, 6.5, 7, 8, 9, 10];
    const expected = [0.9901, 9.0908, 49.975, 90.0901, 94.0517, 90.0901, 49.975, 9.0908, 0.9901];
    values('bell', [100, 5, 8], pH).forEach((v, i) => expect(v).toBeCloseTo(expected[i], 4));
  });
  it('optimum (pKa1 + pKa2)/2 and highest rate V/(1 + 2·10^(−Δ/2)): Δ → ratio table [derived]', () => {
    const table: [number, number][] = [
      [0, 0.3333],
      [0.6, 0.4994],
      [1, 0.6126],
      [2, 0.8333],
      [3, 0.9405],
      [4, 0.9804],
    ];
    for (const [delta, ratio] of table) {
      expect(bellPeak(1, delta)).toBeCloseTo(ratio, 4);
      const shape = curveShape(MODELS.bell, [1, 6, 6 + delta], [true, true, true]);
      expect(shape.pHopt).toBeCloseTo(6 + delta / 2, 12);
      expect(shape.peak).toBeCloseTo(valueAt(MODELS.bell, [1, 6, 6 + delta], 6 + delta / 2), 12);
    }
  });
  it('pKa 5 and 8: half-maximal at 4.9486 and 8.0514, w = 3.1028 [derived]', () => {
    const s = curveShape(MODELS.bell, [100, 5, 8], [true, true, true]);
    expect(s.lo).toBeCloseTo(4.9486, 4);
    expect(s.hi).toBeCloseTo(8.0514, 4);
    expect((s.hi as number) - (s.lo as number)).toBeCloseTo(3.1028, 4);
    // the two half-maximal pH values sum to pKa1 + pKa2
    expect((s.lo as number) + (s.hi as number)).toBeCloseTo(13, 12);
    // and the activity there really is half the peak
    expect(valueAt(MODELS.bell, [100, 5, 8], s.lo as number)).toBeCloseTo((s.peak as number) / 2, 9);
  });
  it('narrowest one-proton bell w = 2·log10(2 + √3) = 1.144 (the limit Δ → −∞); Δ = log10 4 gives w = 1.53 [derived]', () => {
    expect(2 * bellHalfWidth(-40)).toBeCloseTo(2 * Math.log10(2 + Math.sqrt(3)), 12);
    expect(2 * bellHalfWidth(-40)).toBeCloseTo(1.144, 3);
    expect(2 * bellHalfWidth(Math.log10(4))).toBeCloseTo(1.53, 2);
    // the width only grows with Δ
    expect(bellHalfWidth(0.7)).toBeGreaterThan(bellHalfWidth(0.602));
  });
});

describe('partially active states (SCIENCE.md §1.3)', () => {
  const theta = [20, 100, 5, 5, 8];
  it('V_lo = 20, V_mid = 100, V_hi = 5, pKa 5 and 8: pH 2, 5, 6.5, 8, 11 [derived]', () => {
    const v = values('bell-plateau', theta, [2, 5, 6.5, 8, 11]);
    [20.0799, 59.9725, 94.7952, 52.4838, 5.0949].forEach((e, i) => expect(v[i]).toBeCloseTo(e, 4));
  });
  it('optimum found numerically at pH 6.4603 with v = 94.8156 [derived]', () => {
    const s = curveShape(
      MODELS['bell-plateau'],
      theta,
      theta.map(() => true),
    );
    expect(s.pHopt).toBeCloseTo(6.4603, 4);
    expect(s.peak).toBeCloseTo(94.8156, 4);
  });
});

describe('three ionizations (SCIENCE.md §1.4)', () => {
  const theta = [100, 4, 5.5, 8.5];
  it('V = 100, pKa = 4, pKb = 5.5, pKc = 8.5 at pH 3 … 9 [derived]', () => {
    const v = values('three', theta, [3, 4, 5, 6, 7, 8, 9]);
    [0.0287, 1.5565, 22.3273, 75.6114, 94.0489, 75.7926, 24.0235].forEach((e, i) =>
      expect(v[i]).toBeCloseTo(e, 4),
    );
  });
  it('the closed-form optimum is the maximum of the curve', () => {
    const opt = MODELS.three.optimum(theta) as number;
    const at = valueAt(MODELS.three, theta, opt);
    for (const d of [-1e-3, 1e-3]) expect(valueAt(MODELS.three, theta, opt + d)).toBeLessThan(at);
  });
  it('solves s³ − s − k = 0 on both branches of the closed form', () => {
    for (const k of [0, 1e-6, 0.2, 0.3849, 0.39, 5, 1e6]) {
      const s = depressedCubicRoot(k);
      expect(s ** 3 - s - k).toBeCloseTo(0, 9 - Math.max(0, Math.log10(1 + k) * 2));
      expect(s).toBeGreaterThanOrEqual(1);
    }
  });
});

describe('analytic Jacobians agree with central differences', () => {
  for (const [id, theta] of [
    ['acid', [3, 6]],
    ['base', [3, 6]],
    ['bell', [50, 5, 8]],
    ['bell-plateau', [20, 100, 5, 5, 8]],
    ['three', [100, 4, 5.5, 8.5]],
  ] as const) {
    it(`${id}`, () => {
      const model = MODELS[id];
      const k = new Float64Array(4);
      const g = new Float64Array(theta.length);
      for (const pH of [3, 5.5, 6.5, 7.7, 10]) {
        model.constants(theta, k);
        model.point(theta, k, 10 ** -pH, 10 ** pH, g);
        theta.forEach((_, j) => {
          const h = 1e-6 * Math.max(1, Math.abs(theta[j]));
          const up = [...theta];
          const down = [...theta];
          up[j] += h;
          down[j] -= h;
          const numeric = (valueAt(model, up, pH) - valueAt(model, down, pH)) / (2 * h);
          expect(g[j]).toBeCloseTo(numeric, 6);
        });
      }
    });
  }
});

describe("the bell's hand-written hot path equals the generic model path", () => {
  // bell-200-like invented data; the generic path is reached through an identity map / a model copy
  const pH = [3, 3.5, 4, 5, 6, 6.5, 7, 8, 9, 10];
  const v = [1, 3, 9, 50, 90, 94, 90, 50, 9, 1];
  const prepared = prepareProfile({ pH, v }, 3);
  if (!prepared.ok) throw new Error(prepared.error.message);
  const data = prepared.value;
  it('residuals and Jacobian', () => {
    const identity = {
      p: 3,
      q: 3,
      c: new Float64Array(3),
      M: Float64Array.from([1, 0, 0, 0, 1, 0, 0, 0, 1]),
    };
    const fast = phProblem(MODELS.bell, data, null);
    const generic = phProblem(MODELS.bell, data, identity);
    for (const theta of [
      [1, 5, 8],
      [0.7, 6.2, 6.4],
      [1.3, 2, 12],
    ]) {
      const [r1, r2] = [new Float64Array(10), new Float64Array(10)];
      const [J1, J2] = [new Float64Array(30), new Float64Array(30)];
      expect(fast.evaluate(theta, r1, J1)).toBe(true);
      expect(generic.evaluate(theta, r2, J2)).toBe(true);
      r1.forEach((x, i) => expect(x).toBeCloseTo(r2[i], 14));
      J1.forEach((x, i) => expect(x).toBeCloseTo(J2[i], 14));
    }
  });
  it('grid starts', () => {
    const generic = { ...MODELS.bell, id: 'bell-generic' } as unknown as typeof MODELS.bell;
    const a = gridStarts(MODELS.bell, data, [null, null, null], 4);
    const b = gridStarts(generic, data, [null, null, null], 4);
    expect(a.length).toBe(4);
    a.forEach((s, i) => {
      expect(s.ssr).toBeCloseTo(b[i].ssr, 12);
      s.theta.forEach((x, j) => expect(x).toBeCloseTo(b[i].theta[j], 12));
    });
  });
});
