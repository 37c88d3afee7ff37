// The buffer library's starting data: every row of SCIENCE.md §2.5, grouped into buffer systems.
// The seed loads `bufferLibrary`; lab-added systems are validated with `bufferSystemSchema`.
import { acetate, citrate, formate, maleate, succinate } from './carboxylic';
import { bicine, glycine, glycylglycine, histidine, tricine } from './amino-acids';
import { bisTris, ethanolamine, imidazole, tris } from './amines';
import { goodsBuffers } from './goods';
import { ammonia, borate, cacodylate, carbonate, potassiumPhosphate, sodiumPhosphate } from './inorganic';
import type { BufferSystem } from './schema';

export const bufferLibrary: readonly BufferSystem[] = [
  sodiumPhosphate,
  potassiumPhosphate,
  glycine,
  citrate,
  formate,
  succinate,
  acetate,
  histidine,
  maleate,
  cacodylate,
  carbonate,
  bisTris,
  imidazole,
  tris,
  tricine,
  glycylglycine,
  bicine,
  borate,
  ammonia,
  ethanolamine,
  ...goodsBuffers,
].sort((a, b) => a.ionizations[0].pKa25 - b.ionizations[0].pKa25 || a.id.localeCompare(b.id));

const normalise = (s: string) =>
  s
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, '-');

/** Finds a system by id, name or alias (case-insensitive); lab systems are searched first. */
export function findBufferSystem(
  nameOrId: string,
  extra: readonly BufferSystem[] = [],
): BufferSystem | undefined {
  const key = normalise(nameOrId);
  const all = [...extra, ...bufferLibrary];
  return (
    all.find((s) => s.id === key) ??
    all.find((s) => normalise(s.name) === key) ??
    all.find((s) => s.aliases.some((a) => normalise(a) === key))
  );
}

export { bufferSystemSchema, ionizationSchema, formSchema, titrantSchema, saltSchema } from './schema';
export type { BufferSystem, BufferSystemInput, BufferForm, Ionization, Titrant, Salt } from './schema';
export { SOURCE_KEYS, FORMULA_WEIGHT_SOURCE } from './sources';
