/**
 * Output of analyseStudy: plate QC.
 */
import type { BlankDrift, PlateTrends, ZPrimeBand } from '../plate';
import type { MapCheck } from '../plate-map';
import type { WellRef } from './types-wells';

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
