import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { initialRate } from '@shared/plate';
import { nonFiniteNumbers } from './plain-json';

const RUNS = { numRuns: 200, seed: 20240601 };

const times = (n: number, step: number) => Array.from({ length: n }, (_, i) => i * step);

/**
 * A noisy trace: a line plus noise on a reader-like grid (multiples of 1e-4), so that every feature of the
 * data lies far above double rounding (adding 5 to 0.2 moves its last bit; a property cannot hold below that).
 */
const noisyTrace = fc
  .record({
    n: fc.integer({ min: 5, max: 60 }),
    step: fc.double({ min: 1, max: 120, noNaN: true }),
    slope: fc.integer({ min: -5000, max: 5000 }),
    noise: fc.array(fc.integer({ min: -50, max: 50 }), { minLength: 60, maxLength: 60 }),
  })
  .map(({ n, step, slope, noise }) => {
    const t = times(n, step);
    return { times: t, values: t.map((x, i) => 0.2 + slope * 1e-6 * x + noise[i] * 1e-4) };
  });

describe('initial rate: properties', () => {
  it('exact lines give exact slopes over every read', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 5, max: 80 }),
        fc.double({ min: 0.5, max: 600, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: -2, max: 2, noNaN: true }),
        (n, step, slope, intercept) => {
          const t = times(n, step);
          const r = initialRate(
            { times: t, values: t.map((x) => intercept + slope * x) },
            { linearRangeMax: null },
          );
          expect(r.ok).toBe(true);
          if (!r.ok) return;
          expect(r.value.n).toBe(n);
          expect(Math.abs(r.value.slope! - slope)).toBeLessThanOrEqual(
            1e-12 * (Math.abs(slope) + Math.abs(intercept) / (n * step)) + 1e-15,
          );
        },
      ),
      RUNS,
    );
  });

  it('adding a constant to the signal changes no rate and no window', () => {
    fc.assert(
      fc.property(noisyTrace, fc.double({ min: -5, max: 5, noNaN: true }), (trace, c) => {
        const a = initialRate(trace, { linearRangeMax: null });
        const b = initialRate(
          { times: trace.times, values: trace.values.map((v) => v + c) },
          { linearRangeMax: null },
        );
        expect(a.ok && b.ok).toBe(true);
        if (!a.ok || !b.ok) return;
        expect(b.value.n).toBe(a.value.n);
        expect(Math.abs(b.value.slope! - a.value.slope!)).toBeLessThanOrEqual(
          1e-9 * (Math.abs(a.value.slope!) + 1e-6),
        );
      }),
      RUNS,
    );
  });

  it('scaling the signal by k scales the rate by k and keeps the window', () => {
    fc.assert(
      fc.property(
        noisyTrace,
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.boolean(),
        (trace, magnitude, negative) => {
          const k = negative ? -magnitude : magnitude;
          const a = initialRate(trace, { linearRangeMax: null });
          const b = initialRate(
            { times: trace.times, values: trace.values.map((v) => v * k) },
            { linearRangeMax: null },
          );
          expect(a.ok && b.ok).toBe(true);
          if (!a.ok || !b.ok) return;
          expect(b.value.n).toBe(a.value.n);
          expect(b.value.slope!).toBeCloseTo(k * a.value.slope!, 9);
        },
      ),
      RUNS,
    );
  });

  it('no input crashes it, and every result is plain JSON (NaN, nulls, empty, one point, huge values)', () => {
    const anyValue = fc.oneof(
      fc.double(),
      fc.constant(null),
      fc.constant(Number.NaN),
      fc.constant(Infinity),
      fc.constant(1e308),
      fc.constant(-1e308),
      fc.constant(5e-324),
    );
    const anyTime = fc.oneof(fc.double(), fc.integer(), fc.constant(1e308));
    fc.assert(
      fc.property(
        fc.array(anyTime, { maxLength: 30 }),
        fc.array(anyValue, { maxLength: 30 }),
        fc.boolean(),
        (rawTimes, values, sorted) => {
          const t = sorted ? [...rawTimes].sort((a, b) => a - b) : rawTimes;
          const r = initialRate({ times: t, values }, {});
          if (r.ok) expect(nonFiniteNumbers(r.value)).toEqual([]);
          else expect(typeof r.error.message).toBe('string');
        },
      ),
      { numRuns: 500, seed: 7 },
    );
  });

  it('huge but finite values on increasing times give a finite answer or a flag, never NaN', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.constant(1e308), fc.constant(-1e308), fc.double({ min: -1e307, max: 1e307 })), {
          minLength: 5,
          maxLength: 20,
        }),
        (values) => {
          const r = initialRate({ times: times(values.length, 1), values }, { linearRangeMax: null });
          expect(r.ok).toBe(true);
          if (r.ok) expect(nonFiniteNumbers(r.value)).toEqual([]);
        },
      ),
      { numRuns: 200, seed: 3 },
    );
  });
});
