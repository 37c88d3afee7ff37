import { describe, expect, it } from 'vitest';
import { evaluateModel, fitProfile } from '@shared/fitting';
import { bellPeak } from '@shared/fitting/models/bell';
import { gaussian, grid } from './helpers/simulate';

const values = (model: 'acid' | 'bell', theta: number[], pH: number[]): number[] => {
  const r = evaluateModel(model, theta, pH);
  if (!r.ok) throw new Error(r.error.message);
  return r.value as number[];
};

describe('the log plot (SCIENCE.md §1.5)', () => {
  it('an isolated ionization passes log10 2 = 0.301 below the meeting point of its tangents [derived]', () => {
    // rising limb V = 40, pKa 6: tangents log V (plateau) and log V + (pH − pKa) meet at pH = pKa
    const [atPKa] = values('acid', [40, 6], [6]);
    expect(Math.log10(40) - Math.log10(atPKa)).toBeCloseTo(0.301, 3);
  });
  it('for a bell the ±1 asymptotes meet at pHopt at height log V, above the top by log10(1 + 2·10^(−Δ/2)) [derived]', () => {
    for (const delta of [0.5, 1, 2, 3]) {
      const [top] = values('bell', [100, 6, 6 + delta], [6 + delta / 2]);
      expect(Math.log10(100) - Math.log10(top)).toBeCloseTo(Math.log10(1 + 2 * 10 ** (-delta / 2)), 12);
      expect(top).toBeCloseTo(bellPeak(100, delta), 10);
    }
  });
});

describe('how well the bell is determined (SCIENCE.md §1.7)', () => {
  // Simulation as described there: 7 points pH 4–10, 5 % noise (proportional to the activity),
  // 500 replicates, 90 % ranges. Our replicates use another random generator, so the ranges agree
  // within Monte Carlo error, not digit for digit.
  const table: {
    pKa: [number, number];
    pKa1: number[];
    pKa2: number[];
    V: number[];
    pHopt: number[];
    delta: number[];
  }[] = [
    {
      pKa: [5, 8],
      pKa1: [4.9, 5.1],
      pKa2: [7.91, 8.1],
      V: [93, 107],
      pHopt: [6.45, 6.55],
      delta: [2.85, 3.16],
    },
    {
      pKa: [6, 7.5],
      pKa1: [5.87, 6.13],
      pKa2: [7.4, 7.6],
      V: [87, 114],
      pHopt: [6.7, 6.79],
      delta: [1.28, 1.71],
    },
    {
      pKa: [6, 7],
      pKa1: [5.92, 6.13],
      pKa2: [6.87, 7.08],
      V: [88, 122],
      pHopt: [6.45, 6.55],
      delta: [0.77, 1.14],
    },
    {
      pKa: [6.3, 6.7],
      pKa1: [6.18, 6.45],
      pKa2: [6.54, 6.81],
      V: [81, 134],
      pHopt: [6.46, 6.54],
      delta: [0.1, 0.61],
    },
  ];
  const quantile = (xs: number[], p: number): number => {
    const s = [...xs].sort((a, b) => a - b);
    const i = p * (s.length - 1);
    const f = Math.floor(i);
    return s[f] + (i - f) * (s[Math.min(f + 1, s.length - 1)] - s[f]);
  };
  for (const row of table) {
    it(`true pKa ${row.pKa[0]} / ${row.pKa[1]}: the 90 % ranges of the table`, () => {
      const pH = grid(4, 10, 7);
      const truth = values('bell', [100, ...row.pKa], pH);
      const noise = gaussian(20261201);
      const got: Record<'pKa1' | 'pKa2' | 'V' | 'pHopt' | 'delta', number[]> = {
        pKa1: [],
        pKa2: [],
        V: [],
        pHopt: [],
        delta: [],
      };
      for (let r = 0; r < 500; r++) {
        const f = fitProfile(
          { pH, v: truth.map((t) => t * (1 + 0.05 * noise())) },
          { profile: false, alternative: false },
        );
        if (!f.ok) throw new Error(f.error.message);
        const p = f.value.parameters;
        got.pKa1.push(p.pKa1.value as number);
        got.pKa2.push(p.pKa2.value as number);
        got.V.push(p.V.value as number);
        got.pHopt.push(f.value.pHopt.value as number);
        got.delta.push(f.value.delta?.value as number);
      }
      for (const key of ['pKa1', 'pKa2', 'pHopt'] as const) {
        expect(Math.abs(quantile(got[key], 0.05) - row[key][0])).toBeLessThan(0.03);
        expect(Math.abs(quantile(got[key], 0.95) - row[key][1])).toBeLessThan(0.03);
      }
      expect(Math.abs(quantile(got.delta, 0.05) - row.delta[0])).toBeLessThan(0.06);
      expect(Math.abs(quantile(got.delta, 0.95) - row.delta[1])).toBeLessThan(0.06);
      expect(Math.abs(quantile(got.V, 0.05) / row.V[0] - 1)).toBeLessThan(0.03);
      expect(Math.abs(quantile(got.V, 0.95) / row.V[1] - 1)).toBeLessThan(0.06);
    });
  }
  it('corr(V, pKa1) rises from 0.71 (pKa 5/8) to 0.97 (6.3/6.7) with 13 points and 3 % noise (weights 1/σ², pH 4–10)', () => {
    // the correlation matrix depends on the design and the weights, not on the noise draw
    for (const [pKa, expected] of [
      [[5, 8], 0.71],
      [[6.3, 6.7], 0.97],
    ] as const) {
      const pH = grid(4, 10, 13);
      const truth = values('bell', [100, ...pKa], pH);
      const f = fitProfile(
        {
          pH,
          v: truth.map((t, i) => t * (1 + 1e-6 * Math.sin(i))),
          w: truth.map((t) => 1 / (0.03 * t) ** 2),
        },
        { profile: false },
      );
      if (!f.ok) throw new Error(f.error.message);
      expect(f.value.correlation[0][1]).toBeCloseTo(expected, 2);
    }
  });
});
