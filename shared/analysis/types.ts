/**
 * Input and output of analyseStudy. Everything is plain JSON: numbers are finite or null, no class
 * instances, no functions. Times are seconds; rates are shown per minute; concentrations in µM.
 */
import type {
  BootstrapSummary,
  CandidateSummary,
  CurveBand,
  ModelId,
  NestedTest,
  ProfileFit,
} from '../fitting';
import type { BlankDrift, PlateTrends, ZPrimeBand } from '../plate';
import type { MapCheck, PlateMap, WellRole } from '../plate-map';

// ─── input ──────────────────────────────────────────────────────────────────────────────────────

export interface AssayInput {
  readMode: 'endpoint' | 'kinetic';
  detection: 'absorbance' | 'fluorescence';
  quantitation: 'extinction' | 'standard-curve';
  extinctionCoefficient: number | null;
  extinctionUnit: 'M-1cm-1' | 'mM-1cm-1';
  pathLengthCm: number | null;
  wellVolumeUl: number;
  /** pKa of a product chromophore whose absorbance depends on pH (in the well, at the assay temperature). */
  chromophorePka: number | null;
  /** Non-empty when the reaction is stopped (with strong base) before an end-point read. */
  stopSolution: string;
  temperatureC: number;
  /** Optional: shown in the signal unit (e.g. 'A405/min'). */
  wavelengthNm?: number | null;
}

export interface VariantInput {
  id: string;
  name: string;
  isParent: boolean;
  proteinMgPerMl: number | null;
}

export interface WellReadInput {
  value: number | null;
  values: (number | null)[] | null;
  flag: string | null;
}

export interface ReadInput {
  id: string;
  kind: 'endpoint' | 'kinetic';
  timesS: number[] | null;
  wells: Record<string, WellReadInput>;
}

export interface PlateInput {
  id: string;
  name: string;
  format: 96 | 384;
  map: PlateMap;
  read: ReadInput | null;
}

export interface RateWindow {
  startS: number;
  endS: number;
}

export interface AnalysisSettings {
  /** The most specific window wins: well, then variant, then plate; none = automatic window. */
  rateWindows?: {
    plate?: Record<string, RateWindow>;
    variant?: Record<string, RateWindow>;
    /** keyed `${plateId}:${well}` */
    well?: Record<string, RateWindow>;
  };
  /** Reads earlier than the first read + lagS are skipped (mixing, temperature). Default 0. */
  lagS?: number;
  enzymeVolumeUl?: number | null;
  /** End-point reads: product ÷ reaction time gives a rate. */
  reactionTimeMin?: number | null;
  /** Per variant: a model, or 'auto' (default) for the simplest adequate one. */
  models?: Record<string, ModelId | 'auto'>;
  /** Overrides the plate maps' required replicates in the map checks. */
  replicatesRequired?: number;
  /** Profile-likelihood intervals in the fits (default true; slower). */
  profileIntervals?: boolean;
}

export interface ExclusionInput {
  id: string;
  plateId: string;
  well: string;
  reason: string;
}

export interface AnalysisInput {
  assay: AssayInput;
  variants: VariantInput[];
  referenceVariantId: string;
  plates: PlateInput[];
  settings: AnalysisSettings;
  exclusions: ExclusionInput[];
}

// ─── output ─────────────────────────────────────────────────────────────────────────────────────

/** What the activity column holds: see units.ts for the rule. */
export type ActivityKind = 'specific' | 'volumetric' | 'product' | 'signal';

export interface Units {
  /** The per-well measurement: 'A/min' (kinetic) or 'A' (end point); 'RFU…' for fluorescence. */
  signal: string;
  /** After conversion to product: 'µM/min', or 'µM' for end points without a reaction time. */
  rate: string;
  activity: string;
  activityKind: ActivityKind;
  activityLabel: string;
  /** One sentence saying which activity is given, and why not a better one. */
  note: string;
}

/** 'all-reads': blanks and buffer-only wells without a set window use every read (signals.ts says why). */
export type WindowSource = 'well' | 'variant' | 'plate' | 'automatic' | 'all-reads';

export interface WindowUsed {
  /** First and last read fitted (null when no rate could be computed). */
  startS: number | null;
  endS: number | null;
  automatic: boolean;
  source: WindowSource;
}

export interface WellRef {
  plateId: string;
  well: string;
}

export interface ExcludedWell extends WellRef {
  exclusionId: string;
  reason: string;
}

export interface BlankUsed {
  /** Key of the blank group in result.blanks. */
  key: string;
  mean: number;
  se: number | null;
  n: number;
  /** 'same-buffer': blanks of the same plate, pH and buffer; 'same-pH': same plate and pH, any buffer;
   *  'other-plate': same pH (and buffer when possible) on another plate of the study. */
  match: 'same-buffer' | 'same-pH' | 'other-plate';
}

