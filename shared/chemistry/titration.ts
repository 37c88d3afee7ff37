// Adding strong acid or base to a solution: the titration curve of a recipe, and the pH after one
// addition (to a buffer or to unbuffered water). Each point solves the charge balance afresh;
// with a titrant concentration the added volume dilutes everything (V → V + v).
import { environment, prepare, solveState, type Conditions } from './equilibrium';
import { TITRANT_ION } from './forms';
import type { Titrant } from './library';
import { ChemFailure, guardInput, type ChemResult } from './result';
import { combine, resolveComposition, type Composition } from './solution';
import { checkAmount, shown } from './validate';

export interface AdditionInput extends Conditions {
  composition: Composition;
  /** Volume of the solution before the addition, L. */
  volume: number;
  reagent: Titrant;
  /** Amount added, mol. */
  amount: number;
  /** Concentration of the added reagent, mol/L; omit to neglect its volume. */
  reagentConc?: number;
}

export interface AdditionResult {
  pHBefore: number;
  pHAfter: number;
  shift: number;
  ionicStrengthAfter: number;
  addedVolume: number;
  composition: Composition;
  warnings: string[];
}

/** The composition after adding `amount` mol of a strong acid/base to `volume` L. */
export function afterAddition(
  composition: Composition,
  volume: number,
  reagent: Titrant,
  amount: number,
  reagentConc?: number,
): { composition: Composition; addedVolume: number } {
  const added = reagentConc === undefined ? 0 : amount / reagentConc;
  const total = volume + added;
  const t = TITRANT_ION[reagent];
  const reagentPart: Composition = { buffers: [], ions: { [t.ion]: amount / total } };
  return {
    composition: combine([
      { composition, factor: volume / total },
      { composition: reagentPart, factor: 1 },
    ]),
    addedVolume: added,
  };
}

function checkReagent(reagent: unknown): Titrant {
  if (reagent !== 'NaOH' && reagent !== 'KOH' && reagent !== 'HCl') {
    throw new ChemFailure('invalid-input', `Reagent must be NaOH, KOH or HCl (got ${shown(reagent)}).`);
  }
  return reagent;
}

export function addStrongAcidOrBase(input: AdditionInput): ChemResult<AdditionResult> {
  return guardInput(input, () => {
    const env = environment(input);
    const reagent = checkReagent(input.reagent);
    const V = checkAmount(input.volume, 'Volume', true);
    const n = checkAmount(input.amount, 'Amount added');
    const conc =
      input.reagentConc === undefined
        ? undefined
        : checkAmount(input.reagentConc, 'Reagent concentration', true);
    resolveComposition(input.composition, env.library);
    const before = solveState(prepare(input.composition, env));
    const next = afterAddition(input.composition, V, reagent, n, conc);
    const after = solveState(prepare(next.composition, env));
    return {
      pHBefore: before.pH,
      pHAfter: after.pH,
      shift: after.pH - before.pH,
      ionicStrengthAfter: after.ionicStrength,
      addedVolume: next.addedVolume,
      composition: next.composition,
      warnings: [...env.warnings],
    };
  });
}

export interface TitrationInput extends Conditions {
  composition: Composition;
  volume: number;
  titrant: Titrant;
  titrantConc?: number;
  /** Largest amount added, mol. */
  maxAmount: number;
  /** Number of intervals (points = steps + 1); default 50. */
  steps?: number;
}

export interface TitrationPoint {
  amount: number;
  addedVolume: number;
  pH: number;
  ionicStrength: number;
}

/** pH against added strong acid or base. */
export function titrationCurve(input: TitrationInput): ChemResult<TitrationPoint[]> {
  return guardInput(input, () => {
    const env = environment(input);
    const titrant = checkReagent(input.titrant);
    const V = checkAmount(input.volume, 'Volume', true);
    const max = checkAmount(input.maxAmount, 'Largest amount added', true);
    const conc =
      input.titrantConc === undefined
        ? undefined
        : checkAmount(input.titrantConc, 'Titrant concentration', true);
    const steps = input.steps ?? 50;
    if (!Number.isInteger(steps) || steps < 1 || steps > 10000) {
      throw new ChemFailure('invalid-input', 'The number of steps must be a whole number from 1 to 10000.');
    }
    resolveComposition(input.composition, env.library);
    return Array.from({ length: steps + 1 }, (_, i) => {
      const amount = (max * i) / steps;
      const next = afterAddition(input.composition, V, titrant, amount, conc);
      const state = solveState(prepare(next.composition, env));
      return { amount, addedVolume: next.addedVolume, pH: state.pH, ionicStrength: state.ionicStrength };
    });
  });
}
