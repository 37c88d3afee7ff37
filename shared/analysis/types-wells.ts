/**
 * Output of analyseStudy, per well: rows, blank groups, standard curves, units.
 * Numbers are finite or null; rates are per minute; concentrations in µM.
 */
import type { WellRole } from '../plate-map';

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
  /** Product formed per minute (or product formed), in units.rate (the corrected signal when there is no conversion). */
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
