// Recipes for a buffer at a target pH, temperature, concentration and volume (SCIENCE.md §2.3):
//   (a) mix two forms (acid and base): the fraction x of the base form follows from the charge
//       balance, x = (S/C − q_acid)/(q_base − q_acid), S the strong charge the balance needs;
//   (b) titrate one form with strong acid or base: n(titrant)/V = (S − C·q_form)/q_titrant
//       (for HA + NaOH this is SCIENCE.md's n = C·α + [OH⁻] − [H⁺]).
// S = −(C·Σ α_j z_j + [H⁺] − [OH⁻]) depends on pK″ and so on I; I is iterated to self-consistency.
// A target ionic strength is met exactly with salt: at I = target, salt = target − I(buffer).
import { addIonicStrengthWarnings, capacityOfState, environment, stateAt, systemPKas } from './equilibrium';
import type { Prepared } from './equilibrium';
import type { Salt } from './library';
import { checkVolumes, saltComponent, withVolumes } from './recipe-components';
import { mixPlan, nearestStep, titrationPlan, type Plan } from './recipe-plans';
import { recipeCautions, recipeSteps } from './recipe-steps';
import type { Recipe, RecipeInput, RecipeMethod } from './recipe-types';
import { ChemFailure, guardInput, type ChemResult } from './result';
import { resolveSystem, type StrongIon } from './solution';
import { checkAmount, checkChoice, checkPH } from './validate';

export type { Recipe, RecipeComponent, RecipeInput, RecipeMethod } from './recipe-types';

const SALT_ION: Record<Salt, StrongIon> = { NaCl: 'Na', KCl: 'K' };

export function makeRecipe(input: RecipeInput): ChemResult<Recipe> {
  return guardInput(input, () => computeRecipe(input));
}

