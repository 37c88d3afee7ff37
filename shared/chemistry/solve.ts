// The pH of a solution given as totals (a composition), and its summary as plain data.
import {
  addIonicStrengthWarnings,
  capacityOfState,
  environment,
  prepare,
  solveState,
  type Conditions,
  type SolutionState,
} from './equilibrium';
import { guardInput, type ChemResult } from './result';
import type { Composition } from './solution';
import { checkAmount } from './validate';

export interface SolutionInput extends Conditions {
  composition: Composition;
  /** Hold I fixed at this value instead of solving it from the composition (mol/L). */
  ionicStrength?: number;
}

export interface BufferSpeciation {
  systemId: string;
  total: number;
  pKa: number[];
  pKapp: number[];
  species: { charge: number; fraction: number; conc: number }[];
  capacity: number;
}

export interface SolutionResult {
  pH: number;
  temperatureC: number;
  ionicStrength: number;
  hConc: number;
  ohConc: number;
  buffers: BufferSpeciation[];
  capacity: { total: number; water: number };
  warnings: string[];
}

export function summarise(state: SolutionState, celsius: number, warnings: Iterable<string>): SolutionResult {
  const cap = capacityOfState(state);
  return {
    pH: state.pH,
    temperatureC: celsius,
    ionicStrength: state.ionicStrength,
    hConc: state.hConc,
    ohConc: state.ohConc,
    buffers: state.buffers.map((b, i) => ({
      systemId: b.system.id,
      total: b.total,
      pKa: b.pKa,
      pKapp: b.pKapp,
      species: b.fractions.map((fraction, j) => ({
        charge: b.charges[j],
        fraction,
        conc: fraction * b.total,
      })),
      capacity: cap.buffers[i],
    })),
    capacity: { total: cap.total, water: cap.water },
    warnings: [...warnings],
  };
}

export function computeSolution(input: SolutionInput): SolutionResult {
  const env = environment(input);
  const fixed =
    input.ionicStrength === undefined ? undefined : checkAmount(input.ionicStrength, 'Ionic strength');
  const state = solveState(prepare(input.composition, env), fixed);
  addIonicStrengthWarnings(state.ionicStrength, env);
  return summarise(state, env.celsius, env.warnings);
}

/** pH, ionic strength, speciation and capacity of a solution from its totals (charge balance). */
export function solutionPH(input: SolutionInput): ChemResult<SolutionResult> {
  return guardInput(input, () => computeSolution(input));
}
