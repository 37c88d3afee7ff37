import { describe, expect, it } from 'vitest';
import { initialRate, initialRates, type InitialRate } from '@shared/plate';
import { fitLine } from '@shared/stats/linear-regression';
import { nonFiniteNumbers } from './plain-json';
import { generatedTrace, productAt, productByIntegration } from './progress-curve';

function value(r: ReturnType<typeof initialRate>): InitialRate {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

// Generated (invented) progress curves: Michaelis–Menten, S0 = 200 µM, Km = 100 µM, Vmax = 10 µM/min,
// so v0 = Vmax·S0/(Km + S0) = 6.667 µM/min; product read through ε·l = 18000 M⁻¹cm⁻¹ × 0.6 cm (values
// of the 4-nitrophenolate kind, SCIENCE.md §3.2 [memory]); a read every 30 s for 30 min; A0 = 0.05.
const mm = { s0: 200e-6, km: 100e-6, vmax: 10e-6 / 60 };
const curve = (noiseSd: number, seed: number, lag = 0) =>
  generatedTrace({ mm, epsL: 18000 * 0.6, a0: 0.05, step: 30, reads: 61, noiseSd, seed, lag });

describe('the generated progress curves themselves', () => {
  it('Lambert W form agrees with Runge–Kutta integration of dS/dt = −Vmax·S/(Km + S) [derived]', () => {
    for (const t of [30, 300, 900, 1800]) {
      expect(productAt(t, mm)).toBeCloseTo(productByIntegration(t, mm), 14);
    }
  });
});

describe('automatic window on generated Michaelis–Menten progress curves', () => {
  it('without noise, keeps the minimum window (it already bends), within 1.5 % of v0, flagged curvature', () => {
    const g = curve(0, 1);
    const r = value(initialRate(g));
    expect(r.method).toBe('auto');
    expect(r.n).toBe(5);
    expect(Math.abs(r.slope! / g.trueSlope - 1)).toBeLessThan(0.015);
    expect(r.flags).toContain('curvature');
  });

  it('with 0.002 AU noise (50 seeds): slope within 6 % of v0 every time, median within 4 %, stops before 25 % conversion', () => {
    // Stated tolerance: a chord over the first ≤ 25 % of conversion lies up to a few % below the tangent.
    const ratios: number[] = [];
    for (let seed = 1; seed <= 50; seed++) {
      const g = curve(0.002, seed);
      const r = value(initialRate(g));
      const ratio = r.slope! / g.trueSlope;
      ratios.push(ratio);
      expect(Math.abs(ratio - 1)).toBeLessThan(0.06);
      expect(g.conversion[r.indices!.last]).toBeLessThan(0.25);
      expect(r.n).toBeLessThan(61);
      expect(r.flags).not.toContain('curvature');
      expect(r.flags).not.toContain('accelerating');
    }
    ratios.sort((a, b) => a - b);
    expect(Math.abs(ratios[25] - 1)).toBeLessThan(0.04);
  });

  it('does better than the whole trace, whose slope is far below v0 and flagged as curved', () => {
    const g = curve(0.002, 1);
    const whole = value(initialRate(g, { window: { start: 0, end: 1800 } }));
    expect(whole.slope! / g.trueSlope).toBeLessThan(0.8);
    expect(whole.flags).toContain('curvature');
  });

  it('keeps every read of a trace that stays linear (generated: S0 = 2 mM ≫ Km, < 1 % converted)', () => {
    const g = generatedTrace({
      mm: { s0: 2e-3, km: 1e-4, vmax: 1e-8 },
      epsL: 10800,
      a0: 0.05,
      step: 30,
      reads: 41,
      noiseSd: 0.002,
      seed: 7,
    });
    const r = value(initialRate(g));
    expect(r.n).toBe(41);
    expect(Math.abs(r.slope! / g.trueSlope - 1)).toBeLessThan(0.03);
  });
});

describe('lag phase (generated: nothing happens in the first 120 s, then the same reaction)', () => {
  it('from the start, the window sits in the flat lag and the well is flagged accelerating', () => {
    for (let seed = 1; seed <= 10; seed++) {
      const g = curve(0.002, seed, 120);
      const r = value(initialRate(g));
      expect(Math.abs(r.slope! / g.trueSlope)).toBeLessThan(0.1);
      expect(r.flags).toContain('accelerating');
    }
  });

  it('with lag = 120 s the lag is skipped and the slope is within 6 % of v0', () => {
    for (let seed = 1; seed <= 10; seed++) {
      const g = curve(0.002, seed, 120);
      const r = value(initialRate(g, { lag: 120 }));
      expect(r.window!.start).toBe(120);
      expect(Math.abs(r.slope! / g.trueSlope - 1)).toBeLessThan(0.06);
      expect(r.flags).not.toContain('accelerating');
    }
  });
});

describe('user-chosen window', () => {
  it('fits exactly the reads between start and end (inclusive), as an OLS line would', () => {
    const g = curve(0.002, 3);
    const r = value(initialRate(g, { window: { start: 60, end: 300 } }));
    expect(r.method).toBe('user');
    expect(r.n).toBe(9);
    expect(r.indices).toEqual({ first: 2, last: 10 });
    const direct = fitLine(g.times.slice(2, 11), g.values.slice(2, 11))!;
    expect(r.slope).toBe(direct.slope);
    expect(r.slopeSe).toBe(direct.slopeSe);
    expect(r.r2).toBe(direct.r2);
    expect(r.firstSlopeInterval).toBeNull();
  });
});

describe('flags and poor data', () => {
  const times = Array.from({ length: 20 }, (_, i) => i * 30);
  const line = times.map((t) => 0.1 + 0.002 * t);

  it('skips missing reads with a flag and fits the rest', () => {
    const values: (number | null)[] = [...line];
    values[3] = null;
    values[7] = Number.NaN;
    const r = value(initialRate({ times, values }));
    expect(r.flags).toContain('missing_values');
    expect(r.n).toBe(18);
    expect(r.slope!).toBeCloseTo(0.002, 12);
  });

  it('leaves reads above the linear range (default 2.5) out, with a flag', () => {
    const r = value(initialRate({ times, values: times.map((t) => 0.1 + 0.01 * t) }));
    expect(r.flags).toContain('above_linear_range');
    expect(r.n).toBe(9); // 0.1 + 0.01·t ≤ 2.5 for t ≤ 240 s: 9 reads [derived]
    expect(r.window!.end).toBe(240);
    const noLimit = value(
      initialRate({ times, values: times.map((t) => 0.1 + 0.01 * t) }, { linearRangeMax: null }),
    );
    expect(noLimit.n).toBe(20);
  });

  it('gives no rate, with a flag, below the minimum number of reads', () => {
    const r = value(initialRate({ times: [0, 30, 60], values: [0.1, 0.2, 0.3] }));
    expect(r.slope).toBeNull();
    expect(r.flags).toContain('too_few_points');
    const empty = value(initialRate({ times: [], values: [] }));
    expect(empty.slope).toBeNull();
    expect(
      value(initialRate({ times: [0, 30, 60], values: [0.1, 0.2, 0.3] }, { minPoints: 3 })).slope,
    ).toBeCloseTo(1 / 300, 12);
  });

  it('flags a trace that goes up and down (generated noise around a flat line)', () => {
    const g = generatedTrace({
      mm: { s0: 1e-4, km: 1e-4, vmax: 1e-15 },
      epsL: 1,
      a0: 0.2,
      step: 30,
      reads: 30,
      noiseSd: 0.005,
      seed: 11,
    });
    const r = value(initialRate(g));
    expect(r.flags).toContain('non_monotonic');
    expect(r.flags).toContain('slope_not_significant');
  });

  it('flags a constant signal and gives R² as null', () => {
    const r = value(initialRate({ times, values: times.map(() => 0.3) }));
    expect(r.slope).toBe(0);
    expect(r.r2).toBeNull();
    expect(r.flags).toContain('constant_signal');
    expect(nonFiniteNumbers(r)).toEqual([]);
  });

  it('computes every well of a block', () => {
    const r = initialRates(times, { A1: line, A2: line.map((v) => v * 2), A3: [1] });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(value(r.value.A2).slope!).toBeCloseTo(0.004, 12);
    expect(r.value.A3.ok).toBe(false);
  });
});

describe('bad input returns a typed error', () => {
  it.each([
    ['length_mismatch', { times: [0, 1, 2], values: [1, 2] }, {}],
    ['unsorted_times', { times: [0, 2, 1], values: [1, 2, 3] }, {}],
    ['unsorted_times', { times: [0, 1, 1], values: [1, 2, 3] }, {}],
    ['invalid_input', { times: [0, Number.NaN, 2], values: [1, 2, 3] }, {}],
    ['invalid_input', { times: 'soon', values: [] }, {}],
    ['invalid_option', { times: [0, 1], values: [1, 2] }, { minPoints: 2 }],
    ['invalid_option', { times: [0, 1], values: [1, 2] }, { lag: -1 }],
    ['invalid_option', { times: [0, 1], values: [1, 2] }, { window: { start: 5, end: 1 } }],
    ['invalid_option', { times: [0, 1], values: [1, 2] }, { confidence: 1.5 }],
    ['invalid_option', { times: [0, 1], values: [1, 2] }, { linearRangeMax: 'high' }],
  ])('%s for %j %j', (code, trace, options) => {
    const r = initialRate(trace as never, options as never);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.code).toBe(code);
  });

  it('refuses a missing trace', () => {
    expect(initialRate(undefined as never).ok).toBe(false);
    expect(initialRate(null as never).ok).toBe(false);
  });
});
