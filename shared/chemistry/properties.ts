// Per-system properties at given conditions: pKa at temperature, pK″ at ionic strength, and the
// speciation at a pH. Also the library listing and validation of lab-added systems.
import { environment, systemPKas, apparentPKas, type Conditions } from './equilibrium';
import { bufferLibrary, bufferSystemSchema, type BufferSystem } from './library';
import { ChemFailure, fail, guardInput, ok, type ChemResult } from './result';
import { resolveSystem } from './solution';
import { speciesFractions } from './speciation';
import { chosenTemperatureModel, type TemperatureModel } from './temperature';
import { checkAmount, checkPH } from './validate';

export interface SystemConditions extends Conditions {
  system: string | BufferSystem;
  /** mol/L; default 0 (thermodynamic pKa). */
  ionicStrength?: number;
}

export interface StepProperties {
  label: string;
  zAcid: number;
  pKa25: number;
  /** Thermodynamic pKa at the temperature. */
  pKa: number;
  /** Apparent pK″ at the ionic strength. */
  pKapp: number;
  temperatureModel: TemperatureModel;
  dpKadT: number | null;
  /** pK″ ± 1 (common practice). */
  usefulRange: [number, number];
}

export function bufferPKas(
  input: SystemConditions,
): ChemResult<{ systemId: string; systemName: string; steps: StepProperties[]; warnings: string[] }> {
  return guardInput(input, () => {
    const env = environment(input);
    const system = resolveSystem(input.system, env.library);
    const I = checkAmount(input.ionicStrength ?? 0, 'Ionic strength');
    const pKa = systemPKas(system, env);
    const pKapp = apparentPKas(system, pKa, I, env);
    const steps = system.ionizations.map((ion, i) => ({
      label: ion.label,
      zAcid: ion.zAcid,
      pKa25: ion.pKa25,
      pKa: pKa[i],
      pKapp: pKapp[i],
      temperatureModel: chosenTemperatureModel(ion, env.temperatureModel),
      dpKadT: ion.dpKadT,
      usefulRange: [pKapp[i] - 1, pKapp[i] + 1] as [number, number],
    }));
    return { systemId: system.id, systemName: system.name, steps, warnings: [...env.warnings] };
  });
}

/** Fractions of each protonation state (most protonated first) from pKa values at a pH. */
export function speciate(input: { pKas: number[]; pH: number }): ChemResult<number[]> {
  return guardInput(input, () => {
    const pH = checkPH(input.pH);
    if (!Array.isArray(input.pKas) || input.pKas.length === 0 || input.pKas.length > 6) {
      throw new ChemFailure('invalid-input', 'Give one to six pKa values.');
    }
    input.pKas.forEach((p) => checkPH(p, 'pKa'));
    return speciesFractions(input.pKas, pH);
  });
}

/** Speciation of a library system at a pH, temperature and ionic strength. */
export function speciateSystem(
  input: SystemConditions & { pH: number },
): ChemResult<{ pKapp: number[]; species: { charge: number; fraction: number }[] }> {
  return guardInput(input, () => {
    const env = environment(input);
    const system = resolveSystem(input.system, env.library);
    const pH = checkPH(input.pH);
    const I = checkAmount(input.ionicStrength ?? 0, 'Ionic strength');
    const pKapp = apparentPKas(system, systemPKas(system, env), I, env);
    const zTop = system.ionizations[0].zAcid;
    const species = speciesFractions(pKapp, pH).map((fraction, j) => ({ charge: zTop - j, fraction }));
    return { pKapp, species };
  });
}

export function listBufferSystems(extra: readonly BufferSystem[] = []): BufferSystem[] {
  return [...extra, ...bufferLibrary];
}

/** Validates a lab-added system (zod schema), returning it with defaults filled in. */
export function validateBufferSystem(candidate: unknown): ChemResult<BufferSystem> {
  const parsed = bufferSystemSchema.safeParse(candidate);
  if (parsed.success) return ok(parsed.data);
  const message = parsed.error.issues
    .slice(0, 5)
    .map((i) => `${i.path.join('.') || 'buffer'}: ${i.message}`)
    .join('; ');
  return fail('invalid-input', `The buffer system is not valid: ${message}.`);
}
