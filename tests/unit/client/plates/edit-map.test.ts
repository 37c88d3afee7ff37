import { describe, expect, it } from 'vitest';
import { emptyPlateMap, type PlateMap, type WellAssignment } from '@shared/plate-map/schema';
import { clearWells, common, normalise, patchEach, patchWells } from '@/features/plates/utils/edit-map';
import { D92N, well, WT } from './wells';

const mapOf = (wells: Record<string, WellAssignment>): PlateMap => ({ wells, replicatesRequired: 3 });

describe('plate map edits: what a role keeps', () => {
  it('when a well is a blank or buffer-only well, then it holds no variant (no enzyme) but keeps pH and replicate', () => {
    for (const role of ['blank', 'buffer'] as const) {
      expect(
        normalise(well({ role, variantId: WT, pH: 5, buffer: 'mes', replicate: 2, concentrationUm: 10 })),
      ).toEqual(well({ role, pH: 5, buffer: 'mes', replicate: 2 }));
    }
  });

  it('when a well is a sample, then it keeps its variant and loses any concentration', () => {
    expect(normalise(well({ variantId: WT, concentrationUm: 50, pH: 6 }))).toEqual(
      well({ variantId: WT, pH: 6 }),
    );
  });

  it('when a well is a standard, then it keeps its concentration and loses any variant', () => {
    expect(normalise(well({ role: 'standard', variantId: WT, concentrationUm: 50 }))).toEqual(
      well({ role: 'standard', concentrationUm: 50 }),
    );
  });

  it('when a well is unused, then it keeps nothing but its role', () => {
    expect(
      normalise(
        well({ role: 'unused', variantId: WT, pH: 5, buffer: 'mes', replicate: 1, concentrationUm: 3 }),
      ),
    ).toEqual(well({ role: 'unused' }));
  });
});

describe('plate map edits: painting wells', () => {
  it('when a role-less well gets a value without a role, then it becomes a sample with that value', () => {
    const next = patchWells(emptyPlateMap(), ['A1', 'A2'], { pH: 4.5, buffer: 'acetate' });
    expect(next.wells).toEqual({
      A1: well({ pH: 4.5, buffer: 'acetate' }),
      A2: well({ pH: 4.5, buffer: 'acetate' }),
    });
  });

  it('when a patch changes only the role, then the well keeps its other fields that the new role allows', () => {
    const before = mapOf({ B3: well({ variantId: WT, pH: 7, buffer: 'hepes', replicate: 2 }) });
    const next = patchWells(before, ['B3'], { role: 'blank' });
    expect(next.wells.B3).toEqual(well({ role: 'blank', pH: 7, buffer: 'hepes', replicate: 2 }));
  });

  it('when a patch sets a variant on a blank, then the blank stays without enzyme', () => {
    const before = mapOf({ C1: well({ role: 'blank', pH: 5 }) });
    expect(patchWells(before, ['C1'], { variantId: D92N }).wells.C1).toEqual(well({ role: 'blank', pH: 5 }));
  });

  it('when a map is edited, then the input map is left as it was (the editor keeps it for undo)', () => {
    const before = mapOf({ A1: well({ variantId: WT, pH: 5 }) });
    const snapshot = structuredClone(before);
    const next = patchWells(before, ['A1', 'A2'], { role: 'standard', concentrationUm: 10 });
    expect(before).toEqual(snapshot);
    expect(next).not.toBe(before);
    expect(next.wells).not.toBe(before.wells);
    expect(next.replicatesRequired).toBe(3);
  });

  it('when no wells are named, then the map has the same wells', () => {
    const before = mapOf({ A1: well({ pH: 5 }) });
    expect(patchWells(before, [], { pH: 9 }).wells).toEqual(before.wells);
  });

  it('when each well gets its own patch, then each is set to its own values', () => {
    const before = mapOf({ A1: well({ role: 'blank', replicate: 1 }) });
    const next = patchEach(
      before,
      new Map([
        ['A1', { pH: 4 }],
        ['A2', { pH: 5, variantId: WT }],
        ['A3', { role: 'unused' as const, pH: 6 }],
      ]),
    );
    expect(next.wells).toEqual({
      A1: well({ role: 'blank', replicate: 1, pH: 4 }),
      A2: well({ pH: 5, variantId: WT }),
      A3: well({ role: 'unused' }),
    });
    expect(before.wells.A1.pH).toBeNull();
  });

  it('when wells are cleared, then they lose their role and the others stay', () => {
    const before = mapOf({ A1: well({ pH: 5 }), A2: well({ pH: 6 }), A3: well({ pH: 7 }) });
    const next = clearWells(before, ['A1', 'A3', 'H12']);
    expect(Object.keys(next.wells)).toEqual(['A2']);
    expect(Object.keys(before.wells)).toEqual(['A1', 'A2', 'A3']);
  });
});

describe('plate map edits: what the selected wells share', () => {
  const map = mapOf({
    A1: well({ variantId: WT, pH: 5, replicate: 1 }),
    A2: well({ variantId: WT, pH: 6, replicate: 1 }),
    A3: well({ role: 'blank', pH: 6, replicate: 1 }),
  });

  it('when all named wells hold the same value, then that value is shown', () => {
    expect(common(map, ['A1', 'A2'], 'variantId')).toBe(WT);
    expect(common(map, ['A1', 'A2', 'A3'], 'replicate')).toBe(1);
    expect(common(map, ['A2', 'A3'], 'pH')).toBe(6);
  });

  it('when the named wells differ, then the value is mixed', () => {
    expect(common(map, ['A1', 'A2'], 'pH')).toBe('mixed');
    expect(common(map, ['A1', 'A3'], 'role')).toBe('mixed');
  });

  it('when a role-less well is among wells with a role, then the role is mixed', () => {
    expect(common(map, ['A1', 'H12'], 'role')).toBe('mixed');
    expect(common(map, ['H12', 'A1'], 'role')).toBe('mixed');
  });

  it('when none of the named wells has a role, or none is named, then there is no value', () => {
    expect(common(map, ['H11', 'H12'], 'role')).toBeUndefined();
    expect(common(map, [], 'role')).toBeUndefined();
  });

  it('when the wells share an empty field, then the shared value is null, not mixed', () => {
    expect(common(map, ['A1', 'A2'], 'buffer')).toBeNull();
  });
});
