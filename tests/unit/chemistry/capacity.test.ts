import { describe, expect, it } from 'vitest';
import {
  bufferCapacity,
  capacityCurve,
  makeRecipe,
  titrationCurve,
  type ChemResult,
} from '@shared/chemistry';

function value<T>(r: ChemResult<T>): T {
  if (!r.ok) throw new Error(`${r.error.code}: ${r.error.message}`);
  return r.value;
}

describe('buffer capacity (Van Slyke 1922 [memory]; SCIENCE.md §2.3)', () => {
  it('peaks where pH = pKa (common practice, no source) with β_buffer = ln10·C/4 = 0.576·C', () => {
    // ideal model so that pK″ = pK: HEPES 7.564 at 25 °C (SCIENCE.md §2.5)
    const curve = value(
      capacityCurve({
        system: 'hepes',
        pHFrom: 7.4,
        pHTo: 7.7,
        step: 0.001,
        temperatureC: 25,
        totalConc: 0.1,
        activityModel: 'ideal',
      }),
    );
    const best = curve.reduce((a, b) => (b.bufferCapacity > a.bufferCapacity ? b : a));
    expect(best.pH).toBeCloseTo(7.564, 3);
    expect(best.bufferCapacity).toBeCloseTo((Math.LN10 * 0.1) / 4, 6);
    expect((Math.LN10 * 0.1) / 4).toBeCloseTo(0.0576, 4); // SCIENCE.md §2.3 [derived]
  });

  it('with activity the peak sits at pK″, not pK', () => {
    const curve = value(
      capacityCurve({
        system: 'hepes',
        pHFrom: 7.3,
        pHTo: 7.6,
        step: 0.001,
        temperatureC: 25,
        totalConc: 0.1,
        ionicStrength: 0.1,
      }),
    );
    const best = curve.reduce((a, b) => (b.bufferCapacity > a.bufferCapacity ? b : a));
    expect(best.pH).toBeCloseTo(7.564 - 0.107, 3); // SCIENCE.md §2.2: z = 0 acids pK − 0.107 at I = 0.1
  });

  it('β at the worked checks: phosphate 0.0549, HEPES 0.0288, acetate 0.0496 M/pH (SCIENCE.md §2.4)', () => {
    expect(
      value(bufferCapacity({ system: 'sodium-phosphate', pH: 7, temperatureC: 25, totalConc: 0.1 })).capacity,
    ).toBeCloseTo(0.0549, 4);
    expect(
      value(bufferCapacity({ system: 'hepes', pH: 7.5, temperatureC: 25, totalConc: 0.05 })).capacity,
    ).toBeCloseTo(0.0288, 4);
    expect(
      value(bufferCapacity({ system: 'acetate', pH: 5, temperatureC: 25, totalConc: 0.1, method: 'mix' }))
        .capacity,
    ).toBeCloseTo(0.0496, 4);
  });

  it("water's own terms dominate at the ends: β → ln10·[H⁺] at pH 1.5 and ln10·[OH⁻] at pH 12.5", () => {
    const low = value(bufferCapacity({ system: 'hepes', pH: 1.5, temperatureC: 25, totalConc: 0.001 }));
    expect(low.outsideRange).toBe(true);
    expect(low.waterCapacity / low.capacity).toBeGreaterThan(0.999);
    expect(low.waterCapacity).toBeGreaterThan(Math.LN10 * 10 ** -1.5); // [H⁺] > a(H⁺) because γ < 1
  });

  it('a polyprotic buffer sums its steps: citrate between pK1 and pK2 is stronger than one step alone', () => {
    const r = value(
      bufferCapacity({
        system: 'citrate',
        pH: 3.95,
        temperatureC: 25,
        totalConc: 0.1,
        activityModel: 'ideal',
      }),
    );
    expect(r.relative).toBeGreaterThan(0.8);
  });

  it('β equals the slope of the titration curve dn/dpH (exactly without activity; within 5 % with it)', () => {
    // With activities the added NaOH also raises I, which moves pK″; β is taken at fixed I.
    for (const [activityModel, tolerance] of [
      ['ideal', 0.002],
      ['davies', 0.05],
    ] as const) {
      const b = value(
        makeRecipe({ system: 'mops', pH: 7.2, temperatureC: 25, totalConc: 0.05, volume: 1, activityModel }),
      );
      const t = value(
        titrationCurve({
          composition: b.composition,
          volume: 1,
          titrant: 'NaOH',
          maxAmount: 2e-5,
          steps: 2,
          temperatureC: 25,
          activityModel,
        }),
      );
      const slope = (t[2].amount - t[0].amount) / (t[2].pH - t[0].pH);
      expect(Math.abs(slope / b.capacity.total - 1)).toBeLessThan(tolerance);
    }
  });
});
