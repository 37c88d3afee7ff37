// The charge balance of a solution and its solution for pH, with the ionic strength solved
// self-consistently (pK″ depends on I, and I on the speciation).
//   Σ strong ions c·z + Σ_buffers C Σ_j α_j (z_top − j) + [H⁺] − [OH⁻] = 0
// pH is −log10 a(H⁺) (what a glass electrode reads); [H⁺] = a(H⁺)/γ₁, [OH⁻] = Kw/(a(H⁺)·γ₁).
// The balance falls monotonically with pH, so Brent's method on a wide bracket always converges.
import { A_TABLE_MAX_C, activityBracket, apparentPKa, debyeHuckelA, type ActivityModel } from './activity';
import type { BufferSystem } from './library';
import { ChemFailure } from './result';
import { brent } from './roots';
import {
  resolveComposition,
  resolveLibrary,
  strongIonSums,
  type Composition,
  type ResolvedBuffer,
} from './solution';
import { protonVariance, speciesFractions } from './speciation';
import { chosenTemperatureModel, pKaAtTemperature, pKw, type TemperatureModel } from './temperature';
import { checkChoice, checkTemperature } from './validate';

export interface Conditions {
  temperatureC: number;
  /** Default 'davies' (SCIENCE.md §2.2). */
  activityModel?: ActivityModel;
  /** Force one temperature model; by default each ionization uses the library's choice. */
  temperatureModel?: TemperatureModel;
  /** Lab-added systems, searched before the shipped library. */
  library?: readonly BufferSystem[];
}

/** Everything that depends only on temperature and model, computed once per calculation. */
export interface Environment {
  celsius: number;
  model: ActivityModel;
  A: number;
  pKw: number;
  temperatureModel?: TemperatureModel;
  library: readonly BufferSystem[];
  warnings: Set<string>;
}

export function environment(c: Conditions): Environment {
  const celsius = checkTemperature(c.temperatureC);
  const library = resolveLibrary(c.library);
  const model = c.activityModel ?? 'davies';
  checkChoice(model, 'Activity model', ['davies', 'extended-debye-huckel', 'ideal']);
  checkChoice(c.temperatureModel, 'Temperature model', ['goldberg', 'roy', 'slope']);
  const warnings = new Set<string>();
  if (celsius > A_TABLE_MAX_C && model !== 'ideal') {
    warnings.add(`The Debye–Hückel A table ends at ${A_TABLE_MAX_C} °C; A was extrapolated.`);
  }
  return {
    celsius,
    model,
    A: debyeHuckelA(celsius),
    pKw: pKw(celsius),
    temperatureModel: c.temperatureModel,
    library,
    warnings,
  };
}

/** Thermodynamic pKa values (I = 0) of a system at the environment's temperature. */
export function systemPKas(system: BufferSystem, env: Environment): number[] {
  return system.ionizations.map((ionization) => {
    const model = chosenTemperatureModel(ionization, env.temperatureModel);
    if (model === 'roy' && ionization.roy) {
      const { validFromC, validToC } = ionization.roy;
      if (env.celsius < validFromC || env.celsius > validToC) {
        env.warnings.add(
          `${system.name}: the pK(T) equation was measured ${validFromC}–${validToC} °C; extrapolated to ${env.celsius} °C.`,
        );
      }
    } else if (model === 'goldberg' && (env.celsius < 1 || env.celsius > 77)) {
      env.warnings.add(`${system.name}: ΔH/ΔCp extrapolation is meant for about 1–77 °C (274–350 K).`);
    }
    return pKaAtTemperature(ionization, env.celsius, env.temperatureModel);
  });
}

/** Apparent pK″ of each step at ionic strength I. */
export function apparentPKas(
  system: BufferSystem,
  pKas: readonly number[],
  I: number,
  env: Environment,
): number[] {
  return pKas.map((pK, i) => apparentPKa(pK, system.ionizations[i].zAcid, I, env.celsius, env.model));
}

export interface BufferState {
  system: BufferSystem;
  total: number;
  pKa: number[];
  pKapp: number[];
  fractions: number[];
  /** Charge of each species, most protonated first. */
  charges: number[];
}

