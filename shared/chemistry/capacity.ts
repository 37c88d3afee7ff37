// Buffer capacity β = dC_base/dpH (Van Slyke 1922; SCIENCE.md §2.3), with water's own terms:
//   β = ln10·([H⁺] + [OH⁻] + Σ_buffers C·Var(protons lost))
// Var = Σ j²α_j − (Σ jα_j)² is exact for any number of steps; for one step it is α(1 − α) =
// Ka·h/(Ka + h)², which peaks at pH = pK″ with β_buffer = ln10·C/4. β is taken at fixed I.
import { capacityOfState, environment, prepare, stateAt, type Conditions } from './equilibrium';
import type { BufferSystem } from './library';
import { computeRecipe, type RecipeMethod } from './recipe';
import { ChemFailure, guardInput, type ChemResult } from './result';
import { resolveSystem } from './solution';
import { checkAmount, checkPH, checkRange } from './validate';

export interface CapacityInput extends Conditions {
  system: string | BufferSystem;
  pH: number;
  totalConc: number;
  /** Ionic strength to reach with salt (as in a recipe); default: the buffer's own. */
  ionicStrength?: number;
  method?: RecipeMethod;
}

export interface CapacityPoint {
  pH: number;
  capacity: number;
  bufferCapacity: number;
  waterCapacity: number;
  /** The buffer term over its maximum ln10·C/4 (1 at pH = pK″). */
  relative: number;
  ionicStrength: number;
  pKapp: number[];
  /** True when the point is beyond the recipe range (≥ 1.5 units from every pK″): β from speciation alone. */
  outsideRange: boolean;
}

export function capacityAt(input: CapacityInput): CapacityPoint {
  const C = checkAmount(input.totalConc, 'Buffer concentration', true);
  const pH = checkPH(input.pH);
  try {
    const r = computeRecipe({ ...input, pH, volume: 1, targetIonicStrength: input.ionicStrength });
    return point(
      pH,
      C,
      r.capacity.total,
      r.capacity.water,
      r.capacity.buffer,
      r.ionicStrength,
      r.pKapp,
      false,
    );
  } catch (error) {
    if (!(error instanceof ChemFailure) || !['ph-far-from-pka', 'impossible-recipe'].includes(error.code))
      throw error;
  }
  // Far from every pKa: β of the buffer with monovalent counter-ions that balance it.
  const env = environment(input);
  const system = resolveSystem(input.system, env.library);
  const p = prepare(
    { buffers: [{ systemId: system.id, total: C }], ions: {} },
    { ...env, library: [system, ...env.library] },
  );
  let I = input.ionicStrength ?? C / 2;
  let state = stateAt(p, pH, I);
  for (let round = 0; round < 100 && input.ionicStrength === undefined; round++) {
    const S = -state.charge;
    const ions = S >= 0 ? { Na: S } : { Cl: -S };
    state = stateAt({ ...p, ions }, pH, I);
    if (Math.abs(state.ionicStrengthOut - I) < 1e-14 + 1e-12 * I) break;
    I = state.ionicStrengthOut;
    state = stateAt(p, pH, I);
  }
  const cap = capacityOfState(state);
  return point(pH, C, cap.total, cap.water, cap.buffers[0], I, state.buffers[0].pKapp, true);
}

function point(
  pH: number,
  C: number,
  total: number,
  water: number,
  buffer: number,
  I: number,
  pKapp: number[],
  outsideRange: boolean,
): CapacityPoint {
  return {
    pH,
    capacity: total,
    bufferCapacity: buffer,
    waterCapacity: water,
    relative: buffer / ((Math.LN10 * C) / 4),
    ionicStrength: I,
    pKapp,
    outsideRange,
  };
}

/** β of a buffer made up at `pH` (the recipe's counter-ions and ionic strength). */
export function bufferCapacity(input: CapacityInput): ChemResult<CapacityPoint> {
  return guardInput(input, () => capacityAt(input));
}

export interface CapacityCurveInput extends Omit<CapacityInput, 'pH'> {
  pHFrom: number;
  pHTo: number;
  step?: number;
}

/** β against pH, each point a buffer made up at that pH. */
export function capacityCurve(input: CapacityCurveInput): ChemResult<CapacityPoint[]> {
  return guardInput(input, () => {
    const from = checkPH(input.pHFrom, 'Start pH');
    const to = checkPH(input.pHTo, 'End pH');
    const step = checkRange(input.step ?? 0.1, 'pH step', 0.001, 14);
    if (to < from) throw new ChemFailure('invalid-input', 'The end pH must not be below the start pH.');
    const n = Math.floor((to - from) / step + 1e-9);
    if (n > 5000) throw new ChemFailure('invalid-input', 'Too many points: use a larger pH step.');
    return Array.from({ length: n + 1 }, (_, i) =>
      capacityAt({ ...input, pH: Math.round((from + i * step) * 1e9) / 1e9 }),
    );
  });
}
