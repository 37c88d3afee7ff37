// Solutions combined: the pH of a well after mixing volumes of several solutions (buffer, enzyme
// stock in its own buffer, substrate solution), a solution made from weighed ingredients, the
// reading of a solution at another temperature, and salt to reach a target ionic strength.
import { environment, prepare, solveState, type Conditions } from './equilibrium';
import { findForm } from './forms';
import { formulaWeight } from './formula';
import type { BufferSystem, Salt } from './library';
import { brent } from './roots';
import { ChemFailure, guardInput, type ChemResult } from './result';
import {
  combine,
  resolveComposition,
  resolveLibrary,
  resolveSystem,
  type Composition,
  type StrongIon,
} from './solution';
import { summarise, type SolutionResult } from './solve';
import { checkAmount, checkChoice, checkTemperature, shown } from './validate';

export interface MixPart {
  label: string;
  composition: Composition;
  /** L */
  volume: number;
}

export interface MixInput extends Conditions {
  parts: MixPart[];
}

export interface MixResult extends SolutionResult {
  totalVolume: number;
  composition: Composition;
}

export function mixComposition(parts: MixPart[]): { composition: Composition; totalVolume: number } {
  if (!Array.isArray(parts) || parts.length === 0)
    throw new ChemFailure('invalid-input', 'Give at least one solution to mix.');
  for (const p of parts) {
    if (typeof p !== 'object' || p === null)
      throw new ChemFailure('invalid-input', 'Each part needs a composition and a volume.');
  }
  const volumes = parts.map((p) =>
    checkAmount(p.volume, `Volume of ${typeof p.label === 'string' ? p.label : 'a part'}`),
  );
  const total = volumes.reduce((a, b) => a + b, 0);
  if (total <= 0) throw new ChemFailure('invalid-input', 'The total volume must be greater than zero.');
  const composition = combine(
    parts.map((p, i) => ({ composition: p.composition, factor: volumes[i] / total })),
  );
  return { composition, totalVolume: total };
}

/** pH of a mixture by its charge balance (volumes assumed additive). */
export function mixSolutions(input: MixInput): ChemResult<MixResult> {
  return guardInput(input, () => {
    const env = environment(input);
    const { composition, totalVolume } = mixComposition(input.parts);
    for (const p of input.parts) resolveComposition(p.composition, env.library);
    const state = solveState(prepare(composition, env));
    return { ...summarise(state, env.celsius, env.warnings), totalVolume, composition };
  });
}

export interface ShiftInput extends Omit<Conditions, 'temperatureC'> {
  composition: Composition;
  fromC: number;
  toC: number;
}

export interface ShiftResult {
  pHFrom: number;
  pHTo: number;
  shift: number;
  warnings: string[];
}

/** The pH a solution reads at `toC` when it reads `pHFrom` at `fromC` (same totals). */
export function temperatureShift(input: ShiftInput): ChemResult<ShiftResult> {
  return guardInput(input, () => {
    const from = environment({
      ...input,
      temperatureC: checkTemperature(input.fromC, 'Make-up temperature'),
    });
    const to = environment({ ...input, temperatureC: checkTemperature(input.toC, 'Reading temperature') });
    const a = solveState(prepare(input.composition, from));
    const b = solveState(prepare(input.composition, to));
    return { pHFrom: a.pH, pHTo: b.pH, shift: b.pH - a.pH, warnings: [...from.warnings, ...to.warnings] };
  });
}

export type Ingredient =
  | { system: string | BufferSystem; formId: string; grams?: number; moles?: number }
  | { reagent: 'NaOH' | 'KOH' | 'HCl' | 'NaCl' | 'KCl'; moles: number };

const REAGENT_IONS: Record<'NaOH' | 'KOH' | 'HCl' | 'NaCl' | 'KCl', Partial<Record<StrongIon, number>>> = {
  NaOH: { Na: 1 },
  KOH: { K: 1 },
  HCl: { Cl: 1 },
  NaCl: { Na: 1, Cl: 1 },
  KCl: { K: 1, Cl: 1 },
};

