// Types of the recipe calculation (inputs and results are plain JSON data).
import type { ActivityModel } from './activity';
import type { Conditions } from './equilibrium';
import type { BufferSystem, Salt, Titrant } from './library';
import type { Composition, StrongIon } from './solution';

export type RecipeMethod = 'mix' | 'titrate';

export interface RecipeInput extends Omit<Conditions, 'temperatureC'> {
  system: string | BufferSystem;
  pH: number;
  temperatureC: number;
  /** Total buffer concentration, mol/L. */
  totalConc: number;
  /** Final volume, L. */
  volume: number;
  /** Default: 'titrate' where the library gives a titration for the step, else 'mix'. */
  method?: RecipeMethod;
  /** Index (0-based) of the step to work on; default the one whose pK″ is nearest the target. */
  ionization?: number;
  /** For 'mix': [acid form id, base form id]. */
  forms?: [string, string];
  /** For 'titrate': the form weighed out, and the titrant. */
  startForm?: string;
  titrant?: Titrant;
  /** Titrant stock, mol/L (default 1). */
  titrantConc?: number;
  /** Stock concentrations (mol/L) of forms, by form id, when they are added as solutions. */
  stockConcs?: Record<string, number>;
  salt?: Salt;
  /** Added salt, mol/L in the final solution. */
  saltConc?: number;
  /** Total ionic strength to reach by adding salt, mol/L. */
  targetIonicStrength?: number;
}

export interface RecipeComponent {
  role: 'acid-form' | 'base-form' | 'start-form' | 'titrant' | 'salt';
  id: string;
  name: string;
  formula: string | null;
  formulaWeight: number | null;
  moles: number;
  grams: number | null;
  /** Volume to measure (L): stock solution, titrant, or a pure liquid from its density. */
  volume: number | null;
  stockConc: number | null;
}

export interface Recipe {
  systemId: string;
  systemName: string;
  method: RecipeMethod;
  targetPH: number;
  temperatureC: number;
  totalConc: number;
  volume: number;
  activityModel: ActivityModel;
  /** The step worked on: pKa at 25 °C, thermodynamic pKa at the temperature, pK″ at the final I. */
  ionization: { index: number; label: string; pKa25: number; pKa: number; pKapp: number };
  /** Every step: thermodynamic pKa at the temperature, and pK″ at the final I. */
  pKa: number[];
  pKapp: number[];
  /** Self-consistent ionic strength of the final solution, mol/L. */
  ionicStrength: number;
  components: RecipeComponent[];
  /** Final strong-ion concentrations (counter-ions, titrant ions, salt), mol/L. */
  counterIons: Partial<Record<StrongIon, number>>;
  /** Buffer species, most protonated first, mol/L. */
  species: { charge: number; conc: number }[];
  /** Fraction of the buffer beyond the worked step's acid form (α of Henderson–Hasselbalch). */
  baseFraction: number;
  /** β in mol/L per pH unit, at the final I. */
  capacity: { total: number; water: number; buffer: number };
  /** Salt added (NaCl or KCl), mol/L. */
  saltConc: number;
  /** Totals of the final solution, for mixing, titration and temperature-shift calculations. */
  composition: Composition;
  /** The written procedure of the recipe sheet. */
  steps: string[];
  /** Chemical-safety and buffer-specific cautions for the sheet. */
  cautions: string[];
  /** Where the calculation went beyond its data (extrapolation, high ionic strength). */
  warnings: string[];
}
