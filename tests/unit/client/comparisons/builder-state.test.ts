import { describe, expect, it } from 'vitest';
import {
  comparisonInputSchema,
  type AvailableProfile,
  type SavedComparison,
} from '@shared/schemas/comparisons';
import {
  builderFromSaved,
  effectiveReference,
  emptyBuilder,
  groupByStudy,
  toInput,
  toggleProfile,
  withIncludeUnapproved,
  type BuilderState,
} from '@/features/comparisons/utils/builder-state';

const TEAM = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const S1 = '10000000-0000-4000-8000-000000000001';
const S2 = '20000000-0000-4000-8000-000000000002';
const WT = '00000000-0000-4000-8000-00000000000a';
const D92N = '00000000-0000-4000-8000-00000000000b';
const E35Q = '00000000-0000-4000-8000-00000000000c';

const profile = (
  studyId: string,
  variantId: string,
  over: Partial<AvailableProfile> = {},
): AvailableProfile => ({
  studyId,
  studyName: studyId === S1 ? 'Xylanase 2026-01' : 'Xylanase 2026-02',
  studyStatus: 'approved',
  approved: true,
  teamId: TEAM,
  variantId,
  variantName: variantId === WT ? 'wild type' : variantId === D92N ? 'D92N' : 'E35Q',
  isParent: variantId === WT,
  model: 'bell',
  pHopt: 6,
  assayName: 'DNS reducing sugar',
  temperatureC: 37,
  computedAt: '2026-03-01T00:00:00Z',
  ...over,
});

const profiles = [
  profile(S2, D92N, { approved: false, studyStatus: 'draft' }),
  profile(S2, WT, { approved: false, studyStatus: 'draft' }),
  profile(S1, E35Q),
  profile(S1, WT),
  profile(S1, D92N),
];
const key = (s: string, v: string) => `${s}:${v}`;
const state = (over: Partial<BuilderState>): BuilderState => ({ ...emptyBuilder(TEAM), ...over });

describe('comparison builder: the reference', () => {
  it('when the parent of the first chosen study is chosen, then it is the default reference', () => {
    const s = state({ selected: [key(S1, D92N), key(S2, WT), key(S1, WT)] });
    expect(effectiveReference(s, profiles)).toBe(key(S1, WT));
  });

  it('when that parent is not chosen, then the first chosen profile is the reference (not another study’s parent)', () => {
    const s = state({ selected: [key(S1, D92N), key(S2, WT)] });
    expect(effectiveReference(s, profiles)).toBe(key(S1, D92N));
  });

  it('when a reference was picked and is still chosen, then it is used', () => {
    const s = state({ selected: [key(S1, WT), key(S1, D92N)], referenceKey: key(S1, D92N) });
    expect(effectiveReference(s, profiles)).toBe(key(S1, D92N));
  });

  it('when the picked reference was unchosen, then the default comes back', () => {
    const s = state({ selected: [key(S1, WT), key(S1, E35Q)], referenceKey: key(S1, D92N) });
    expect(effectiveReference(s, profiles)).toBe(key(S1, WT));
  });

  it('when nothing is chosen, then there is no reference', () => {
    expect(effectiveReference(emptyBuilder(TEAM), profiles)).toBeNull();
  });
});

describe('comparison builder: the request', () => {
  it('when profiles are chosen, then the request lists them in order and passes the shared schema', () => {
    const s = state({ selected: [key(S1, D92N), key(S1, WT)] });
    const input = toInput(s, profiles);
    expect(input).toEqual({
      teamId: TEAM,
      entries: [
        { studyId: S1, variantId: D92N },
        { studyId: S1, variantId: WT },
      ],
      referenceKey: key(S1, WT),
      includeUnapproved: false,
      globalFit: null,
    });
    expect(comparisonInputSchema.safeParse(input).success).toBe(true);
  });

  it('when nothing is chosen or there is no team, then there is no request', () => {
    expect(toInput(emptyBuilder(TEAM), profiles)).toBeNull();
    expect(toInput(state({ teamId: '', selected: [key(S1, WT)] }), profiles)).toBeNull();
  });

  it('when a global fit is asked for, then it is sent only with two or more profiles and a shared parameter', () => {
    const globalFit = { model: 'bell' as const, shared: ['pKa1' as const] };
    expect(
      toInput(state({ selected: [key(S1, WT), key(S1, D92N)], globalFit }), profiles)?.globalFit,
    ).toEqual(globalFit);
    expect(toInput(state({ selected: [key(S1, WT)], globalFit }), profiles)?.globalFit).toBeNull();
    expect(
      toInput(
        state({ selected: [key(S1, WT), key(S1, D92N)], globalFit: { model: 'bell', shared: [] } }),
        profiles,
      )?.globalFit,
    ).toBeNull();
  });
});

describe('comparison builder: choosing profiles', () => {
  it('when a profile is toggled, then it is added at the end or removed, and the old state is kept', () => {
    const before = state({ selected: [key(S1, WT)] });
    const added = toggleProfile(before, key(S1, D92N));
    expect(added.selected).toEqual([key(S1, WT), key(S1, D92N)]);
    expect(toggleProfile(added, key(S1, WT)).selected).toEqual([key(S1, D92N)]);
    expect(before.selected).toEqual([key(S1, WT)]);
  });

  it('when unapproved studies are no longer included, then their profiles leave the selection', () => {
    const s = state({ includeUnapproved: true, selected: [key(S2, WT), key(S1, D92N), key(S2, D92N)] });
    const approvedOnly = withIncludeUnapproved(s, false, profiles);
    expect(approvedOnly).toMatchObject({ includeUnapproved: false, selected: [key(S1, D92N)] });
    expect(withIncludeUnapproved(approvedOnly, true, profiles)).toMatchObject({
      includeUnapproved: true,
      selected: [key(S1, D92N)],
    });
  });

  it('when a saved comparison is opened, then the builder holds its entries in order and its choices', () => {
    const saved: SavedComparison = {
      id: 'c1',
      teamId: TEAM,
      name: 'D92N against WT',
      notes: '',
      entries: [
        { studyId: S1, variantId: WT },
        { studyId: S2, variantId: D92N },
      ],
      referenceKey: key(S1, WT),
      includeUnapproved: true,
      globalFit: { model: 'bell', shared: ['pKa2'] },
      version: 3,
      createdBy: 'u',
      createdAt: '2026-01-01T00:00:00Z',
      updatedAt: '2026-01-02T00:00:00Z',
    };
    expect(builderFromSaved(saved)).toEqual({
      teamId: TEAM,
      includeUnapproved: true,
      selected: [key(S1, WT), key(S2, D92N)],
      referenceKey: key(S1, WT),
      globalFit: { model: 'bell', shared: ['pKa2'] },
    });
  });
});

describe('comparison builder: profiles by study', () => {
  it('when profiles are grouped, then studies keep the API order and the parent comes first, then names A–Z', () => {
    const groups = groupByStudy(profiles);
    expect(groups.map((g) => g.studyId)).toEqual([S2, S1]);
    expect(groups[1].profiles.map((p) => p.variantName)).toEqual(['wild type', 'D92N', 'E35Q']);
    expect(groups[0]).toMatchObject({ studyName: 'Xylanase 2026-02', approved: false, studyStatus: 'draft' });
  });

  it('when there are no profiles, then there are no groups', () => {
    expect(groupByStudy([])).toEqual([]);
  });
});