export function computeRecipe(input: RecipeInput): Recipe {
  const env = environment(input);
  const system = resolveSystem(input.system, env.library);
  const pH = checkPH(input.pH, 'Target pH');
  const C = checkAmount(input.totalConc, 'Buffer concentration', true);
  const V = checkAmount(input.volume, 'Volume', true);
  const saltConc = input.saltConc === undefined ? 0 : checkAmount(input.saltConc, 'Salt concentration');
  const targetI =
    input.targetIonicStrength === undefined
      ? undefined
      : checkAmount(input.targetIonicStrength, 'Target ionic strength');
  if (targetI !== undefined && input.saltConc !== undefined) {
    throw new ChemFailure(
      'invalid-input',
      'Give either a salt concentration or a target ionic strength, not both.',
    );
  }
  checkChoice(input.method, 'Method', ['mix', 'titrate']);
  checkChoice(input.titrant, 'Titrant', ['NaOH', 'KOH', 'HCl']);
  checkChoice(input.salt, 'Salt', ['NaCl', 'KCl']);
  if (input.forms !== undefined && (!Array.isArray(input.forms) || input.forms.length !== 2)) {
    throw new ChemFailure('invalid-input', 'Forms to mix are a pair: [acid form id, base form id].');
  }
  if (input.stockConcs !== undefined && (typeof input.stockConcs !== 'object' || input.stockConcs === null)) {
    throw new ChemFailure('invalid-input', 'Stock concentrations are given by form id, e.g. { "hepes": 1 }.');
  }
  const salt: Salt = input.salt ?? (system.forms.some((f) => f.counterIons.K > 0) ? 'KCl' : 'NaCl');
  const pKa = systemPKas(system, env);
  const prepared: Prepared = { buffers: [{ system, total: C, pKa }], ions: {}, env };
  const k = input.ionization ?? nearestStep(system, pKa, pH, env);
  if (!Number.isInteger(k) || k < 0 || k >= system.ionizations.length) {
    throw new ChemFailure('invalid-input', `${system.name} has no step number ${k + 1}.`);
  }
  // A first check with a rough I, so that a hopeless target fails before any recipe is tried.
  checkNearPKa(system.name, pH, stateAt(prepared, pH, targetI ?? C / 2 + saltConc).buffers[0].pKapp);
  const ionization = system.ionizations[k];
  const method: RecipeMethod =
    input.method ?? (ionization.titration ? 'titrate' : ionization.mixFormIds ? 'mix' : 'titrate');
  const planFor = method === 'mix' ? mixPlan : titrationPlan;

  // S(I): the strong charge the balance needs at the target pH (the buffer's own charge plus H⁺ − OH⁻).
  const requiredS = (I: number): number => -stateAt(prepared, pH, I).charge;
  let plan: Plan | undefined;
  let I = targetI ?? C / 2 + saltConc;
  let ions: Partial<Record<StrongIon, number>> = {};
  let added = 0;
  for (let round = 0; round < 100; round++) {
    plan = planFor(system, k, C, requiredS(I), input);
    ions = plan.ions();
    const withoutSalt = stateAt({ ...prepared, ions }, pH, I).ionicStrengthOut;
    if (targetI !== undefined) {
      added = targetI - withoutSalt;
      if (added < -1e-12) {
        throw new ChemFailure(
          'impossible-recipe',
          `The buffer alone has ionic strength ${withoutSalt.toFixed(4)} M, above the target ${targetI} M.`,
        );
      }
      added = Math.max(0, added);
      break;
    }
    added = saltConc;
    const next = withoutSalt + saltConc;
    const done = Math.abs(next - I) <= 1e-14 + 1e-12 * next;
    I = next;
    if (done) break;
  }
  if (!plan) throw new ChemFailure('internal-error', 'No recipe plan.');
  const finalIons = { ...ions };
  if (added > 0) {
    finalIons[SALT_ION[salt]] = (finalIons[SALT_ION[salt]] ?? 0) + added;
    finalIons.Cl = (finalIons.Cl ?? 0) + added;
  }
  const state = stateAt({ ...prepared, ions: finalIons }, pH, targetI ?? I);
  const pKapp = state.buffers[0].pKapp;
  checkNearPKa(system.name, pH, pKapp);
  addIonicStrengthWarnings(state.ionicStrength, env);
  const components = plan.describe().map((c) => withVolumes(c, V, input, system));
  if (added > 0) components.push(saltComponent(salt, added, V));
  checkVolumes(components, V);
  const capacity = capacityOfState(state);
  const fractions = state.buffers[0].fractions;
  const recipe: Recipe = {
    systemId: system.id,
    systemName: system.name,
    method,
    targetPH: pH,
    temperatureC: env.celsius,
    totalConc: C,
    volume: V,
    activityModel: env.model,
    ionization: { index: k, label: ionization.label, pKa25: ionization.pKa25, pKa: pKa[k], pKapp: pKapp[k] },
    pKa,
    pKapp,
    ionicStrength: state.ionicStrength,
    components,
    counterIons: finalIons,
    species: fractions.map((a, j) => ({ charge: state.buffers[0].charges[j], conc: a * C })),
    baseFraction: fractions.slice(k + 1).reduce((s, a) => s + a, 0),
    capacity: { total: capacity.total, water: capacity.water, buffer: capacity.buffers[0] },
    saltConc: added,
    composition: { buffers: [{ systemId: system.id, total: C }], ions: finalIons },
    steps: [],
    cautions: recipeCautions(system, k),
    warnings: [],
  };
  recipe.steps = recipeSteps(recipe);
  recipe.warnings = [...env.warnings];
  return recipe;
}

/** SCIENCE.md §2.3 / PRODUCT.md: a buffer holds pH poorly more than about one unit from its pKa. */
export const MAX_DISTANCE_FROM_PKA = 1.5;

function checkNearPKa(name: string, pH: number, pKapp: number[]): void {
  const nearest = Math.min(...pKapp.map((p) => Math.abs(p - pH)));
  if (nearest > MAX_DISTANCE_FROM_PKA) {
    const list = pKapp.map((p) => p.toFixed(2)).join(', ');
    throw new ChemFailure(
      'ph-far-from-pka',
      `pH ${pH} is ${nearest.toFixed(2)} units from the nearest pK″ of ${name} (${list}): it would not buffer there. Choose another system.`,
    );
  }
}
