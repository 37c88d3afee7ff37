import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { meanProtonsLost, protonVariance, speciate, speciesFractions } from '@shared/chemistry';

describe('speciation from cumulative constants (SCIENCE.md §2.3)', () => {
  it('gives the Henderson–Hasselbalch base fraction α = 1/(1 + 10^(pK − pH)) for one step', () => {
    // SCIENCE.md §2.3; §2.4: 7.198 at pH 7 gives 0.388 (ideal)
    expect(speciesFractions([7.198], 7)[1]).toBeCloseTo(0.388, 3);
    expect(speciesFractions([6], 6)).toEqual([0.5, 0.5]);
  });

  it('phosphate at pH 7.198 (= pK2): H2PO4⁻ and HPO4²⁻ equal, H3PO4 and PO4³⁻ tiny', () => {
    const [h3, h2, h1, p] = speciesFractions([2.148, 7.198, 12.35], 7.198);
    expect(h2).toBeCloseTo(h1, 12);
    expect(h3).toBeLessThan(1e-5);
    expect(p).toBeLessThan(1e-5);
  });

  it('matches the direct formula with cumulative constants for three steps', () => {
    // α_j = (β_j/h^j) / Σ β_k/h^k — written out longhand (definition, SCIENCE.md §2.3)
    const [k1, k2, k3] = [3.128, 4.761, 6.396].map((p) => 10 ** -p);
    const h = 10 ** -4.5;
    const terms = [1, k1 / h, (k1 * k2) / h ** 2, (k1 * k2 * k3) / h ** 3];
    const sum = terms.reduce((a, b) => a + b, 0);
    const direct = terms.map((t) => t / sum);
    speciesFractions([3.128, 4.761, 6.396], 4.5).forEach((a, j) => expect(a).toBeCloseTo(direct[j], 14));
  });

  it('stays finite at extreme pH', () => {
    for (const pH of [-3, 0, 14, 17]) {
      const f = speciesFractions([2, 7, 12], pH);
      expect(f.every(Number.isFinite)).toBe(true);
      expect(f.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    }
  });

  it('mean and variance of protons lost: one step gives α and α(1 − α)', () => {
    const f = speciesFractions([6], 6.3);
    expect(meanProtonsLost(f)).toBeCloseTo(f[1], 14);
    expect(protonVariance(f)).toBeCloseTo(f[1] * f[0], 14);
  });

  it('speciate() returns typed errors for bad input', () => {
    expect(speciate({ pKas: [7], pH: 15 })).toMatchObject({ ok: false, error: { code: 'ph-out-of-range' } });
    expect(speciate({ pKas: [], pH: 7 })).toMatchObject({ ok: false, error: { code: 'invalid-input' } });
    expect(speciate({ pKas: [Number.NaN], pH: 7 })).toMatchObject({ ok: false });
  });
});

describe('speciation properties (fast-check)', () => {
  const pKaSet = fc
    .array(fc.double({ min: 0, max: 14, noNaN: true }), { minLength: 1, maxLength: 3 })
    .map((a) => [...a].sort((x, y) => x - y));
  it('fractions lie in [0, 1] and sum to 1', () => {
    fc.assert(
      fc.property(pKaSet, fc.double({ min: 0, max: 14, noNaN: true }), (pKas, pH) => {
        const f = speciesFractions(pKas, pH);
        expect(f).toHaveLength(pKas.length + 1);
        expect(f.every((a) => a >= 0 && a <= 1)).toBe(true);
        expect(Math.abs(f.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
      }),
    );
  });
  it('the mean protons lost never falls as pH rises', () => {
    fc.assert(
      fc.property(pKaSet, fc.double({ min: 0, max: 13.9, noNaN: true }), (pKas, pH) => {
        const lo = meanProtonsLost(speciesFractions(pKas, pH));
        const hi = meanProtonsLost(speciesFractions(pKas, pH + 0.1));
        expect(hi).toBeGreaterThanOrEqual(lo - 1e-12);
      }),
    );
  });
});
