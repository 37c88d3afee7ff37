// Pure edits of a plate map. Each returns a new map (the editor keeps old ones for undo) and
// never changes its input. A well without an entry has no role.
import type { PlateMap, WellAssignment, WellRole } from '@shared/plate-map/schema';

export type WellPatch = Partial<WellAssignment>;

/** A well with only its role: no variant, pH, buffer, replicate or concentration. */
export const blankAssignment = (role: WellRole): WellAssignment => ({
  role,
  variantId: null,
  pH: null,
  buffer: null,
  replicate: null,
  concentrationUm: null,
});

/**
 * What a role keeps: blanks and buffer-only wells hold no enzyme (no variant), only standards
 * carry a concentration, and an unused well keeps nothing but its role.
 */
export function normalise(w: WellAssignment): WellAssignment {
  if (w.role === 'unused') return blankAssignment('unused');
  return {
    ...w,
    variantId: w.role === 'sample' ? w.variantId : null,
    concentrationUm: w.role === 'standard' ? w.concentrationUm : null,
  };
}

/**
 * Applies a patch to the named wells. A well without a role that gets a value but no role
 * becomes a sample (most wells are), which the checks then show if it lacks something.
 */
export function patchWells(map: PlateMap, names: Iterable<string>, patch: WellPatch): PlateMap {
  const wells = { ...map.wells };
  for (const name of names) {
    const before = wells[name] ?? blankAssignment(patch.role ?? 'sample');
    wells[name] = normalise({ ...before, ...patch });
  }
  return { ...map, wells };
}

/** Sets each well to its own patch (fills and patterns). */
export function patchEach(map: PlateMap, patches: Map<string, WellPatch>): PlateMap {
  const wells = { ...map.wells };
  for (const [name, patch] of patches) {
    const before = wells[name] ?? blankAssignment(patch.role ?? 'sample');
    wells[name] = normalise({ ...before, ...patch });
  }
  return { ...map, wells };
}

export function clearWells(map: PlateMap, names: Iterable<string>): PlateMap {
  const wells = { ...map.wells };
  for (const name of names) delete wells[name];
  return { ...map, wells };
}

/** The value all named wells share, 'mixed' when they differ, undefined when none has a role. */
export function common<K extends keyof WellAssignment>(
  map: PlateMap,
  names: readonly string[],
  key: K,
): WellAssignment[K] | 'mixed' | undefined {
  let seen = false;
  let value: WellAssignment[K] | undefined;
  for (const name of names) {
    const w = map.wells[name];
    const v = w ? w[key] : undefined;
    if (!seen) {
      seen = true;
      value = v as WellAssignment[K] | undefined;
    } else if (v !== value) return 'mixed';
  }
  return value;
}
