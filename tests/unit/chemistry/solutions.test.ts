import { describe, expect, it } from 'vitest';
import {
  addStrongAcidOrBase,
  makeRecipe,
  mixSolutions,
  saltForIonicStrength,
  solutionFromIngredients,
  solutionPH,
  temperatureShift,
  type ChemResult,
  type Composition,
} from '@shared/chemistry';

function value<T>(r: ChemResult<T>): T {
  if (!r.ok) throw new Error(`${r.error.code}: ${r.error.message}`);
  return r.value;
}
const water: Composition = { buffers: [], ions: {} };

describe('temperature shift of a recipe (SCIENCE.md §2.4 Tris example)', () => {
  const tris = value(
    makeRecipe({ system: 'tris', pH: 8, temperatureC: 25, totalConc: 0.05, volume: 1, method: 'titrate' }),
  );
  it('50 mM Tris made to pH 8.00 at 25 °C reads 7.682 at 37 °C', () => {
    const r = value(temperatureShift({ composition: tris.composition, fromC: 25, toC: 37 }));
    expect(r.pHFrom).toBeCloseTo(8, 9);
    expect(r.pHTo).toBeCloseTo(7.682, 3);
  });
  it('and 8.636 at 4 °C', () => {
    expect(value(temperatureShift({ composition: tris.composition, fromC: 25, toC: 4 })).pHTo).toBeCloseTo(
      8.636,
      3,
    );
  });
  it('phosphate barely moves (dpK/dT −0.0021, SCIENCE.md §2.5)', () => {
    const p = value(
      makeRecipe({ system: 'sodium-phosphate', pH: 7, temperatureC: 25, totalConc: 0.05, volume: 1 }),
    );
    expect(
      Math.abs(value(temperatureShift({ composition: p.composition, fromC: 25, toC: 37 })).shift),
    ).toBeLessThan(0.03);
  });
});

describe('NBS/NIST physiological phosphate standard with extended Debye–Hückel (SCIENCE.md §2.4)', () => {
  // 0.008695 mol/kg KH2PO4 + 0.03043 mol/kg Na2HPO4 [memory]; pH(S) 7.415 (25 °C), 7.395 (37 °C)
  // [pub: Roy et al. 2009, J Solution Chem 38:471]; the equations give 7.415 and 7.393 [derived].
  const composition = value(
    solutionFromIngredients({
      volume: 1,
      ingredients: [
        { system: 'sodium-phosphate', formId: 'disodium-hydrogen-phosphate', moles: 0.03043 },
        { system: 'potassium-phosphate', formId: 'potassium-dihydrogen-phosphate', moles: 0.008695 },
      ],
    }),
  );
  const pHAt = (t: number) =>
    value(solutionPH({ composition, temperatureC: t, activityModel: 'extended-debye-huckel' })).pH;
  it('7.415 at 25 °C', () => expect(pHAt(25)).toBeCloseTo(7.415, 3));
  it('7.393 at 37 °C [derived] (published 7.395)', () => {
    expect(pHAt(37)).toBeCloseTo(7.393, 3);
    expect(Math.abs(pHAt(37) - 7.395)).toBeLessThan(0.003);
  });
});

describe('textbook Tris examples (Harris, Quantitative Chemical Analysis [memory]; SCIENCE.md §2.4 [derived])', () => {
  const harris = value(
    solutionFromIngredients({
      volume: 1,
      ingredients: [
        { system: 'tris', formId: 'tris', moles: 12.43 / 121.135 },
        { system: 'tris', formId: 'tris-hydrochloride', moles: 4.67 / 157.596 },
      ],
    }),
  );
  const ideal = { temperatureC: 25, activityModel: 'ideal' } as const;
  it('12.43 g Tris + 4.67 g Tris·HCl in 1.00 L, pKa 8.072 → pH 8.611', () => {
    expect(value(solutionPH({ composition: harris, ...ideal })).pH).toBeCloseTo(8.611, 3);
  });
  it('after 12.0 mL of 1.00 M HCl → 8.410', () => {
    const r = value(
      addStrongAcidOrBase({
        composition: harris,
        volume: 1,
        reagent: 'HCl',
        amount: 0.012,
        reagentConc: 1,
        ...ideal,
      }),
    );
    expect(r.pHAfter).toBeCloseTo(8.41, 3);
  });
  it('0.500 M NaOH to bring 10.0 g Tris·HCl to pH 7.60 → 32.0 mL', () => {
    const r = value(
      makeRecipe({
        system: 'tris',
        pH: 7.6,
        totalConc: 10 / 157.596,
        volume: 1,
        method: 'titrate',
        startForm: 'tris-hydrochloride',
        titrantConc: 0.5,
        ...ideal,
      }),
    );
    const naoh = r.components.find((c) => c.role === 'titrant')!;
    expect(naoh.id).toBe('NaOH');
    expect(naoh.volume! * 1000).toBeCloseTo(32.0, 1);
  });
});