/** The composition of `volume` L made from weighed forms and strong reagents. */
export function solutionFromIngredients(input: {
  volume: number;
  ingredients: Ingredient[];
  library?: readonly BufferSystem[];
}): ChemResult<Composition> {
  return guardInput(input, () => {
    const V = checkAmount(input.volume, 'Volume', true);
    const library = resolveLibrary(input.library);
    if (!Array.isArray(input.ingredients))
      throw new ChemFailure('invalid-input', 'Give a list of ingredients.');
    const parts = input.ingredients.map((ing): Composition => {
      if (typeof ing !== 'object' || ing === null) {
        throw new ChemFailure(
          'invalid-input',
          'Each ingredient is a form with grams or moles, or a reagent with moles.',
        );
      }
      if ('reagent' in ing) {
        if (!Object.hasOwn(REAGENT_IONS, ing.reagent)) {
          throw new ChemFailure(
            'invalid-input',
            `Unknown reagent ${shown(ing.reagent)}; use NaOH, KOH, HCl, NaCl or KCl.`,
          );
        }
        const ions = REAGENT_IONS[ing.reagent];
        const n = checkAmount(ing.moles, `Amount of ${ing.reagent}`);
        return {
          buffers: [],
          ions: Object.fromEntries(Object.entries(ions).map(([k, v]) => [k, (v * n) / V])),
        };
      }
      const system = resolveSystem(ing.system, library);
      const form = findForm(system, ing.formId);
      const moles =
        ing.moles !== undefined
          ? checkAmount(ing.moles, `Amount of ${form.name}`)
          : checkAmount(ing.grams, `Mass of ${form.name}`) / form.formulaWeight;
      const units = (moles * form.unitsPerFormula) / V;
      const c = form.counterIons;
      const perUnit = (n: number) => (n * moles) / V;
      return {
        buffers: [{ systemId: system.id, total: units }],
        ions: { Na: perUnit(c.Na), K: perUnit(c.K), Cl: perUnit(c.Cl) },
      };
    });
    const combined = combine(parts.map((composition) => ({ composition, factor: 1 })));
    for (const key of Object.keys(combined.ions) as StrongIon[])
      if (!combined.ions[key]) delete combined.ions[key];
    return combined;
  });
}

export interface SaltInput extends Conditions {
  composition: Composition;
  targetIonicStrength: number;
  salt?: Salt;
}

export interface SaltResult {
  saltConc: number;
  gramsPerLitre: number;
  pHBefore: number;
  pHAfter: number;
  composition: Composition;
}

/** Salt to add to an existing solution so that its self-consistent I reaches the target. */
export function saltForIonicStrength(input: SaltInput): ChemResult<SaltResult> {
  return guardInput(input, () => {
    const env = environment(input);
    const target = checkAmount(input.targetIonicStrength, 'Target ionic strength', true);
    const salt: Salt = checkChoice(input.salt, 'Salt', ['NaCl', 'KCl']) ?? 'NaCl';
    const cation: StrongIon = salt === 'NaCl' ? 'Na' : 'K';
    const withSalt = (c: number): Composition =>
      combine([
        { composition: input.composition, factor: 1 },
        { composition: { buffers: [], ions: { [cation]: c, Cl: c } }, factor: 1 },
      ]);
    const before = solveState(prepare(input.composition, env));
    if (before.ionicStrength > target) {
      throw new ChemFailure(
        'impossible-recipe',
        `The solution already has ionic strength ${before.ionicStrength.toFixed(4)} M, above the target ${target} M.`,
      );
    }
    const gap = (c: number) => solveState(prepare(withSalt(c), env)).ionicStrength - target;
    const c = gap(0) === 0 ? 0 : brent(gap, 0, 2 * target + 1e-9, 1e-14);
    const after = solveState(prepare(withSalt(c), env));
    return {
      saltConc: c,
      gramsPerLitre: c * formulaWeight(salt),
      pHBefore: before.pH,
      pHAfter: after.pH,
      composition: withSalt(c),
    };
  });
}
