import { describe, expect, it } from 'vitest';
import { makeRecipe, solutionPH, type Recipe, type RecipeInput } from '@shared/chemistry';

function recipe(input: RecipeInput): Recipe {
  const r = makeRecipe(input);
  if (!r.ok) throw new Error(`${r.error.code}: ${r.error.message}`);
  return r.value;
}
const component = (r: Recipe, role: string) => r.components.find((c) => c.role === role)!;

describe('SCIENCE.md §2.4 worked checks [derived, Davies]', () => {
  const phosphate = {
    system: 'sodium-phosphate',
    pH: 7,
    temperatureC: 25,
    totalConc: 0.1,
    volume: 1,
    method: 'mix',
  } as const;

  it('100 mM sodium phosphate pH 7.00, 25 °C: I 0.2214, pK″ 6.811, base 0.6070, 39.30/60.70 mM, β 0.0549', () => {
    const r = recipe(phosphate);
    expect(r.ionicStrength).toBeCloseTo(0.2214, 4);
    expect(r.ionization.pKapp).toBeCloseTo(6.811, 3);
    expect(r.baseFraction).toBeCloseTo(0.607, 4);
    expect(r.species[1].conc * 1000).toBeCloseTo(39.3, 2); // H2PO4⁻
    expect(r.species[2].conc * 1000).toBeCloseTo(60.7, 2); // HPO4²⁻
    expect(r.capacity.total).toBeCloseTo(0.0549, 4);
    expect(component(r, 'acid-form').id).toBe('sodium-dihydrogen-phosphate');
    expect(component(r, 'base-form').id).toBe('disodium-hydrogen-phosphate');
  });

  it('ideal Henderson–Hasselbalch with 7.198 would give a base fraction of 0.388', () => {
    const r = recipe({ ...phosphate, activityModel: 'ideal' });
    expect(r.baseFraction).toBeCloseTo(0.388, 3); // SCIENCE.md §2.4
  });

  it('the same with 150 mM NaCl: I 0.3737, pK″ 6.790, base 0.6184', () => {
    const r = recipe({ ...phosphate, saltConc: 0.15 });
    expect(r.ionicStrength).toBeCloseTo(0.3737, 4);
    expect(r.ionization.pKapp).toBeCloseTo(6.79, 3);
    expect(r.baseFraction).toBeCloseTo(0.6184, 4);
    expect(component(r, 'salt').grams).toBeCloseTo(0.15 * 58.44, 1); // NaCl 58.44 g/mol (common practice)
  });

  it('50 mM HEPES pH 7.50, free acid + NaOH: I 0.0250, pK″ 7.498, NaOH 25.05 mmol/L, β 0.0288', () => {
    const r = recipe({
      system: 'hepes',
      pH: 7.5,
      temperatureC: 25,
      totalConc: 0.05,
      volume: 1,
      method: 'titrate',
    });
    expect(r.ionicStrength).toBeCloseTo(0.025, 4);
    expect(r.ionization.pKapp).toBeCloseTo(7.498, 3);
    expect(component(r, 'start-form').id).toBe('hepes');
    expect(component(r, 'titrant').id).toBe('NaOH');
    expect(component(r, 'titrant').moles * 1000).toBeCloseTo(25.05, 2);
    expect(r.capacity.total).toBeCloseTo(0.0288, 4);
  });

  it('50 mM Tris pH 8.00 at 25 °C, base + HCl: I 0.0290, pK″ 8.142, HCl 29.04 mmol/L', () => {
    const r = recipe({
      system: 'tris',
      pH: 8,
      temperatureC: 25,
      totalConc: 0.05,
      volume: 1,
      method: 'titrate',
    });
    expect(r.ionicStrength).toBeCloseTo(0.029, 4);
    expect(r.ionization.pKapp).toBeCloseTo(8.142, 3);
    expect(component(r, 'start-form').id).toBe('tris');
    expect(component(r, 'titrant').id).toBe('HCl');
    expect(component(r, 'titrant').moles * 1000).toBeCloseTo(29.04, 2);
  });

  it('100 mM sodium acetate pH 5.00: I 0.0686, pK″ 4.661, acetate 68.58 mM, acetic acid 31.42 mM, β 0.0496', () => {
    const r = recipe({
      system: 'acetate',
      pH: 5,
      temperatureC: 25,
      totalConc: 0.1,
      volume: 1,
      method: 'mix',
    });
    expect(r.ionicStrength).toBeCloseTo(0.0686, 4);
    expect(r.ionization.pKapp).toBeCloseTo(4.661, 3);
    expect(r.species[1].conc * 1000).toBeCloseTo(68.58, 2);
    expect(r.species[0].conc * 1000).toBeCloseTo(31.42, 2);
    expect(r.capacity.total).toBeCloseTo(0.0496, 4);
  });

  it('10 mM acetic acid titrated with NaOH to pH 4.00: I 0.00155, pK″ 4.737, NaOH 1.4441 mM', () => {
    const r = recipe({
      system: 'acetate',
      pH: 4,
      temperatureC: 25,
      totalConc: 0.01,
      volume: 1,
      method: 'titrate',
    });
    expect(r.ionicStrength).toBeCloseTo(0.00155, 5);
    expect(r.ionization.pKapp).toBeCloseTo(4.737, 3);
    expect(component(r, 'titrant').moles * 1000).toBeCloseTo(1.4441, 4);
  });

  it('Henderson–Hasselbalch alone (pK 4.756, no activity, no [H⁺] term) would give 1.4922 mM', () => {
    const r = recipe({
      system: 'acetate',
      pH: 4,
      temperatureC: 25,
      totalConc: 0.01,
      volume: 1,
      activityModel: 'ideal',
    });
    expect(r.baseFraction * 0.01 * 1000).toBeCloseTo(1.4922, 4); // SCIENCE.md §2.4
  });
});