export interface SolutionState {
  pH: number;
  ionicStrength: number;
  hConc: number;
  ohConc: number;
  buffers: BufferState[];
  /** Net charge (mol/L); zero at equilibrium. */
  charge: number;
  /** Ionic strength recomputed from this state (equals `ionicStrength` once self-consistent). */
  ionicStrengthOut: number;
}

export interface Prepared {
  buffers: { system: BufferSystem; total: number; pKa: number[] }[];
  ions: Composition['ions'];
  env: Environment;
}

export function prepare(composition: Composition, env: Environment): Prepared {
  const resolved: ResolvedBuffer[] = resolveComposition(composition, env.library);
  return {
    buffers: resolved.map((b) => ({ ...b, pKa: systemPKas(b.system, env) })),
    ions: composition.ions,
    env,
  };
}

export function stateAt(p: Prepared, pH: number, I: number): SolutionState {
  const { env } = p;
  const log10Gamma1 = -env.A * activityBracket(I, env.model);
  const hConc = 10 ** (-pH - log10Gamma1);
  const ohConc = 10 ** (pH - env.pKw - log10Gamma1);
  const sums = strongIonSums(p.ions);
  let charge = sums.charge + hConc - ohConc;
  let halfSquares = sums.halfSquares + (hConc + ohConc) / 2;
  const buffers = p.buffers.map((b) => {
    const pKapp = apparentPKas(b.system, b.pKa, I, env);
    const fractions = speciesFractions(pKapp, pH);
    const zTop = b.system.ionizations[0].zAcid;
    const charges = fractions.map((_, j) => zTop - j);
    fractions.forEach((a, j) => {
      charge += b.total * a * charges[j];
      halfSquares += (b.total * a * charges[j] * charges[j]) / 2;
    });
    return { system: b.system, total: b.total, pKa: b.pKa, pKapp, fractions, charges };
  });
  return { pH, ionicStrength: I, hConc, ohConc, buffers, charge, ionicStrengthOut: halfSquares };
}

const PH_LOW = -3;
const PH_HIGH = 17;

function pHAtFixedI(p: Prepared, I: number): number {
  const f = (pH: number) => stateAt(p, pH, I).charge;
  if (f(PH_LOW) < 0 || f(PH_HIGH) > 0) {
    throw new ChemFailure(
      'impossible-recipe',
      'This solution is too acidic or too basic to have a pH between −3 and 17.',
    );
  }
  return brent(f, PH_LOW, PH_HIGH, 1e-12);
}

/**
 * Fixed-point iteration I → pH(I) → I(pH). It contracts strongly (pK″ moves slowly with I), so a
 * few rounds suffice; damping is switched on only if it has not settled after 30 rounds.
 */
export function solveState(p: Prepared, fixedI?: number): SolutionState {
  if (fixedI !== undefined) return stateAt(p, pHAtFixedI(p, fixedI), fixedI);
  let I = strongIonSums(p.ions).halfSquares;
  for (let round = 0; round < 200; round++) {
    const state = stateAt(p, pHAtFixedI(p, I), I);
    const next = state.ionicStrengthOut;
    if (Math.abs(next - I) <= 1e-14 + 1e-12 * next) return stateAt(p, state.pH, next);
    I = round < 30 ? next : 0.5 * (I + next);
  }
  throw new ChemFailure('no-convergence', 'The ionic strength did not settle; check the concentrations.');
}

export function addIonicStrengthWarnings(I: number, env: Environment): void {
  if (env.model === 'davies' && I > 0.5) {
    env.warnings.add(
      `Ionic strength ${I.toFixed(3)} M is beyond the Davies equation's range (≈ 0.1–0.2 M, up to 0.5): treat activities as rough.`,
    );
  } else if (env.model === 'extended-debye-huckel' && I > 0.1) {
    env.warnings.add(`Ionic strength ${I.toFixed(3)} M is beyond the extended Debye–Hückel range (≈ 0.1 M).`);
  }
}

/** dC_base/dpH at fixed I: ln10·([H⁺] + [OH⁻] + Σ C·Var(protons lost)) (Van Slyke 1922, generalised). */
export function capacityOfState(s: SolutionState): { total: number; water: number; buffers: number[] } {
  const water = Math.LN10 * (s.hConc + s.ohConc);
  const buffers = s.buffers.map((b) => Math.LN10 * b.total * protonVariance(b.fractions));
  return { total: water + buffers.reduce((a, x) => a + x, 0), water, buffers };
}
