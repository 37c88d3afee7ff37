/**
 * Output of analyseStudy, per variant: points, the data fitted, the model selection, the fit, the
 * curve with its band, relative activity.
 */
import type {
  BootstrapSummary,
  CandidateSummary,
  CurveBand,
  ModelId,
  NestedTest,
  ProfileFit,
} from '../fitting';
import type { ExcludedWell, WellRef } from './types-wells';

export interface ProfilePoint {
  pH: number;
  buffer: string | null;
  /** Non-excluded wells with an activity. */
  n: number;
  mean: number | null;
  sd: number | null;
  cvPercent: number | null;
  wells: WellRef[];
  excluded: ExcludedWell[];
  /** Wells of this point with no usable activity (no read, no rate, no blank…). */
  missing: WellRef[];
  flags: string[];
}

export interface ModelSelection {
  requested: ModelId | 'auto';
  model: ModelId;
  reason: string;
  /** AICc table of every candidate (empty when the comparison could not be made). */
  candidates: CandidateSummary[];
  /** Nested F-tests climbed from the simplest model. */
  tests: NestedTest[];
}

export interface RelativeActivity {
  /** The fitted maximum the profile is divided by: the peak, or V for one limb, in units.activity. */
  maximum: number;
  points: { pH: number; buffer: string | null; mean: number | null; sd: number | null }[];
  /** The curve and band divided by the maximum (the maximum's own error is not propagated). */
  curve: CurveBand;
}

export interface ProfileError {
  code: string;
  message: string;
}

export interface VariantProfile {
  variantId: string;
  name: string;
  isParent: boolean;
  isReference: boolean;
  points: ProfilePoint[];
  /** Exactly what was fitted, in order (fit.residuals and fit.fitted follow it). */
  fitData: { wells: WellRef[]; pH: number[]; v: number[] };
  selection: ModelSelection | null;
  fit: ProfileFit | null;
  curve: CurveBand | null;
  relative: RelativeActivity | null;
  error: ProfileError | null;
  bootstrap: BootstrapSummary | null;
}