describe('recipe mechanics', () => {
  it('mixing gives grams from formula weights and stock volumes when stocks are given', () => {
    const r = recipe({
      system: 'sodium-phosphate',
      pH: 7,
      temperatureC: 25,
      totalConc: 0.1,
      volume: 0.5,
      method: 'mix',
      stockConcs: { 'sodium-dihydrogen-phosphate': 1, 'disodium-hydrogen-phosphate': 0.5 },
    });
    const acid = component(r, 'acid-form');
    const base = component(r, 'base-form');
    expect(acid.moles + base.moles).toBeCloseTo(0.05, 12);
    expect(acid.grams).toBeCloseTo(acid.moles * 119.976, 2); // NaH2PO4 from atomic weights
    expect(acid.volume).toBeCloseTo(acid.moles / 1, 12);
    expect(base.volume).toBeCloseTo(base.moles / 0.5, 12);
  });

  it('a liquid form gets its volume from its density (acetic acid 1.049 g/mL [memory])', () => {
    const r = recipe({
      system: 'acetate',
      pH: 5,
      temperatureC: 25,
      totalConc: 0.1,
      volume: 1,
      method: 'mix',
    });
    const acid = component(r, 'acid-form');
    expect(acid.volume! * 1000).toBeCloseTo(acid.grams! / 1.049, 6);
  });

  it('reaches a target ionic strength exactly with salt, keeping the target pH', () => {
    const r = recipe({
      system: 'hepes',
      pH: 7.5,
      temperatureC: 25,
      totalConc: 0.05,
      volume: 1,
      targetIonicStrength: 0.15,
    });
    expect(r.ionicStrength).toBeCloseTo(0.15, 12);
    expect(r.saltConc).toBeGreaterThan(0.12);
    const back = solutionPH({ composition: r.composition, temperatureC: 25 });
    expect(back.ok && back.value.pH).toBeCloseTo(7.5, 8);
    expect(back.ok && back.value.ionicStrength).toBeCloseTo(0.15, 8);
  });

  it('uses KCl and KOH with potassium phosphate', () => {
    const r = recipe({
      system: 'potassium-phosphate',
      pH: 7.2,
      temperatureC: 25,
      totalConc: 0.05,
      volume: 1,
      targetIonicStrength: 0.2,
    });
    expect(component(r, 'titrant').id).toBe('KOH');
    expect(component(r, 'salt').id).toBe('KCl');
    expect(r.counterIons.Na ?? 0).toBe(0);
  });

  it('mixes citric acid and trisodium citrate across three steps', () => {
    for (const pH of [3.5, 4.5, 5.5, 6.5]) {
      const r = recipe({
        system: 'citrate',
        pH,
        temperatureC: 25,
        totalConc: 0.05,
        volume: 1,
        method: 'mix',
      });
      expect(component(r, 'acid-form').id).toBe('citric-acid-monohydrate');
      expect(component(r, 'base-form').id).toBe('trisodium-citrate-dihydrate');
      const back = solutionPH({ composition: r.composition, temperatureC: 25 });
      expect(back.ok && back.value.pH).toBeCloseTo(pH, 8);
    }
  });

  it('falls back to another pair of forms when the default pair cannot reach the pH (borate)', () => {
    const r = recipe({
      system: 'borate',
      pH: 9.8,
      temperatureC: 25,
      totalConc: 0.05,
      volume: 1,
      method: 'mix',
    });
    expect([component(r, 'acid-form').id, component(r, 'base-form').id]).not.toEqual(['boric-acid', 'borax']);
  });

  it('switches the titrant when the start form lies on the other side of the target', () => {
    // Tris·HCl alone is far below pH 9.3: it needs NaOH, not the HCl preset for Tris base.
    const r = recipe({
      system: 'tris',
      pH: 9.3,
      temperatureC: 25,
      totalConc: 0.05,
      volume: 1,
      startForm: 'tris-hydrochloride',
    });
    expect(component(r, 'titrant').id).toBe('NaOH');
    const back = recipe({
      system: 'hepes',
      pH: 6.8,
      temperatureC: 25,
      totalConc: 0.05,
      volume: 1,
      startForm: 'hepes-sodium',
    });
    expect(component(back, 'titrant').id).toBe('HCl');
  });

  it('refuses an explicit titrant that moves the pH the wrong way', () => {
    const r = makeRecipe({
      system: 'hepes',
      pH: 7.5,
      temperatureC: 25,
      totalConc: 0.05,
      volume: 1,
      startForm: 'hepes',
      titrant: 'HCl',
    });
    expect(r).toMatchObject({ ok: false, error: { code: 'impossible-recipe' } });
  });

  it('writes steps and cautions for the recipe sheet', () => {
    const r = recipe({ system: 'tris', pH: 8, temperatureC: 25, totalConc: 0.05, volume: 0.1 });
    expect(r.steps.join('\n')).toMatch(/Weigh .* Tris base/);
    expect(r.steps.join('\n')).toMatch(/Titrate with 1\.000 M HCl to pH 8\.00 at 25 °C/);
    expect(r.cautions.join('\n')).toMatch(/eye protection/);
    expect(r.cautions.join('\n')).toMatch(/assay temperature/); // |dpKa/dT| = 0.028 (SCIENCE.md §2.6)
  });

  it('the result is plain JSON', () => {
    const r = recipe({ system: 'mes', pH: 6, temperatureC: 25, totalConc: 0.02, volume: 0.05 });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
  });
});
