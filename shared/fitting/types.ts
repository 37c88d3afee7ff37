// Public result types of the fitting engine. Every value is plain JSON: numbers are finite or
// null (null = not determined, or an open end of an interval), no functions, no class instances.

import type { StopReason } from './lm';
import type { ModelId } from './models';
import type { RunsTest } from './stats/runs-test';

export type { ModelId } from './models';
export type { StopReason } from './lm';
export type { RunsTest } from './stats/runs-test';

/** An interval; a null end is open (the data do not bound it on that side). */
export type Interval = [number | null, number | null];

export interface Estimate {
  value: number | null;
  /** standard error: from cov = s²(JᵀWJ)⁻¹, or by the delta method for derived quantities */
  se: number | null;
  /** Wald interval value ± t(0.975, dof)·se */
  ci95: [number, number] | null;
}

export interface ParameterEstimate extends Estimate {
  /** 'not_determined': the data do not fix it (e.g. a pKa beyond the measured range); value null */
  status: 'fitted' | 'not_determined';
  /** profile-likelihood 95 % interval (when asked for) */
  profile95: Interval | null;
  /** bootstrap percentile 95 % interval (when asked for) */
  boot95: Interval | null;
}

export interface DerivedEstimate extends Estimate {
  profile95: Interval | null;
  boot95: Interval | null;
}

export type FlagCode = string;

export interface Flag {
  /** stable code, e.g. 'pKa2_not_determined', 'narrow_bell', 'residual_runs' */
  code: FlagCode;
  message: string;
}

export interface HalfActivityWindow {
  /** lowest pH with activity ≥ half the maximum; null when it stays above half beyond the data */
  lo: DerivedEstimate;
  hi: DerivedEstimate;
  width: DerivedEstimate;
}

export interface BootstrapSummary {
  resamples: number;
  seed: number;
  /** resamples whose refit left the optimum undetermined (a pKa ran out of the data) */
  undetermined: number;
}

export interface ProfileFit {
  engine: { name: 'bellwether'; version: string };
  model: ModelId;
  parameterNames: string[];
  /** points used (weight > 0) */
  n: number;
  /** lowest and highest pH measured (points with weight > 0) */
  pHRange: [number, number];
  /** parameters fitted */
  nFitted: number;
  dof: number;
  converged: boolean;
  stop: StopReason;
  iterations: number;
  starts: number;
  parameters: Record<string, ParameterEstimate>;
  ssr: number | null;
  /** s² = SSR/(n − p) */
  s2: number | null;
  aicc: number | null;
  /** pH of highest fitted activity; null for one limb or when a pKa is not determined */
  pHopt: DerivedEstimate;
  /** highest fitted activity (the value at pHopt) */
  peak: DerivedEstimate;
  /** Δ = pKa2 − pKa1 for the two-pKa models, else null */
  delta: DerivedEstimate | null;
  window: HalfActivityWindow;
  /** in parameterNames order; rows and columns of parameters not fitted are null */
  covariance: (number | null)[][];
  correlation: (number | null)[][];
  fitted: (number | null)[];
  residuals: (number | null)[];
  runs: RunsTest | null;
  flags: Flag[];
  /** the simpler model offered when a pKa is not determined (e.g. the one-limb fit) */
  alternative: ProfileFit | null;
  /** with model 'auto': how this model was chosen */
  selection: ModelSelection | null;
  bootstrap: BootstrapSummary | null;
}

export interface CandidateSummary {
  model: ModelId;
  nFitted: number;
  ssr: number | null;
  aicc: number | null;
  deltaAicc: number | null;
  /** Akaike weight exp(−ΔAICc/2) normalised over the usable candidates */
  weight: number | null;
  converged: boolean;
  /** false when a pKa ran out of the data (the fit is then a simpler model in disguise) */
  usable: boolean;
}

export interface NestedTest {
  simpler: ModelId;
  complex: ModelId;
  F: number | null;
  df1: number;
  df2: number;
  pValue: number | null;
}

export interface ModelSelection {
  proposed: ModelId;
  reason: string;
  candidates: CandidateSummary[];
  tests: NestedTest[];
}
