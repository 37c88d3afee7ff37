// Words the analysis screens use for codes in the result.
import type { WindowSource } from '@shared/analysis';
import type { ZPrimeBand } from '@shared/plate';

export const windowSourceWords: Record<WindowSource, string> = {
  well: 'set for this well',
  variant: 'set for this variant',
  plate: 'set for this plate',
  automatic: 'automatic',
  'all-reads': 'all reads (blanks)',
};

/** Z′ bands (Zhang, Chung & Oldenburg 1999; IUPAC Gold Book: 1 > Z′ ≥ 0.5 excellent, Z′ ≤ 0 unusable). */
export const zPrimeBandWords: Record<ZPrimeBand, string> = {
  ideal: 'ideal (Z′ = 1)',
  excellent: 'excellent (1 > Z′ ≥ 0.5)',
  marginal: 'marginal (0.5 > Z′ > 0)',
  unusable: 'unusable (Z′ ≤ 0)',
};

export const blankMatchWords = {
  'same-buffer': 'same plate, pH and buffer',
  'same-pH': 'same plate and pH, other buffer',
  'other-plate': 'another plate, same pH',
} as const;

export const roleWords: Record<string, string> = {
  sample: 'sample',
  blank: 'blank',
  buffer: 'buffer only',
  standard: 'standard',
  unused: 'unused',
};

/** The words of a flag code: the result's own sentence, else the code. */
export const flagSentence = (flagText: Record<string, string>, code: string) =>
  flagText[code] ?? code.replace(/_/g, ' ');

/** Short labels for the wells table (the full sentence is in the cell's title and the well's detail). */
const flagShort: Record<string, string> = {
  single_blank: 'one blank',
  non_monotonic: 'up and down',
  slope_not_significant: 'rate ≈ 0',
  curvature: 'curved',
  accelerating: 'speeds up',
  above_linear_range: 'above range',
  missing_values: 'missing reads',
  too_few_points: 'too few reads',
  constant_signal: 'constant',
  no_blank: 'no blank',
  blank_other_buffer: 'other-buffer blank',
  blank_other_plate: 'other-plate blank',
  reader_flag: 'reader flag',
  extrapolated: 'extrapolated',
  low_absorbing_fraction: 'low absorbing',
  no_value: 'no value',
  no_read: 'no read',
  no_conversion: 'not converted',
};
export const flagLabel = (code: string) => flagShort[code] ?? code.replace(/_/g, ' ');
