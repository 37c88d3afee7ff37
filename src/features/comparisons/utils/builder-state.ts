// What the comparison builder holds, and the request it turns into. Profiles are keyed
// "studyId:variantId" (shared/comparison's entryKey); the reference defaults to the parent
// (wild type) of the first chosen study when it is chosen, else to the first chosen profile.
import { entryKey } from '@shared/comparison/compare';
import type { AvailableProfile, ComparisonInput, SavedComparison } from '@shared/schemas/comparisons';

export type GlobalFitChoice = NonNullable<ComparisonInput['globalFit']>;

export type BuilderState = {
  teamId: string;
  includeUnapproved: boolean;
  /** Chosen profile keys, in the order they were chosen (it sets the colours). */
  selected: string[];
  /** null: the default reference. */
  referenceKey: string | null;
  globalFit: GlobalFitChoice | null;
};

export const emptyBuilder = (teamId: string): BuilderState => ({
  teamId,
  includeUnapproved: false,
  selected: [],
  referenceKey: null,
  globalFit: null,
});

export function builderFromSaved(saved: SavedComparison): BuilderState {
  return {
    teamId: saved.teamId,
    includeUnapproved: saved.includeUnapproved,
    selected: saved.entries.map(entryKey),
    referenceKey: saved.referenceKey,
    globalFit: saved.globalFit,
  };
}

const splitKey = (key: string) => {
  const [studyId, variantId] = key.split(':');
  return { studyId, variantId };
};

/** The reference actually used: the chosen one if still chosen, else the default. */
export function effectiveReference(state: BuilderState, profiles: AvailableProfile[]): string | null {
  if (state.referenceKey && state.selected.includes(state.referenceKey)) return state.referenceKey;
  const first = state.selected[0];
  if (!first) return null;
  const firstStudy = splitKey(first).studyId;
  const parent = profiles.find(
    (p) => p.studyId === firstStudy && p.isParent && state.selected.includes(entryKey(p)),
  );
  return parent ? entryKey(parent) : first;
}

/** The request for the preview and the save, or null while nothing is chosen. */
export function toInput(state: BuilderState, profiles: AvailableProfile[]): ComparisonInput | null {
  const referenceKey = effectiveReference(state, profiles);
  if (!state.teamId || state.selected.length === 0 || !referenceKey) return null;
  const globalFit =
    state.globalFit && state.globalFit.shared.length > 0 && state.selected.length >= 2
      ? state.globalFit
      : null;
  return {
    teamId: state.teamId,
    entries: state.selected.map(splitKey),
    referenceKey,
    includeUnapproved: state.includeUnapproved,
    globalFit,
  };
}

export function toggleProfile(state: BuilderState, key: string): BuilderState {
  const selected = state.selected.includes(key)
    ? state.selected.filter((k) => k !== key)
    : [...state.selected, key];
  return { ...state, selected };
}

/** Profiles grouped by study, studies in the order the API lists them (most recent first). */
export function groupByStudy(profiles: AvailableProfile[]) {
  const groups = new Map<
    string,
    {
      studyId: string;
      studyName: string;
      approved: boolean;
      studyStatus: string;
      assayName: string;
      temperatureC: number;
      profiles: AvailableProfile[];
    }
  >();
  for (const p of profiles) {
    let g = groups.get(p.studyId);
    if (!g) {
      g = {
        studyId: p.studyId,
        studyName: p.studyName,
        approved: p.approved,
        studyStatus: p.studyStatus,
        assayName: p.assayName,
        temperatureC: p.temperatureC,
        profiles: [],
      };
      groups.set(p.studyId, g);
    }
    g.profiles.push(p);
  }
  // Parent first inside a study, then by name.
  for (const g of groups.values())
    g.profiles.sort(
      (a, b) => Number(b.isParent) - Number(a.isParent) || a.variantName.localeCompare(b.variantName),
    );
  return [...groups.values()];
}

/** Unapproved studies leave the selection when the user stops including them. */
export function withIncludeUnapproved(
  state: BuilderState,
  include: boolean,
  profiles: AvailableProfile[],
): BuilderState {
  if (include) return { ...state, includeUnapproved: true };
  const approved = new Set(profiles.filter((p) => p.approved).map(entryKey));
  return { ...state, includeUnapproved: false, selected: state.selected.filter((k) => approved.has(k)) };
}
