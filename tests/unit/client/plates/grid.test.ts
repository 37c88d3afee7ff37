import { describe, expect, it } from 'vitest';
import { parseWell } from '@shared/plate/geometry';
import {
  allNames,
  boundsOf,
  cellName,
  cellOf,
  clampCell,
  rectNames,
  rowLetter,
} from '@/features/plates/utils/grid';

// Layouts: 96 wells = 8 rows A–H × 12 columns; 384 = 16 rows A–P × 24 columns (common practice, no source).

describe('plate editor grid: well names', () => {
  it('when a cell is named, then rows are letters from A and columns count from 1', () => {
    expect(cellName({ row: 0, column: 0 })).toBe('A1');
    expect(cellName({ row: 1, column: 6 })).toBe('B7');
    expect(cellName({ row: 7, column: 11 })).toBe('H12');
    expect(cellName({ row: 15, column: 23 })).toBe('P24');
  });

  it('when a row is beyond P, then its letter is a question mark rather than a wrong letter', () => {
    expect(rowLetter(15)).toBe('P');
    expect(rowLetter(16)).toBe('?');
    expect(rowLetter(-1)).toBe('?');
  });

  it("when a name is read, then 'B7', 'b07' and ' h12 ' give 0-based cells", () => {
    expect(cellOf('B7', 96)).toEqual({ row: 1, column: 6 });
    expect(cellOf('b07', 96)).toEqual({ row: 1, column: 6 });
    expect(cellOf(' h12 ', 96)).toEqual({ row: 7, column: 11 });
    expect(cellOf('P24', 384)).toEqual({ row: 15, column: 23 });
  });

  it('when a name lies off the plate of the format, then it is not a well', () => {
    for (const name of ['I1', 'A13', 'P24', 'H0']) expect(cellOf(name, 96)).toBeNull();
    for (const name of ['Q1', 'A25', 'A0']) expect(cellOf(name, 384)).toBeNull();
    // The same names are wells of the larger plate.
    expect(cellOf('I1', 384)).toEqual({ row: 8, column: 0 });
    expect(cellOf('A13', 384)).toEqual({ row: 0, column: 12 });
  });

  it('when a name is malformed, then it is not a well', () => {
    for (const name of ['', '1A', 'AA1', 'A', 'A1.5', 'A-1', 'A100', 'A1B'])
      expect(cellOf(name, 384)).toBeNull();
  });

  it('when a name has more than two digits, then the editor refuses it as the shared well parser does', () => {
    for (const name of ['A001', 'A012', 'A00']) {
      expect(cellOf(name, 384)).toBeNull();
      expect(parseWell(name, 384).ok).toBe(false);
    }
  });

  it('when every well of a format is named and read back, then the cell is the same', () => {
    for (const format of [96, 384] as const) {
      for (const name of allNames(format)) {
        const cell = cellOf(name, format);
        expect(cell).not.toBeNull();
        if (cell) expect(cellName(cell)).toBe(name);
      }
    }
  });
});

describe('plate editor grid: rectangles and bounds', () => {
  it('when the whole plate is listed, then 96 and 384 wells come row by row from A1', () => {
    const n96 = allNames(96);
    expect(n96).toHaveLength(96);
    expect(n96.slice(0, 13)).toEqual([
      'A1',
      'A2',
      'A3',
      'A4',
      'A5',
      'A6',
      'A7',
      'A8',
      'A9',
      'A10',
      'A11',
      'A12',
      'B1',
    ]);
    expect(n96.at(-1)).toBe('H12');
    const n384 = allNames(384);
    expect(n384).toHaveLength(384);
    expect(new Set(n384).size).toBe(384);
    expect(n384[24]).toBe('B1');
    expect(n384.at(-1)).toBe('P24');
  });

  it('when a rectangle is given by either pair of corners, then it holds the same wells row by row', () => {
    const expected = ['B2', 'B3', 'B4', 'C2', 'C3', 'C4'];
    expect(rectNames({ row: 1, column: 1 }, { row: 2, column: 3 })).toEqual(expected);
    expect(rectNames({ row: 2, column: 3 }, { row: 1, column: 1 })).toEqual(expected);
    expect(rectNames({ row: 1, column: 3 }, { row: 2, column: 1 })).toEqual(expected);
    expect(rectNames({ row: 4, column: 4 }, { row: 4, column: 4 })).toEqual(['E5']);
  });

  it('when a cell lies off the plate, then clamping brings it to the nearest edge well', () => {
    expect(clampCell({ row: -3, column: 40 }, 96)).toEqual({ row: 0, column: 11 });
    expect(clampCell({ row: 99, column: -1 }, 384)).toEqual({ row: 15, column: 0 });
    expect(clampCell({ row: 8, column: 12 }, 96)).toEqual({ row: 7, column: 11 });
    expect(clampCell({ row: 8, column: 12 }, 384)).toEqual({ row: 8, column: 12 });
  });

  it('when bounds are taken, then they are the smallest rectangle around the wells, whatever their order', () => {
    expect(boundsOf(['C5', 'A9', 'F2'], 96)).toEqual({
      top: { row: 0, column: 1 },
      bottom: { row: 5, column: 8 },
    });
    expect(boundsOf(new Set(['D4']), 96)).toEqual({
      top: { row: 3, column: 3 },
      bottom: { row: 3, column: 3 },
    });
  });

  it('when no name is a well of the format, then there are no bounds; names off the plate are skipped', () => {
    expect(boundsOf([], 96)).toBeNull();
    expect(boundsOf(['P24', 'nonsense'], 96)).toBeNull();
    expect(boundsOf(['B2', 'P24'], 96)).toEqual({
      top: { row: 1, column: 1 },
      bottom: { row: 1, column: 1 },
    });
  });
});
