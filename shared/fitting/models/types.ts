// What every activity-against-pH model provides. Parameters are ordered: first the activity
// levels, which enter the model linearly (used for starting values), then the pKa values in
// increasing order (enforced when the unconstrained fit would cross them).

export type ModelId = 'acid' | 'base' | 'bell' | 'bell-plateau' | 'three';

export const MODEL_IDS: readonly ModelId[] = ['acid', 'base', 'bell', 'bell-plateau', 'three'];

export interface Runaway {
  side: -1 | 1;
  /** activity levels that vanish with the pKa */
  levels: readonly number[];
  /** other pKa values that must go with it to keep the order */
  pKas?: readonly number[];
}

export interface PhModel {
  readonly id: ModelId;
  /** all parameter names, activity levels first, then pKa values in increasing order */
  readonly names: readonly string[];
  /** how many leading parameters are activity levels (linear) */
  readonly nLinear: number;
  /**
   * For each pKa (by parameter index): the side to which it may run away harmlessly when the
   * data show no sign of it (-1: towards low pH, +1: towards high pH), and the activity levels
   * that lose all meaning with it (a plateau beyond a pKa that never shows).
   */
  readonly runaway: Readonly<Record<number, Runaway>>;
  /**
   * Powers of ten of the pKa values, computed once per parameter vector into k (length ≥ 4), so
   * that a point needs no power function: 10^(pKa − pH) = 10^pKa · h and 10^(pH − pKa) = 10^−pKa · g
   * with h = 10^(−pH) and g = 10^pH precomputed per point.
   */
  constants(theta: ArrayLike<number>, k: Float64Array): void;
  /** activity f and, when grad is given, ∂f/∂θ at one point */
  point(theta: ArrayLike<number>, k: Float64Array, h: number, g: number, grad: Float64Array | null): number;
  /** the basis functions φ_j of the linear levels: f = Σ θ_j φ_j */
  basis(k: Float64Array, h: number, g: number, out: Float64Array): void;
  /** pH of maximal activity, analytic where one exists; null when the model has none (one limb) */
  optimum(theta: ArrayLike<number>): number | null;
}

export const LN10 = Math.LN10;

/** 10^x as exp(x·ln10): about five times faster than Math.pow here, within 4e-15 relative. */
export function pow10(x: number): number {
  return Math.exp(x * LN10);
}

const scratch = new Float64Array(4);

/** Activity of a model at one pH (convenience; the fitting loop uses point() directly). */
export function valueAt(model: PhModel, theta: ArrayLike<number>, pH: number): number {
  model.constants(theta, scratch);
  return model.point(theta, scratch, Math.pow(10, -pH), Math.pow(10, pH), null);
}
