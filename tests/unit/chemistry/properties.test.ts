// Property tests (fast-check) of the buffer chemistry: recipes reproduce their target, titration
// curves are monotonic, capacity is positive, and no input makes a public function throw.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as chem from '@shared/chemistry';

const systems = chem.bufferLibrary;
const systemArb = fc.constantFrom(...systems);
const temperature = fc.double({ min: 5, max: 55, noNaN: true });
const conc = fc.double({ min: 0.001, max: 0.2, noNaN: true });

/** A system, one of its steps, and a target pH within one unit of that step's pKa at 25 °C. */
const target = systemArb.chain((system) =>
  fc
    .tuple(fc.nat({ max: system.ionizations.length - 1 }), fc.double({ min: -0.9, max: 0.9, noNaN: true }))
    .map(([step, offset]) => ({
      system,
      step,
      pH: Math.min(13.9, Math.max(0.1, system.ionizations[step].pKa25 + offset)),
    })),
);

describe('recipes reproduce their target pH through the charge balance', () => {
  it('for any library system, step, temperature, concentration, method and salt', () => {
    let made = 0;
    fc.assert(
      fc.property(
        target,
        temperature,
        conc,
        fc.constantFrom<'mix' | 'titrate'>('mix', 'titrate'),
        fc.option(fc.double({ min: 0, max: 0.3, noNaN: true }), { nil: undefined }),
        ({ system, step, pH }, temperatureC, totalConc, method, saltConc) => {
          const r = chem.makeRecipe({
            system: system.id,
            pH,
            temperatureC,
            totalConc,
            volume: 0.1,
            method,
            ionization: step,
            saltConc,
          });
          if (!r.ok) {
            // a refusal must be one of the typed reasons, never a crash
            expect(['impossible-recipe', 'ph-far-from-pka']).toContain(r.error.code);
            return;
          }
          made++;
          const back = chem.solutionPH({ composition: r.value.composition, temperatureC });
          expect(back.ok).toBe(true);
          if (!back.ok) return;
          expect(Math.abs(back.value.pH - pH)).toBeLessThan(1e-6);
          expect(Math.abs(back.value.ionicStrength - r.value.ionicStrength)).toBeLessThan(1e-8);
          expect(r.value.components.every((c) => c.moles >= 0)).toBe(true);
        },
      ),
      { numRuns: 150 },
    );
    expect(made).toBeGreaterThan(100);
  });

  it('a target ionic strength is met exactly whenever the buffer alone is below it', () => {
    fc.assert(
      fc.property(
        target,
        conc,
        fc.double({ min: 0.05, max: 0.5, noNaN: true }),
        ({ system, step, pH }, totalConc, I) => {
          const r = chem.makeRecipe({
            system: system.id,
            pH,
            temperatureC: 25,
            totalConc,
            volume: 1,
            ionization: step,
            targetIonicStrength: I,
          });
          if (!r.ok) return;
          const back = chem.solutionPH({ composition: r.value.composition, temperatureC: 25 });
          expect(back.ok && Math.abs(back.value.ionicStrength - I)).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('titration curves are monotonic', () => {
  it('pH rises with added NaOH and falls with added HCl', () => {
    fc.assert(
      fc.property(
        target,
        conc,
        fc.constantFrom<'NaOH' | 'HCl'>('NaOH', 'HCl'),
        ({ system, step, pH }, totalConc, titrant) => {
          const r = chem.makeRecipe({
            system: system.id,
            pH,
            temperatureC: 25,
            totalConc,
            volume: 0.05,
            ionization: step,
          });
          if (!r.ok) return;
          const curve = chem.titrationCurve({
            composition: r.value.composition,
            volume: 0.05,
            titrant,
            titrantConc: 0.5,
            maxAmount: totalConc * 0.05 * 2,
            steps: 20,
            temperatureC: 25,
          });
          expect(curve.ok).toBe(true);
          if (!curve.ok) return;
          for (let i = 1; i < curve.value.length; i++) {
            const d = curve.value[i].pH - curve.value[i - 1].pH;
            if (titrant === 'NaOH') expect(d).toBeGreaterThan(0);
            else expect(d).toBeLessThan(0);
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('buffer capacity is positive', () => {
  it('at any pH 0–14, temperature and concentration', () => {
    fc.assert(
      fc.property(
        systemArb,
        fc.double({ min: 0, max: 14, noNaN: true }),
        temperature,
        conc,
        (system, pH, temperatureC, totalConc) => {
          const r = chem.bufferCapacity({ system: system.id, pH, temperatureC, totalConc });
          expect(r.ok).toBe(true);
          if (r.ok) {
            expect(r.value.capacity).toBeGreaterThan(0);
            expect(r.value.bufferCapacity).toBeGreaterThanOrEqual(0);
            expect(r.value.waterCapacity).toBeGreaterThan(0);
          }
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('no input crashes', () => {
  const hepes = chem.makeRecipe({ system: 'hepes', pH: 7.5, temperatureC: 25, totalConc: 0.05, volume: 0.1 });
  if (!hepes.ok) throw new Error('setup');
  const composition = hepes.value.composition;
  // Each entry point with a valid input; the property corrupts one or two of its fields at random.
  const valid: [string, (x: never) => unknown, Record<string, unknown>][] = [
    [
      'makeRecipe',
      chem.makeRecipe,
      {
        system: 'hepes',
        pH: 7.5,
        temperatureC: 25,
        totalConc: 0.05,
        volume: 0.1,
        method: 'mix',
        titrant: 'NaOH',
        startForm: 'hepes',
        forms: ['hepes', 'hepes-sodium'],
        stockConcs: { hepes: 1 },
        salt: 'NaCl',
        targetIonicStrength: 0.1,
        titrantConc: 1,
        ionization: 0,
        activityModel: 'davies',
        temperatureModel: 'goldberg',
        library: [],
      },
    ],
    [
      'bufferCapacity',
      chem.bufferCapacity,
      { system: 'tris', pH: 8, temperatureC: 25, totalConc: 0.05, ionicStrength: 0.1, method: 'titrate' },
    ],
    [
      'capacityCurve',
      chem.capacityCurve,
      { system: 'tris', pHFrom: 7, pHTo: 9, step: 0.5, temperatureC: 25, totalConc: 0.05 },
    ],
    ['solutionPH', chem.solutionPH, { composition, temperatureC: 25, ionicStrength: 0.1 }],
    [
      'mixSolutions',
      chem.mixSolutions,
      {
        temperatureC: 25,
        parts: [
          { label: 'a', composition, volume: 1e-4 },
          { label: 'b', composition, volume: 1e-4 },
        ],
      },
    ],
    ['temperatureShift', chem.temperatureShift, { composition, fromC: 25, toC: 37 }],
    [
      'addStrongAcidOrBase',
      chem.addStrongAcidOrBase,
      { composition, volume: 0.1, reagent: 'HCl', amount: 1e-4, reagentConc: 0.1, temperatureC: 25 },
    ],
    [
      'titrationCurve',
      chem.titrationCurve,
      {
        composition,
        volume: 0.1,
        titrant: 'NaOH',
        maxAmount: 1e-3,
        steps: 5,
        titrantConc: 1,
        temperatureC: 25,
      },
    ],
    [
      'saltForIonicStrength',
      chem.saltForIonicStrength,
      { composition, targetIonicStrength: 0.2, temperatureC: 25, salt: 'KCl' },
    ],
    [
      'solutionFromIngredients',
      chem.solutionFromIngredients,
      {
        volume: 1,
        ingredients: [
          { system: 'tris', formId: 'tris', grams: 1 },
          { reagent: 'HCl', moles: 0.001 },
        ],
      },
    ],
    ['bufferPKas', chem.bufferPKas, { system: 'tris', temperatureC: 37, ionicStrength: 0.1 }],
    ['speciate', chem.speciate, { pKas: [3, 5], pH: 4 }],
    [
      'speciateSystem',
      chem.speciateSystem,
      { system: 'citrate', pH: 4, temperatureC: 25, ionicStrength: 0.1 },
    ],
    [
      'designSeries',
      chem.designSeries,
      {
        pHPoints: [6, 7],
        assayTemperatureC: 37,
        totalConc: 0.05,
        volume: 0.1,
        systems: ['mes', 'hepes'],
        well: { bufferVolume: 1e-4, additions: [{ label: 'e', composition, volume: 1e-5 }] },
      },
    ],
  ];
  for (const [name, fn, input] of valid) {
    it(`${name}: a valid input succeeds, and corrupted inputs give typed errors (never a throw or an internal error)`, () => {
      expect((fn(input as never) as { ok: boolean }).ok).toBe(true);
      const keys = Object.keys(input);
      const corrupted = fc
        .tuple(
          fc.constantFrom(...keys),
          fc.anything(),
          fc.option(fc.tuple(fc.constantFrom(...keys), fc.anything())),
        )
        .map(([k, v, second]) => ({ ...input, [k]: v, ...(second ? { [second[0]]: second[1] } : {}) }));
      fc.assert(
        fc.property(fc.oneof(corrupted, fc.anything()), (bad) => {
          const r = fn(bad as never) as { ok: boolean; error?: { code: string; message: string } };
          expect(typeof r.ok).toBe('boolean');
          if (!r.ok) {
            expect(r.error?.code).not.toBe('internal-error');
            expect(r.error?.message.length).toBeGreaterThan(0);
          }
        }),
        { numRuns: 120 },
      );
    });
  }

  it('validateBufferSystem and molarMass take anything', () => {
    fc.assert(
      fc.property(fc.anything(), (x) => {
        expect(chem.validateBufferSystem(x).ok).toBe(false);
        // a random string can be a valid formula ("C"); anything else must be refused
        if (typeof x !== 'string') expect(chem.molarMass(x as never).ok).toBe(false);
        else expect(typeof chem.molarMass(x).ok).toBe('boolean');
      }),
    );
  });
});
