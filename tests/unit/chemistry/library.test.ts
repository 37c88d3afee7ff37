import { describe, expect, it } from 'vitest';
import {
  bufferLibrary,
  bufferSystemSchema,
  findBufferSystem,
  SOURCE_KEYS,
  validateBufferSystem,
} from '@shared/chemistry';
import { printed, tableRows } from './table';

describe('the buffer library holds every row of SCIENCE.md §2.5', () => {
  for (const row of tableRows) {
    it(`${row.buffer}: pK ${row.pK25}, z ${row.zHA}, ΔH ${row.dH}, ΔCp ${row.dCp}, dpK/dT ${row.dpKdT}, source "${row.source}"`, () => {
      const system = bufferLibrary.find((s) => s.id === row.systemId);
      expect(system, row.systemId).toBeDefined();
      const ion = system!.ionizations[row.step];
      expect(ion.pKa25).toBe(printed(row.pK25)!.value);
      expect(ion.zAcid).toBe(row.zHA);
      expect(ion.dH).toBe(printed(row.dH)?.value ?? null);
      expect(ion.dCp).toBe(printed(row.dCp)?.value ?? null);
      expect(ion.dpKadT).toBe(printed(row.dpKdT)!.value);
      expect(ion.sources.row).toBe(row.source);
      // values marked [memory] in the table are marked so in the library
      if (row.dH.includes('[memory]')) expect(ion.sources.dH).toBe('[memory]');
      if (row.dCp.includes('[memory]')) expect(ion.sources.dCp).toBe('[memory]');
      if (row.pK25.includes('[memory]')) expect(ion.sources.pKa25).toBe('[memory]');
      if (row.dH.includes('(cal)')) expect(ion.sources.dH).toBe('cal');
      // useful range pKa ± 1 (common practice, no source), stored to 4 decimals
      expect(ion.usefulRange[0]).toBeCloseTo(ion.pKa25 - 1, 9);
      expect(ion.usefulRange[1]).toBeCloseTo(ion.pKa25 + 1, 9);
    });
  }

  it('groups the rows into 35 systems with 1 to 3 steps', () => {
    expect(bufferLibrary).toHaveLength(35);
    expect(bufferLibrary.find((s) => s.id === 'sodium-phosphate')!.ionizations).toHaveLength(3);
    expect(bufferLibrary.find((s) => s.id === 'citrate')!.ionizations).toHaveLength(3);
    expect(bufferLibrary.find((s) => s.id === 'glycine')!.ionizations).toHaveLength(2);
    expect(bufferLibrary.find((s) => s.id === 'succinate')!.ionizations).toHaveLength(2);
    expect(bufferLibrary.find((s) => s.id === 'carbonate')!.ionizations).toHaveLength(2);
  });

  it('every system passes its own zod schema unchanged', () => {
    for (const system of bufferLibrary) {
      const parsed = bufferSystemSchema.safeParse(system);
      expect(
        parsed.success,
        `${system.id}: ${parsed.success ? '' : JSON.stringify(parsed.error.issues)}`,
      ).toBe(true);
      if (parsed.success) expect(parsed.data).toEqual(system);
    }
  });

  it('ids are unique and kebab-case; every source key is explained', () => {
    const ids = bufferLibrary.map((s) => s.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const system of bufferLibrary) {
      for (const ion of system.ionizations) {
        for (const key of [ion.sources.pKa25, ion.sources.dH, ion.sources.dCp].filter(Boolean)) {
          expect(Object.keys(SOURCE_KEYS), `${system.id} ${key}`).toContain(key);
        }
      }
    }
  });

  it('finds systems by id, name or alias, case-insensitively', () => {
    expect(findBufferSystem('HEPES')?.id).toBe('hepes');
    expect(findBufferSystem('Tris-HCl')?.id).toBe('tris');
    expect(findBufferSystem('phosphate')?.id).toBe('sodium-phosphate');
    expect(findBufferSystem('no such buffer')).toBeUndefined();
  });
});

describe('validating a lab-added buffer system', () => {
  const good = {
    id: 'lab-bistris-propane',
    name: 'Lab Bis-Tris propane (invented check data)',
    ionizations: [
      {
        label: 'pK1',
        pKa25: 6.8,
        zAcid: 2,
        dH: 25,
        usefulRange: [5.8, 7.8],
        sources: { row: 'lab', pKa25: 'lab' },
      },
      {
        label: 'pK2',
        pKa25: 9.0,
        zAcid: 1,
        dpKadT: -0.02,
        usefulRange: [8, 10],
        sources: { row: 'lab', pKa25: 'lab' },
      },
    ],
    forms: [{ id: 'base', name: 'Base', formula: 'C11H26N2O6', formulaWeight: 282.33 }],
  };

  it('accepts a consistent system and fills the defaults', () => {
    const r = validateBufferSystem(good);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.value.ionizations[0].temperatureModel).toBe('goldberg');
      expect(r.value.forms[0].counterIons).toEqual({ Na: 0, K: 0, Cl: 0 });
    }
  });

  it.each([
    ['pKa 15', { ionizations: [{ ...good.ionizations[0], pKa25: 15 }] }],
    ['pKa values out of order', { ionizations: [good.ionizations[1], good.ionizations[0]] }],
    [
      'charges that do not fall by one per step',
      { ionizations: [good.ionizations[0], { ...good.ionizations[1], zAcid: 0 }] },
    ],
    ['an id that is not kebab-case', { id: 'Bad Id' }],
    ['a negative formula weight', { forms: [{ ...good.forms[0], formulaWeight: -1 }] }],
    ['ΔH of 500 kJ/mol', { ionizations: [{ ...good.ionizations[0], dH: 500 }, good.ionizations[1]] }],
    [
      'four steps',
      { ionizations: [1, 2, 3, 4].map((i) => ({ ...good.ionizations[0], pKa25: i * 2, zAcid: 2 - i })) },
    ],
    [
      'a mix pair naming an unknown form',
      { ionizations: [{ ...good.ionizations[0], mixFormIds: ['x', 'base'] }, good.ionizations[1]] },
    ],
  ])('rejects %s with a readable message', (_label, patch) => {
    const r = validateBufferSystem({ ...good, ...patch });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('invalid-input');
      expect(r.error.message).toMatch(/not valid/);
    }
  });

  it('rejects non-objects without throwing', () => {
    for (const bad of [null, 42, 'hepes', [], undefined]) expect(validateBufferSystem(bad).ok).toBe(false);
  });
});