export interface WellRow extends WellRef {
  role: WellRole;
  variantId: string | null;
  pH: number | null;
  buffer: string | null;
  replicate: number | null;
  concentrationUm: number | null;
  /** Rate of signal change (kinetic, per minute) or end-point value, in units.signal. */
  signal: number | null;
  signalSe: number | null;
  /** Kinetic reads: the window fitted and where it came from. */
  window: WindowUsed | null;
  r2: number | null;
  /** Reads in the rate fit. */
  n: number | null;
  /** Standards: the mean read (signal without time), the x of the standard curve's y. */
  standardSignal: number | null;
  blank: BlankUsed | null;
  /** signal − blank mean, in units.signal; SE √(SE_signal² + SE_blank²) for rates, null for end points. */
  corrected: number | null;
  correctedSe: number | null;
  /** Product formed per minute (or product formed), in units.rate. */
  rate: number | null;
  rateSe: number | null;
  /** In units.activity; what the profiles are made of. */
  activity: number | null;
  activitySe: number | null;
  /** The reader file's own flag for this well (e.g. 'saturated'), as imported. */
  readerFlag: string | null;
  flags: string[];
  excluded: boolean;
  exclusion: { id: string; reason: string } | null;
  /** Robust outlier rule of shared/plate (modified z-score > 3.5) within the well's replicate group; a flag only. */
  outlier: boolean;
  outlierScore: number | null;
}

export interface BlankGroup {
  /** `${plate}|${pH}|${buffer}`; '*' stands for any plate or any buffer (pooled blanks). */
  key: string;
  plateIds: string[];
  pH: number;
  /** null: blanks of every buffer at this pH. */
  buffer: string | null;
  n: number;
  mean: number;
  sd: number | null;
  se: number | null;
  wells: WellRef[];
  flags: string[];
}

export interface StandardCurveRecord {
  plateId: string;
  /** null: every standard of the plate together (or of the study, when `scope` says so). */
  pH: number | null;
  scope: 'pH' | 'plate' | 'study';
  n: number;
  /** signal = intercept + slope·c, c in µM. */
  slope: number;
  slopeSe: number;
  intercept: number;
  interceptSe: number;
  residualSd: number;
  r2: number | null;
  concentrationRangeUm: [number, number];
  signalRange: [number, number];
  wells: string[];
  flags: string[];
}

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

export interface ZPrimeQc {
  zPrime: number | null;
  band: ZPrimeBand | null;
  robustZPrime: number | null;
  robustBand: ZPrimeBand | null;
  positive: {
    variantId: string;
    pH: number;
    buffer: string | null;
    wells: string[];
    mean: number | null;
    sd: number | null;
  } | null;
  negative: {
    pH: number;
    buffer: string | null;
    wells: string[];
    mean: number | null;
    sd: number | null;
  } | null;
  /** The control rule, in words. */
  rule: string;
  flags: string[];
}

export interface ReplicateCv {
  variantId: string;
  pH: number;
  buffer: string | null;
  n: number;
  mean: number | null;
  sd: number | null;
  cvPercent: number | null;
  overLimit: boolean;
}

export interface OverlapTest {
  variantId: string;
  pH: number;
  buffers: [string, string];
  means: [number, number];
  sds: [number | null, number | null];
  ns: [number, number];
  difference: number;
  t: number | null;
  dof: number | null;
  p: number | null;
  /** p < α: the two buffers disagree beyond their errors (a buffer-specific effect). */
  flagged: boolean;
  /** Both buffers on one plate (else plate-to-plate differences are mixed in). */
  samePlate: boolean;
  plateIds: string[];
}

export interface PlateQc {
  plateId: string;
  name: string;
  format: 96 | 384;
  hasRead: boolean;
  zPrime: ZPrimeQc;
  replicateCvs: ReplicateCv[];
  outliers: (WellRef & { score: number | null })[];
  blankDrift: BlankDrift | null;
  trends: PlateTrends | null;
  overlaps: OverlapTest[];
  mapChecks: MapCheck[];
  flags: string[];
}

export interface StudyQc {
  /** Replicate CV limit, % (common practice, no source). */
  cvLimitPercent: number;
  /** Level of the overlap-point tests. */
  overlapAlpha: number;
  plates: PlateQc[];
  overlaps: OverlapTest[];
}

export interface AnalysisNote {
  level: 'warning' | 'info';
  code: string;
  message: string;
}

export interface AnalysisResult {
  engineVersion: string;
  analysisVersion: string;
  units: Units;
  wells: WellRow[];
  blanks: BlankGroup[];
  standardCurves: StandardCurveRecord[];
  profiles: VariantProfile[];
  qc: StudyQc;
  notes: AnalysisNote[];
  /** The sentence for every flag code that appears in this result. */
  flagText: Record<string, string>;
}

export interface BootstrapOptions {
  /** Default 1000. */
  resamples?: number;
  /** Default 1; profile i uses seed + i. */
  seed?: number;
  /** Called with resamples done and in all (after each profile). */
  onProgress?: (done: number, total: number) => void;
}
