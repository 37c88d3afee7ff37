// Which source keys (SCIENCE.md §2.5: G, Roy, VB, cal, [memory] …) a buffer system's values cite,
// so the page can say what each key means beside the values.
import { SOURCE_KEYS, type BufferSystem } from '@shared/chemistry';

export function sourceStrings(system: BufferSystem): string[] {
  return system.ionizations.flatMap((ion) => [
    ion.sources.row,
    ion.sources.pKa25,
    ...(ion.sources.dH ? [ion.sources.dH] : []),
    ...(ion.sources.dCp ? [ion.sources.dCp] : []),
    ...(ion.sources.dpKadT ? [ion.sources.dpKadT] : []),
    ion.sources.usefulRange,
    ...(ion.roy ? [ion.roy.source] : []),
    ...ion.publishedPoints.map((p) => p.source),
  ]);
}

/** The keys cited, longest first matched (so "Roy 2014" wins over "Roy"), each with its meaning. */
export function citedKeys(system: BufferSystem): { key: string; meaning: string }[] {
  const text = sourceStrings(system).join(' | ');
  return Object.entries(SOURCE_KEYS)
    .filter(([key]) => (key === 'G' ? /(^|[\s;|(])G($|[\s;|)])/.test(text) : text.includes(key)))
    .map(([key, meaning]) => ({ key, meaning }));
}
