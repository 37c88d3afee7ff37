// How an assay is said in words: labels of its choices, and what the measured rate reports given
// substrate relative to KM (SCIENCE.md §1.6: kcat follows the enzyme–substrate complex, kcat/KM the
// free enzyme and substrate; a single [S] mixes the two unless [S] ≫ KM or [S] ≪ KM at every pH).
import type { Assay } from '@shared/schemas/records-types';
import { formatSig } from '@/components/ui/numbers';

export const readModeLabels: Record<Assay['readMode'], string> = {
  endpoint: 'End-point',
  kinetic: 'Kinetic',
};

export const detectionLabels: Record<Assay['detection'], string> = {
  absorbance: 'Absorbance',
  fluorescence: 'Fluorescence',
};

export const quantitationLabels: Record<Assay['quantitation'], string> = {
  extinction: 'Extinction coefficient',
  'standard-curve': 'Standard curve',
};

export const extinctionUnitLabels: Record<Assay['extinctionUnit'], string> = {
  'M-1cm-1': 'M⁻¹ cm⁻¹',
  'mM-1cm-1': 'mM⁻¹ cm⁻¹',
};

export const regimeLabels: Record<Assay['substrateRegime'], string> = {
  saturating: 'Saturating ([S] ≫ KM)',
  'sub-saturating': 'Well below KM ([S] ≪ KM)',
  unknown: 'Not known',
};

/** A ratio of at least 10 is taken as ≫, at most 0.1 as ≪ (common practice, no source). */
const FAR = 10;

export type SubstrateWording = { text: string; caution: string | null };

export function substrateWording(
  a: Pick<Assay, 'substrateMm' | 'kmMm' | 'substrateRegime'>,
): SubstrateWording {
  const ratio = a.kmMm ? a.substrateMm / a.kmMm : null;
  const ratioText = ratio === null ? '' : ` [S]/KM = ${formatSig(ratio, 2)}.`;
  if (a.substrateRegime === 'saturating') {
    const caution =
      ratio !== null && ratio < FAR
        ? `[S]/KM is only ${formatSig(ratio, 2)}: the substrate may not saturate at every pH, and KM itself changes with pH.`
        : null;
    return {
      text: `Substrate is saturating: the pH profile reports kcat, the ionizations of the enzyme–substrate complex.${ratioText}`,
      caution,
    };
  }
  if (a.substrateRegime === 'sub-saturating') {
    const caution =
      ratio !== null && ratio > 1 / FAR
        ? `[S]/KM is ${formatSig(ratio, 2)}: not far enough below KM for the profile to report kcat/KM alone.`
        : null;
    return {
      text: `Substrate is well below KM: the pH profile reports kcat/KM, the ionizations of the free enzyme and free substrate.${ratioText}`,
      caution,
    };
  }
  return {
    text: `Substrate relative to KM is not known: the profile may mix kcat and kcat/KM effects.${ratioText}`,
    caution: null,
  };
}
