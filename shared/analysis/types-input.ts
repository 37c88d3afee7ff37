/**
 * Input of analyseStudy: the study as the server holds it (assay, variants, plates with maps and
 * reads, settings, exclusions). Times are seconds.
 */
import type { ModelId } from '../fitting';
import type { PlateMap } from '../plate-map';

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
