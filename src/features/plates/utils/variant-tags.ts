// Short labels for variants inside wells: "WT" for the parent, otherwise the first mutation
// ("D92N", "D92N+1" when there are more), falling back to the end of the name. 384-well cells
// have room for four characters; when a label is longer or two would read alike, they show the
// variant's number in the study instead (1, 2, …, the same number the "v" key takes).
import type { StudyVariant } from '../api/get-study-context';

export function variantTag(v: StudyVariant): string {
  if (v.isParent) return 'WT';
  const mutations = v.mutations
    .split('/')
    .map((m) => m.trim())
    .filter(Boolean);
  if (mutations.length)
    return mutations.length > 1 ? `${mutations[0]}+${mutations.length - 1}` : mutations[0];
  const tail = v.name.split(/[-\s]/).filter(Boolean).at(-1) ?? v.name;
  return tail.slice(0, 6);
}

export function variantTags(variants: StudyVariant[], compact = false): Record<string, string> {
  const tags = variants.map(variantTag);
  const fits = !compact || (tags.every((t) => t.length <= 4) && new Set(tags).size === tags.length);
  return Object.fromEntries(variants.map((v, i) => [v.id, fits ? tags[i] : `${i + 1}`]));
}
