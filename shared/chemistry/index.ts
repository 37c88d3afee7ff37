/**
 * Bellwether's buffer chemistry: pure functions, no I/O. Every public function returns
 * `{ ok: true, value } | { ok: false, error: { code, message } }` and never throws out; values
 * are plain JSON data.
 *
 * Units everywhere: concentrations and ionic strength in mol/L, volumes in L, amounts in mol,
 * masses in g, temperatures in °C, ΔH in kJ/mol, ΔCp in J K⁻¹ mol⁻¹. pH is −log10 a(H⁺) (what a
 * glass electrode reads). pKa values in the library are thermodynamic (25 °C, I = 0); pK″ is the
 * apparent constant at an ionic strength (SCIENCE.md §2.2).
 *
 * Equations (SCIENCE.md §2): Goldberg eq. 4 (pKa with ΔH and ΔCp), Roy's A/T + B + C·lnT,
 * Davies and extended Debye–Hückel (Bates–Guggenheim) activity coefficients, pK″ = pK + (2z − 1)·A·f(I),
 * cumulative-constant speciation, the charge balance (solved by Brent's method) with I iterated to
 * self-consistency, and Van Slyke's buffer capacity with water's terms.
 *
 * Library
 *   bufferLibrary, findBufferSystem(nameOrId, extra?), listBufferSystems(extra?)
 *   bufferSystemSchema (zod), validateBufferSystem(unknown) → BufferSystem
 * Properties
 *   bufferPKas({ system, temperatureC, ionicStrength?, activityModel?, temperatureModel? })
 *   speciate({ pKas, pH }) → fractions; speciateSystem({ system, pH, temperatureC, ionicStrength? })
 * Recipes
 *   makeRecipe({ system, pH, temperatureC, totalConc, volume, method?: 'mix' | 'titrate', forms?,
 *                startForm?, titrant?, titrantConc?, stockConcs?, salt?, saltConc?, targetIonicStrength? })
 *   saltForIonicStrength({ composition, temperatureC, targetIonicStrength, salt? })
 * Solutions (a composition is { buffers: [{ systemId, total }], ions: { Na?, K?, Cl?, … } })
 *   solutionPH({ composition, temperatureC, ionicStrength? })
 *   solutionFromIngredients({ volume, ingredients })
 *   mixSolutions({ parts: [{ label, composition, volume }], temperatureC })
 *   temperatureShift({ composition, fromC, toC })
 *   addStrongAcidOrBase({ composition, volume, reagent, amount, reagentConc?, temperatureC })
 *   titrationCurve({ composition, volume, titrant, titrantConc?, maxAmount, steps?, temperatureC })
 * Capacity
 *   bufferCapacity({ system, pH, temperatureC, totalConc, ionicStrength? })
 *   capacityCurve({ system, pHFrom, pHTo, step?, temperatureC, totalConc, ionicStrength? })
 * Series designer
 *   designSeries({ pHPoints, assayTemperatureC, makeTemperatureC?, totalConc, volume, … })
 * Building blocks (plain numbers, no validation)
 *   goldbergPK, royPK, pKw, debyeHuckelA, activityBracket, log10Gamma, apparentPKa, ionicStrength,
 *   speciesFractions; molarMass(formula) (typed result)
 */
export type { ChemError, ChemErrorCode, ChemResult } from './result';

export {
  bufferLibrary,
  bufferSystemSchema,
  findBufferSystem,
  formSchema,
  ionizationSchema,
  saltSchema,
  SOURCE_KEYS,
  FORMULA_WEIGHT_SOURCE,
  titrantSchema,
} from './library';
export type { BufferForm, BufferSystem, BufferSystemInput, Ionization, Salt, Titrant } from './library';

export { bufferPKas, listBufferSystems, speciate, speciateSystem, validateBufferSystem } from './properties';
export type { StepProperties, SystemConditions } from './properties';

export { makeRecipe } from './recipe';
export type { Recipe, RecipeComponent, RecipeInput, RecipeMethod } from './recipe';
export { SAFETY_CAUTION } from './recipe-steps';

export { solutionPH } from './solve';
export type { SolutionInput, SolutionResult, BufferSpeciation } from './solve';
export type { Composition, StrongIon } from './solution';
export { STRONG_ION_CHARGE } from './solution';
export type { Conditions } from './equilibrium';

export { mixSolutions, saltForIonicStrength, solutionFromIngredients, temperatureShift } from './mixing';
export type {
  Ingredient,
  MixInput,
  MixPart,
  MixResult,
  SaltInput,
  SaltResult,
  ShiftInput,
  ShiftResult,
} from './mixing';

export { addStrongAcidOrBase, titrationCurve } from './titration';
export type { AdditionInput, AdditionResult, TitrationInput, TitrationPoint } from './titration';

export { bufferCapacity, capacityCurve } from './capacity';
export type { CapacityCurveInput, CapacityInput, CapacityPoint } from './capacity';

export { designSeries } from './series';
export type { Candidate, Series, SeriesInput, SeriesPoint } from './series';

export {
  goldbergPK,
  pKaAtTemperature,
  pKw,
  royPK,
  royThermodynamics,
  slopeFromEnthalpy,
  WATER,
} from './temperature';
export type { RoyEquation, TemperatureModel } from './temperature';
export {
  activityBracket,
  apparentPKa,
  BATES_GUGGENHEIM_BA,
  DEBYE_HUCKEL_A_TABLE,
  debyeHuckelA,
  ionicStrength,
  log10Gamma,
} from './activity';
export type { ActivityModel } from './activity';
export { meanProtonsLost, protonVariance, speciesFractions } from './speciation';
export { ATOMIC_WEIGHTS, molarMass } from './formula';
