/**
 * Specific activity in µmol/min per mg of protein (U/mg), from a rate in the well (M/s):
 *   amount rate [µmol/min] = rate [mol/L/s] · 60 s/min · V_well [µL] · 1e-6 L/µL · 1e6 µmol/mol
 *                          = rate · 60 · V_well[µL]
 *   protein in the well [mg] = c_protein [mg/mL] / dilution · V_enzyme [µL] · 1e-3 mL/µL
 *   specific activity = amount rate / protein
 * The preparation's concentration is divided by the dilution factor of the enzyme stock added (1 = undiluted).
 */
import { isFiniteNumber } from './input';
import { fail, ok, type PlateResult } from './result';

export interface SpecificActivityInput {
  /** Rate of product formation in the well, M/s. */
  rateMolarPerSecond: number;
  rateSe?: number | null;
  wellVolumeUl: number;
  enzymeVolumeUl: number;
  proteinMgPerMl: number;
  dilutionFactor?: number;
}

export interface SpecificActivity {
  /** µmol/min per mg protein. */
  unitsPerMg: number;
  se: number | null;
  micromolesPerMinute: number;
  proteinMg: number;
}

export function specificActivity(input: SpecificActivityInput): PlateResult<SpecificActivity> {
  const { rateMolarPerSecond, rateSe, wellVolumeUl, enzymeVolumeUl, proteinMgPerMl } = input ?? {};
  const dilution = input?.dilutionFactor ?? 1;
  if (!isFiniteNumber(rateMolarPerSecond)) return fail('invalid_input', 'The rate must be a number (M/s).');
  for (const [name, v] of [
    ['well volume (µL)', wellVolumeUl],
    ['enzyme volume (µL)', enzymeVolumeUl],
    ['protein concentration (mg/mL)', proteinMgPerMl],
    ['dilution factor', dilution],
  ] as const) {
    if (!isFiniteNumber(v) || !(v > 0))
      return fail('invalid_option', `The ${name} must be a positive number (got ${String(v)}).`);
  }
  if (enzymeVolumeUl > wellVolumeUl)
    return fail('invalid_option', 'The enzyme volume cannot exceed the well volume.');
  const micromolesPerMinute = rateMolarPerSecond * 60 * wellVolumeUl;
  const proteinMg = (proteinMgPerMl / dilution) * enzymeVolumeUl * 1e-3;
  const unitsPerMg = micromolesPerMinute / proteinMg;
  const se = isFiniteNumber(rateSe) ? (Math.abs(rateSe) * 60 * wellVolumeUl) / proteinMg : null;
  if (![unitsPerMg, micromolesPerMinute, proteinMg].every(Number.isFinite) || proteinMg === 0)
    return fail('degenerate', 'The specific activity cannot be computed from these numbers.');
  return ok({
    unitsPerMg,
    se: se !== null && Number.isFinite(se) ? se : null,
    micromolesPerMinute,
    proteinMg,
  });
}
