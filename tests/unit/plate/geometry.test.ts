import { describe, expect, it } from 'vitest';
import {
  isEdgeWell,
  listWells,
  parseWell,
  plateDimensions,
  wellIndex,
  wellName,
  type PlateFormat,
} from '@shared/plate';

// Layouts: 96 wells = 8 rows A–H × 12 columns; 384 = 16 rows A–P × 24 columns (common practice, no source).
describe('plate geometry', () => {
  it('knows the two formats', () => {
    expect(plateDimensions(96)).toEqual({ rows: 8, columns: 12 });
    expect(plateDimensions(384)).toEqual({ rows: 16, columns: 24 });
  });

  it("parses 'A1', 'A01', 'a01' and ' h12 ' to canonical names and 0-based indices", () => {
    expect(parseWell('A1', 96)).toEqual({ ok: true, value: { name: 'A1', row: 0, column: 0 } });
    expect(parseWell('A01', 96)).toEqual({ ok: true, value: { name: 'A1', row: 0, column: 0 } });
    expect(parseWell('a01', 96)).toEqual({ ok: true, value: { name: 'A1', row: 0, column: 0 } });
    expect(parseWell(' h12 ', 96)).toEqual({ ok: true, value: { name: 'H12', row: 7, column: 11 } });
    expect(parseWell('P24', 384)).toEqual({ ok: true, value: { name: 'P24', row: 15, column: 23 } });
  });

  it('refuses wells off the plate and malformed names with a readable error', () => {
    for (const [text, format] of [
      ['I1', 96],
      ['A13', 96],
      ['Q1', 384],
      ['A25', 384],
      ['A0', 96],
      ['A00', 96],
      ['A001', 96],
      ['1A', 96],
      ['', 96],
      ['AA1', 384],
    ] as const) {
      const r = parseWell(text, format);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error.code).toBe('invalid_well');
        expect(r.error.message.length).toBeGreaterThan(10);
      }
    }
    expect(parseWell(42, 96).ok).toBe(false);
    expect(parseWell('A1', 48 as PlateFormat).ok).toBe(false);
  });

  it('names wells from indices and back', () => {
    expect(wellName(384, 15, 23)).toEqual({ ok: true, value: 'P24' });
    expect(wellName(96, 8, 0).ok).toBe(false);
    expect(wellName(96, 0, 1.5).ok).toBe(false);
    for (const format of [96, 384] as const) {
      for (const w of listWells(format)) {
        const again = parseWell(w.name, format);
        expect(again.ok && again.value).toEqual(w);
        expect(wellName(format, w.row, w.column)).toEqual({ ok: true, value: w.name });
      }
    }
  });

  it('iterates row-major (A1, A2, …) by default and column-major on request', () => {
    const rowMajor = listWells(96).map((w) => w.name);
    expect(rowMajor.slice(0, 3)).toEqual(['A1', 'A2', 'A3']);
    expect(rowMajor[12]).toBe('B1');
    expect(rowMajor).toHaveLength(96);
    const colMajor = listWells(384, 'column-major').map((w) => w.name);
    expect(colMajor.slice(0, 2)).toEqual(['A1', 'B1']);
    expect(colMajor[16]).toBe('A2');
    expect(new Set(colMajor).size).toBe(384);
    listWells(384, 'column-major').forEach((w, i) => expect(wellIndex(w, 384, 'column-major')).toBe(i));
    listWells(96).forEach((w, i) => expect(wellIndex(w, 96)).toBe(i));
  });

  it('marks the outer ring as edge wells: 36 of 96 and 76 of 384', () => {
    // 2·12 + 2·(8 − 2) = 36; 2·24 + 2·(16 − 2) = 76 [derived]
    expect(listWells(96).filter((w) => isEdgeWell(w, 96))).toHaveLength(36);
    expect(listWells(384).filter((w) => isEdgeWell(w, 384))).toHaveLength(76);
  });
});
