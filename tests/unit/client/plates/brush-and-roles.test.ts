import { describe, expect, it } from 'vitest';
import { brushPatch, defaultBrush } from '@/features/plates/utils/brush';
import { patchWells } from '@/features/plates/utils/edit-map';
import { typedStarts } from '@/features/plates/utils/typed-value';
import { roleByKey, roleHints, roleKeys, wellRoleLabels, wellRoles } from '@/features/plates/utils/roles';
import { emptyPlateMap } from '@shared/plate-map/schema';
import { WT } from './wells';

describe('the brush', () => {
  it('when nothing is chosen but a role, then painting sets the role and keeps what the well has', () => {
    expect(brushPatch(defaultBrush)).toEqual({ role: 'sample' });
    const before = patchWells(emptyPlateMap(), ['A1'], { pH: 5, buffer: 'mes', replicate: 2 });
    const after = patchWells(before, ['A1'], brushPatch({ role: 'blank' }));
    expect(after.wells.A1).toMatchObject({ role: 'blank', pH: 5, buffer: 'mes', replicate: 2 });
  });

  it('when a pH point is chosen, then painting sets its pH and its buffer together', () => {
    expect(brushPatch({ role: 'sample', point: { pH: 7.5, buffer: null } })).toEqual({
      role: 'sample',
      pH: 7.5,
      buffer: null,
    });
  });

  it('when every field is chosen, then the patch carries each of them', () => {
    expect(
      brushPatch({
        role: 'standard',
        variantId: WT,
        point: { pH: 6, buffer: 'mes' },
        replicate: 3,
        concentrationUm: 0,
      }),
    ).toEqual({ role: 'standard', variantId: WT, pH: 6, buffer: 'mes', replicate: 3, concentrationUm: 0 });
  });
});

describe('role keys', () => {
  it('when a role key is pressed (the editor lowercases it), then it maps back to its role, for every role', () => {
    for (const role of wellRoles) {
      expect(roleByKey[roleKeys[role].toLowerCase()]).toBe(role);
    }
    expect(roleByKey.s).toBe('sample');
    expect(roleByKey.o).toBe('buffer');
    expect(roleByKey.x).toBe('unused');
  });

  it('when roles are listed, then each has its own key, label and shape hint', () => {
    const keys = wellRoles.map((r) => roleKeys[r]);
    expect(new Set(keys).size).toBe(wellRoles.length);
    for (const role of wellRoles) {
      expect(wellRoleLabels[role].length).toBeGreaterThan(0);
      expect(roleHints[role].length).toBeGreaterThan(0);
    }
    expect(new Set(wellRoles.map((r) => roleHints[r])).size).toBe(wellRoles.length);
  });

  it('when a key belongs to no role, then it sets nothing', () => {
    expect(roleByKey.q).toBeUndefined();
  });

  it('when a role key is pressed, then it does not start a typed value instead (r, v, c and digits do)', () => {
    for (const role of wellRoles) expect(typedStarts.test(roleKeys[role].toLowerCase())).toBe(false);
  });
});