describe('strong acid into water and into a buffer (common practice, no source)', () => {
  it('1 mL of 0.1 M HCl in 100 mL of pure water gives pH ≈ 3.0', () => {
    const r = value(
      addStrongAcidOrBase({
        composition: water,
        volume: 0.1,
        reagent: 'HCl',
        amount: 1e-4,
        reagentConc: 0.1,
        temperatureC: 25,
      }),
    );
    expect(r.pHBefore).toBeCloseTo(13.995 / 2, 6); // neutral water, pKw/2 (SCIENCE.md §2.3)
    expect(Math.abs(r.pHAfter - 3.0)).toBeLessThan(0.05);
    expect(r.addedVolume).toBeCloseTo(0.001, 12);
  });
  it('a 50 mM buffer resists the same addition with a shift of a tenth of a unit or less', () => {
    for (const system of ['hepes', 'tris', 'sodium-phosphate', 'acetate', 'mes']) {
      const pH = { hepes: 7.5, tris: 8, 'sodium-phosphate': 7, acetate: 4.8, mes: 6.2 }[system]!;
      const b = value(makeRecipe({ system, pH, temperatureC: 25, totalConc: 0.05, volume: 0.1 }));
      const r = value(
        addStrongAcidOrBase({
          composition: b.composition,
          volume: 0.1,
          reagent: 'HCl',
          amount: 1e-4,
          reagentConc: 0.1,
          temperatureC: 25,
        }),
      );
      expect(r.shift).toBeLessThan(0);
      expect(Math.abs(r.shift)).toBeLessThanOrEqual(0.1);
      // β predicts it: ΔpH ≈ Δn/(β·V)
      const predicted = 1e-4 / 0.1 / b.capacity.total;
      expect(Math.abs(r.shift) / predicted).toBeGreaterThan(0.9);
      expect(Math.abs(r.shift) / predicted).toBeLessThan(1.1);
    }
  });
});

describe('mixing volumes in a well', () => {
  const buffer = value(makeRecipe({ system: 'hepes', pH: 7.5, temperatureC: 37, totalConc: 0.1, volume: 1 }));
  const enzyme = value(
    makeRecipe({ system: 'tris', pH: 8, temperatureC: 37, totalConc: 0.02, volume: 0.01 }),
  );

  it('one solution alone keeps its pH', () => {
    const r = value(
      mixSolutions({
        temperatureC: 37,
        parts: [{ label: 'buffer', composition: buffer.composition, volume: 1e-4 }],
      }),
    );
    expect(r.pH).toBeCloseTo(7.5, 8);
  });

  it('diluting with water moves a buffer only slightly (its ratio is kept)', () => {
    const r = value(
      mixSolutions({
        temperatureC: 37,
        parts: [
          { label: 'buffer', composition: buffer.composition, volume: 180e-6 },
          { label: 'substrate in water', composition: water, volume: 20e-6 },
        ],
      }),
    );
    expect(r.totalVolume).toBeCloseTo(200e-6, 12);
    expect(r.pH).toBeGreaterThan(7.5); // lower I raises pK″ of a z = 0 acid (SCIENCE.md §2.2)
    expect(r.pH - 7.5).toBeLessThan(0.02);
  });

  it('an enzyme stock in another buffer pulls the well pH towards its own', () => {
    const r = value(
      mixSolutions({
        temperatureC: 37,
        parts: [
          { label: 'buffer', composition: buffer.composition, volume: 100e-6 },
          { label: 'enzyme stock', composition: enzyme.composition, volume: 100e-6 },
        ],
      }),
    );
    expect(r.pH).toBeGreaterThan(7.5);
    expect(r.pH).toBeLessThan(8);
    expect(r.buffers.map((b) => b.systemId).sort()).toEqual(['hepes', 'tris']);
  });
});

describe('salt to reach a target ionic strength', () => {
  it('brings an existing solution exactly to the target and reports the pH it then reads', () => {
    const b = value(
      makeRecipe({ system: 'sodium-phosphate', pH: 7, temperatureC: 25, totalConc: 0.02, volume: 1 }),
    );
    const r = value(
      saltForIonicStrength({ composition: b.composition, targetIonicStrength: 0.15, temperatureC: 25 }),
    );
    const after = value(solutionPH({ composition: r.composition, temperatureC: 25 }));
    expect(after.ionicStrength).toBeCloseTo(0.15, 9);
    expect(r.pHAfter).toBeLessThan(r.pHBefore); // phosphate pK2 falls with I (SCIENCE.md §2.6)
    expect(r.gramsPerLitre).toBeCloseTo(r.saltConc * 58.44, 1);
  });
  it('refuses a target below what the solution already has', () => {
    const b = value(
      makeRecipe({ system: 'sodium-phosphate', pH: 7, temperatureC: 25, totalConc: 0.1, volume: 1 }),
    );
    expect(
      saltForIonicStrength({ composition: b.composition, targetIonicStrength: 0.1, temperatureC: 25 }),
    ).toMatchObject({
      ok: false,
      error: { code: 'impossible-recipe' },
    });
  });
});
