// The models in words, and which parameters of each are apparent pKa values (SCIENCE.md §1).
import type { ModelId } from '@shared/fitting';
import { MODEL_IDS, pKaNamesOf } from '@shared/fitting/models';

export const modelWords: Record<ModelId, string> = {
  acid: 'one ionization, acid limb',
  base: 'one ionization, alkaline limb',
  bell: 'bell, two ionizations',
  'bell-plateau': 'bell with non-zero plateaus',
  three: 'three ionizations',
};

/** The pKa-like parameters of a model, acid side first. */
export const pkaNames = Object.fromEntries(MODEL_IDS.map((id) => [id, pKaNamesOf(id)])) as Record<
  ModelId,
  readonly string[]
>;

/** The parameter that sets the level: V, or the middle plateau of the plateau model. */
export const levelName = (model: ModelId) => (model === 'bell-plateau' ? 'V_mid' : 'V');

/**
 * The acid-side and alkaline-side pKa for the two columns of the parameter table: the acid limb's
 * pKa is acid-side, the alkaline limb's alkaline-side; with three ionizations the acid side has two
 * (pKa, pKb) and the column shows the one nearer the optimum (pKb).
 */
export function pkaSides(model: ModelId): { acid: string | null; alkaline: string | null } {
  switch (model) {
    case 'acid':
      return { acid: 'pKa', alkaline: null };
    case 'base':
      return { acid: null, alkaline: 'pKa' };
    case 'three':
      return { acid: 'pKb', alkaline: 'pKc' };
    default:
      return { acid: 'pKa1', alkaline: 'pKa2' };
  }
}

/** Short names for table cells (the long words are in the cell's title). */
export const modelShort: Record<ModelId, string> = {
  acid: 'acid limb',
  base: 'alkaline limb',
  bell: 'bell',
  'bell-plateau': 'bell, plateaus',
  three: 'three pKa',
};
