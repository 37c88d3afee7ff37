import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { chooseModel, evaluateModel, fitProfile, type ModelId } from '@shared/fitting';

// Property tests (fast-check) on invented, noise-free profiles: common practice, no source.
const grid = (lo: number, hi: number, n: number) =>
  Array.from({ length: n }, (_, i) => lo + ((hi - lo) * i) / (n - 1));
const curve = (model: ModelId, theta: number[], pH: number[]) => {
  const r = evaluateModel(model, theta, pH);
  if (!r.ok) throw new Error(r.error.message);
  return r.value as number[];
};
const fast = { profile: false, alternative: false } as const;
const bellParams = fc.record({
  V: fc.double({ min: 0.5, max: 500, noNaN: true }),
  pKa1: fc.double({ min: 4, max: 6.5, noNaN: true }),
  delta: fc.double({ min: 1.5, max: 4, noNaN: true }),
});

describe('noise-free data give back the true parameters', () => {
  it('bell', () => {
    fc.assert(
      fc.property(bellParams, ({ V, pKa1, delta }) => {
        const pH = grid(2.5, 11, 15);
        const r = fitProfile({ pH, v: curve('bell', [V, pKa1, pKa1 + delta], pH) }, fast);
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        expect(r.value.parameters.V.value).toBeCloseTo(V, 6 - Math.ceil(Math.log10(V)));
        expect(r.value.parameters.pKa1.value).toBeCloseTo(pKa1, 6);
        expect(r.value.parameters.pKa2.value).toBeCloseTo(pKa1 + delta, 6);
        expect(r.value.pHopt.value).toBeCloseTo(pKa1 + delta / 2, 6);
      }),
      { numRuns: 60 },
    );
  });
  it('acid, base, bell-plateau and three', () => {
    const pH = grid(2, 12, 21);
    const cases: [ModelId, number[]][] = [
      ['acid', [40, 6.2]],
      ['base', [40, 7.1]],
      ['bell-plateau', [20, 100, 5, 5, 8]],
      ['three', [100, 4, 5.5, 8.5]],
    ];
    for (const [model, theta] of cases) {
      const r = fitProfile({ pH, v: curve(model, theta, pH) }, { ...fast, model });
      if (!r.ok) throw new Error(r.error.message);
      r.value.parameterNames.forEach((name, j) =>
        expect(r.value.parameters[name].value).toBeCloseTo(theta[j], 5),
      );
    }
  });
});

describe('symmetries', () => {
  it('scaling the activity scales only V (and the sums of squares by its square)', () => {
    fc.assert(
      fc.property(bellParams, fc.double({ min: 1e-6, max: 1e6, noNaN: true }), ({ V, pKa1, delta }, k) => {
        const pH = grid(3, 10, 12);
        const v = curve('bell', [V, pKa1, pKa1 + delta], pH).map((x, i) => x * (1 + 0.03 * Math.sin(7 * i)));
        const a = fitProfile({ pH, v }, fast);
        const b = fitProfile({ pH, v: v.map((x) => x * k) }, fast);
        if (!a.ok || !b.ok) throw new Error('fit failed');
        expect(
          (b.value.parameters.V.value as number) / (a.value.parameters.V.value as number) / k,
        ).toBeCloseTo(1, 8);
        expect(b.value.parameters.pKa1.value).toBeCloseTo(a.value.parameters.pKa1.value as number, 6);
        expect(b.value.parameters.pKa2.value).toBeCloseTo(a.value.parameters.pKa2.value as number, 6);
        expect((b.value.ssr as number) / (a.value.ssr as number) / (k * k)).toBeCloseTo(1, 6);
      }),
      { numRuns: 40 },
    );
  });
  it('mirroring pH about a point swaps the limbs and mirrors the optimum', () => {
    fc.assert(
      fc.property(bellParams, fc.double({ min: 5, max: 8, noNaN: true }), ({ V, pKa1, delta }, c) => {
        const pH = grid(3, 10, 12);
        const v = curve('bell', [V, pKa1, pKa1 + delta], pH).map((x, i) => x * (1 + 0.03 * Math.cos(5 * i)));
        const a = fitProfile({ pH, v }, fast);
        const b = fitProfile({ pH: pH.map((x) => 2 * c - x), v }, fast);
        if (!a.ok || !b.ok)
          throw new Error(`fit failed: ${JSON.stringify([a, b].map((r) => (r.ok ? 'ok' : r.error)))}`);
        const [pa, pb] = [a.value.parameters, b.value.parameters];
        expect(pb.pKa1.value).toBeCloseTo(2 * c - (pa.pKa2.value as number), 6);
        expect(pb.pKa2.value).toBeCloseTo(2 * c - (pa.pKa1.value as number), 6);
        expect(pb.V.value).toBeCloseTo(pa.V.value as number, 4);
        expect(b.value.pHopt.value).toBeCloseTo(2 * c - (a.value.pHopt.value as number), 6);
        // and the one-limb models trade places
        const acid = fitProfile({ pH: pH.slice(0, 6), v: v.slice(0, 6) }, { ...fast, model: 'acid' });
        const base = fitProfile(
          { pH: pH.slice(0, 6).map((x) => 2 * c - x), v: v.slice(0, 6) },
          { ...fast, model: 'base' },
        );
        if (!acid.ok || !base.ok)
          throw new Error(`fit failed: ${JSON.stringify([acid, base].map((r) => (r.ok ? 'ok' : r.error)))}`);
        expect(base.value.parameters.pKa.value).toBeCloseTo(
          2 * c - (acid.value.parameters.pKa.value as number),
          6,
        );
      }),
      { numRuns: 40 },
    );
  });
});

describe('no input crashes the solver', () => {
  const num = fc.oneof(
    fc.double(),
    fc.constantFrom(NaN, Infinity, -Infinity, 1e308, -1e308, 5e-324, 0),
    fc.double({ min: 0, max: 14, noNaN: true }),
  );
  it('fitProfile returns a result or a typed error for any arrays', () => {
    fc.assert(
      fc.property(
        fc.array(num, { maxLength: 25 }),
        fc.array(num, { maxLength: 25 }),
        fc.option(fc.array(num, { maxLength: 25 })),
        (pH, v, w) => {
          for (const model of ['bell', 'acid', 'bell-plateau'] as const) {
            const r = fitProfile({ pH, v, w }, { ...fast, model });
            if (!r.ok) expect(typeof r.error.code).toBe('string');
            else expect(JSON.parse(JSON.stringify(r.value))).toEqual(r.value);
          }
        },
      ),
      { numRuns: 300 },
    );
  });
  it('huge, tiny and constant activities on a valid pH grid give finite or null numbers', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.constant(0)), {
          minLength: 8,
          maxLength: 8,
        }),
        (v) => {
          const pH = grid(3, 10, 8);
          const r = fitProfile({ pH, v }, { alternative: true, bootstrap: 5 });
          expect(r.ok).toBe(true);
          if (r.ok) expect(JSON.parse(JSON.stringify(r.value))).toEqual(r.value);
          const c = chooseModel({ pH, v }, { profile: false });
          if (!c.ok) expect(typeof c.error.message).toBe('string');
        },
      ),
      { numRuns: 100 },
    );
  });
});
