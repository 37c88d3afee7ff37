/**
 * Flags the analysis adds to shared/plate's, each with the sentence the interface shows.
 * Flags inform; none of them removes data (excluding a well is a person's decision, with a reason).
 */
import { PLATE_FLAG_TEXT } from '../plate';

export const ANALYSIS_FLAG_TEXT = {
  no_read: 'The plate has no read yet.',
  no_value: 'The read has no value for this well.',
  reader_flag: 'The reader file flagged this well (see the read); its value, if any, was used.',
  invalid_trace: "The time course does not fit the read's time axis (different lengths or bad times).",
  not_a_well: 'The well name is not a well of this plate format.',
  no_blank: 'No blank (no-enzyme well) at this pH point: no blank-corrected value.',
  blank_other_buffer:
    'No blank in this buffer at this pH: the blank of another buffer at the same pH was used.',
  blank_other_plate: 'No blank at this pH on this plate: the blank from another plate was used.',
  no_conversion: "The value could not be converted to product (see the study's unit note).",
  standard_curve_other_plates:
    'This plate has no usable standard curve: the standards of all plates were used.',
  standard_not_at_ph:
    "The product's absorbance depends on pH, but no standards were read at this pH: the conversion assumes the standards' pH.",
  low_absorbing_fraction:
    'Less than 10 % of the product absorbs at this pH (chromophore pKa): the rate is scaled up, and its error with it.',
  outlier: 'Outlier within its replicates by the robust rule (modified z-score above 3.5); flagged only.',
  cv_over_limit: 'Replicate CV above the limit.',
  buffer_effect:
    'Two buffers at the same pH disagree beyond their errors (p < 0.05): a buffer-specific effect?',
  different_plates: 'The two buffers were read on different plates: plate-to-plate differences are mixed in.',
  no_controls: 'No reference-variant samples and blanks at a common pH on this plate: Z′ is not computed.',
  reference_not_on_plate:
    "The reference variant is not on this plate: the plate's most active variant serves as positive control.",
} as const;

export type AnalysisFlag = keyof typeof ANALYSIS_FLAG_TEXT;

const ALL_TEXT: Record<string, string> = { ...PLATE_FLAG_TEXT, ...ANALYSIS_FLAG_TEXT };

/** The sentence of a flag code of shared/plate or of the analysis; the code itself when unknown. */
export function flagText(code: string): string {
  return ALL_TEXT[code] ?? code;
}

/** Sentences for every code in the lists given (for result.flagText). */
export function flagTextFor(codes: Iterable<string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const c of codes) if (!(c in out)) out[c] = flagText(c);
  return out;
}
