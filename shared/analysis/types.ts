/**
 * Input and output of analyseStudy. Everything is plain JSON: numbers are finite or null, no class
 * instances, no functions. Times are seconds; rates are shown per minute; concentrations in µM.
 *   types-input.ts     AnalysisInput and its parts
 *   types-wells.ts     WellRow, BlankGroup, StandardCurveRecord, Units
 *   types-profiles.ts  VariantProfile and its parts
 *   types-qc.ts        PlateQc, StudyQc and their parts
 */
import type { StudyQc } from './types-qc';
import type { VariantProfile } from './types-profiles';
import type { BlankGroup, StandardCurveRecord, Units, WellRow } from './types-wells';

export type * from './types-input';
export type * from './types-profiles';
export type * from './types-qc';
export type * from './types-wells';

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
