import { acidModel, baseModel } from './one-limb';
import { bellModel } from './bell';
import { bellPlateauModel } from './bell-plateau';
import { threeModel } from './three';
import type { ModelId, PhModel } from './types';

export type { ModelId, PhModel } from './types';
export { MODEL_IDS } from './types';

export const MODELS: Readonly<Record<ModelId, PhModel>> = {
  acid: acidModel,
  base: baseModel,
  bell: bellModel,
  'bell-plateau': bellPlateauModel,
  three: threeModel,
};

/** The apparent pKa parameters of a model, acid side first (its names after the activity levels). */
export const pKaNamesOf = (id: ModelId): readonly string[] => MODELS[id].names.slice(MODELS[id].nLinear);
