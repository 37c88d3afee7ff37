// pKa against temperature.
// - Goldberg, Kishore & Lennen 2002 (J Phys Chem Ref Data 31:231), eq. 4 form, constant ΔCp:
//     pK(T) = pK(θ) − ΔH/(R ln10)·(1/θ − 1/T) − ΔCp/(R ln10)·(ln(T/θ) + θ/T − 1)      (SCIENCE.md §2.1)
//   With ΔCp = 0 this is the van 't Hoff equation.
// - Roy and co-workers: pK(T) = A/T + B + C·lnT (T in K); the same form integrated, so
//   ΔH = R ln10·(A − C·T) and ΔCp = −R ln10·C.
// - Linear: pK(T) = pK(25 °C) + dpK/dT·(T − 25 °C), when only the slope is known.
import { kelvin, LN10, R, THETA } from './constants';

export interface RoyEquation {
  A: number;
  B: number;
  C: number;
}

export type TemperatureModel = 'goldberg' | 'roy' | 'slope';

/** What an ionization must carry to be moved in temperature (a subset of the library record). */
export interface TemperatureData {
  pKa25: number;
  /** kJ/mol */
  dH: number | null;
  /** J K⁻¹ mol⁻¹ */
  dCp: number | null;
  /** K⁻¹ */
  dpKadT: number | null;
  roy?: RoyEquation | null;
  temperatureModel?: TemperatureModel;
}

/** Goldberg eq. 4 form (SCIENCE.md §2.1). dH in kJ/mol, dCp in J/(K·mol). */
export function goldbergPK(pK25: number, dHkJ: number, dCp: number, celsius: number): number {
  const T = kelvin(celsius);
  const k = R * LN10;
  return pK25 - ((dHkJ * 1000) / k) * (1 / THETA - 1 / T) - (dCp / k) * (Math.log(T / THETA) + THETA / T - 1);
}

/** Roy's pK(T) = A/T + B + C·lnT. */
export function royPK(eq: RoyEquation, celsius: number): number {
  const T = kelvin(celsius);
  return eq.A / T + eq.B + eq.C * Math.log(T);
}

/** ΔH (kJ/mol) and ΔCp (J/K/mol) at temperature T implied by a Roy equation (van 't Hoff). */
export function royThermodynamics(eq: RoyEquation, celsius = 25): { dH: number; dCp: number } {
  const T = kelvin(celsius);
  return { dH: (R * LN10 * (eq.A - eq.C * T)) / 1000, dCp: -R * LN10 * eq.C };
}

/** dpK/dT at 25 °C from ΔH: −ΔH/(R ln10 θ²) = −ΔH[J/mol]/1.7018e6 (SCIENCE.md §2.1). */
export function slopeFromEnthalpy(dHkJ: number): number {
  return -(dHkJ * 1000) / (R * LN10 * THETA * THETA);
}

/** Which model `pKaAtTemperature` will use for this ionization. */
export function chosenTemperatureModel(
  data: TemperatureData,
  requested?: TemperatureModel,
): TemperatureModel {
  const wanted = requested ?? data.temperatureModel ?? 'goldberg';
  if (wanted === 'roy' && data.roy) return 'roy';
  if (wanted !== 'slope' && data.dH !== null) return 'goldberg';
  if (data.dpKadT !== null) return 'slope';
  return data.dH !== null ? 'goldberg' : 'slope';
}

/** Thermodynamic pKa (I = 0) at `celsius`. With no temperature data at all, pKa25 is returned. */
export function pKaAtTemperature(
  data: TemperatureData,
  celsius: number,
  requested?: TemperatureModel,
): number {
  const model = chosenTemperatureModel(data, requested);
  if (model === 'roy' && data.roy) return royPK(data.roy, celsius);
  if (model === 'goldberg' && data.dH !== null)
    return goldbergPK(data.pKa25, data.dH, data.dCp ?? 0, celsius);
  return data.pKa25 + (data.dpKadT ?? 0) * (celsius - 25);
}

// Water: pKw = 13.995 at 25 °C [pub, SCIENCE.md §2.3]; ΔH = 55.8 kJ/mol [memory, SCIENCE.md §2.3];
// ΔCp = −224 J/K/mol [memory] added here so that 0 °C and 100 °C stay within ~0.05 of tabulated
// pKw; at 37 °C it gives 13.626 (SCIENCE.md: ≈ 13.63 [derived]).
export const WATER = { pKw25: 13.995, dH: 55.8, dCp: -224 } as const;

export function pKw(celsius: number): number {
  return goldbergPK(WATER.pKw25, WATER.dH, WATER.dCp, celsius);
}
