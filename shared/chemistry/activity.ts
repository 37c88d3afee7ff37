// Ionic strength and activity coefficients (SCIENCE.md §2.2).
//   I = ½ Σ c_i z_i²
//   Davies:                  log10 γ = −A z² (√I/(1 + √I) − 0.3 I)
//   Extended Debye–Hückel:   log10 γ = −A z² √I/(1 + B·a √I), Bates–Guggenheim B·a = 1.5
//   Apparent constant of HA (charge z) ⇌ H⁺ + A (charge z − 1), pH read as −log a(H⁺):
//     pK″ = pK + (2z − 1)·A·f(I)      [derived: log γ_A − log γ_HA = A f (z² − (z−1)²)]

export type ActivityModel = 'davies' | 'extended-debye-huckel' | 'ideal';

/** Debye–Hückel A (molal, log10) against °C [pub, SCIENCE.md §2.2 table]. */
export const DEBYE_HUCKEL_A_TABLE: ReadonlyArray<readonly [number, number]> = [
  [0, 0.4883],
  [5, 0.4921],
  [10, 0.496],
  [15, 0.5],
  [20, 0.5042],
  [25, 0.5085],
  [30, 0.513],
  [35, 0.5175],
  [40, 0.5221],
  [50, 0.5319],
  [60, 0.5425],
];

/** A(T) by linear interpolation in the table; beyond 60 °C the last segment is extended. */
export function debyeHuckelA(celsius: number): number {
  const table = DEBYE_HUCKEL_A_TABLE;
  let i = 0;
  while (i < table.length - 2 && celsius > table[i + 1][0]) i++;
  const [t0, a0] = table[i];
  const [t1, a1] = table[i + 1];
  return a0 + ((a1 - a0) * (celsius - t0)) / (t1 - t0);
}

export const A_TABLE_MAX_C = 60;
/** Bates–Guggenheim convention (IUPAC Gold Book). */
export const BATES_GUGGENHEIM_BA = 1.5;

/** The ionic-strength bracket f(I) of each model; log10 γ = −A z² f(I). */
export function activityBracket(I: number, model: ActivityModel): number {
  if (model === 'ideal' || I <= 0) return 0;
  const s = Math.sqrt(I);
  if (model === 'davies') return s / (1 + s) - 0.3 * I;
  return s / (1 + BATES_GUGGENHEIM_BA * s);
}

export function log10Gamma(z: number, I: number, celsius: number, model: ActivityModel): number {
  return -debyeHuckelA(celsius) * z * z * activityBracket(I, model);
}

/** pK″ = pK + (2z − 1)·A·f(I) for an acid whose protonated form has charge z. */
export function apparentPKa(
  pK: number,
  zAcid: number,
  I: number,
  celsius: number,
  model: ActivityModel,
): number {
  return pK + (2 * zAcid - 1) * debyeHuckelA(celsius) * activityBracket(I, model);
}

/** I = ½ Σ c z² over the listed ions (mol/L). */
export function ionicStrength(ions: ReadonlyArray<{ conc: number; charge: number }>): number {
  return 0.5 * ions.reduce((sum, ion) => sum + ion.conc * ion.charge * ion.charge, 0);
}
