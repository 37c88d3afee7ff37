import { describe, expect, it } from 'vitest';
import { emptyPlateMap, type PlateMap } from '@shared/plate-map/schema';
import type { PhPoint } from '@/features/plates/api/get-study-context';
import { fillSeries } from '@/features/plates/utils/fill-series';
import { allNames } from '@/features/plates/utils/grid';
import { replicatePattern, type PatternInput } from '@/features/plates/utils/replicate-pattern';
import { D92N, WT } from './wells';

const E35Q = '00000000-0000-4000-8000-000000000003';

const lay = (input: Partial<PatternInput>, map: PlateMap = emptyPlateMap(), format: 96 | 384 = 96) =>
  replicatePattern(map, format, {
    start: { row: 0, column: 0 },
    direction: 'rows',
    variantIds: [WT, D92N],
    replicates: 3,
    length: 12,
    blankLine: false,
    bufferLine: false,
    ...input,
  });

const rowOf = (map: PlateMap, row: string, columns = 12) =>
  Array.from({ length: columns }, (_, c) => map.wells[`${row}${c + 1}`]);

// A 96-well plate has rows A–H and columns 1–12 (common practice, no source).
describe('replicate pattern down rows', () => {
  it('when two variants are laid out in triplicate from A1 over 12 columns, then they fill rows A–F, numbered 1–3', () => {
    const r = lay({});
    const expected: [string, string, number][] = [
      ['A', WT, 1],
      ['B', WT, 2],
      ['C', WT, 3],
      ['D', D92N, 1],
      ['E', D92N, 2],
      ['F', D92N, 3],
    ];
    for (const [row, variantId, replicate] of expected) {
      for (const w of rowOf(r.map, row)) expect(w).toMatchObject({ role: 'sample', variantId, replicate });
    }
    expect(rowOf(r.map, 'G').every((w) => w === undefined)).toBe(true);
    expect(r).toMatchObject({ wells: 72, linesNeeded: 6, linesAvailable: 8 });
  });

  it('when a blank line and a buffer line are asked for, then rows G and H take them, without a variant', () => {
    const r = lay({ blankLine: true, bufferLine: true });
    for (const w of rowOf(r.map, 'G'))
      expect(w).toMatchObject({ role: 'blank', variantId: null, replicate: 1 });
    for (const w of rowOf(r.map, 'H'))
      expect(w).toMatchObject({ role: 'buffer', variantId: null, replicate: 1 });
    expect(r.wells).toBe(96);
    expect(Object.keys(r.map.wells).sort()).toEqual(allNames(96).sort());
  });

  it('when the lines do not all fit below the start, then the first ones are laid and the shortfall is reported', () => {
    // Three variants in triplicate and a blank line need 10 rows; a 96-well plate has 8.
    const r = lay({ variantIds: [WT, D92N, E35Q], blankLine: true });
    expect(r).toMatchObject({ linesNeeded: 10, linesAvailable: 8, wells: 96 });
    expect(rowOf(r.map, 'G')[0]).toMatchObject({ variantId: E35Q, replicate: 1 });
    expect(rowOf(r.map, 'H')[0]).toMatchObject({ variantId: E35Q, replicate: 2 });
    expect(Object.values(r.map.wells).some((w) => w.role === 'blank')).toBe(false);
  });

  it('when the band is longer than the room to the right, then it stops at the edge', () => {
    const r = lay({ start: { row: 2, column: 6 }, variantIds: [WT], replicates: 2, length: 12 });
    expect(Object.keys(r.map.wells).sort()).toEqual(
      ['C7', 'C8', 'C9', 'C10', 'C11', 'C12', 'D7', 'D8', 'D9', 'D10', 'D11', 'D12'].sort(),
    );
    expect(r).toMatchObject({ wells: 12, linesNeeded: 2, linesAvailable: 6 });
  });

  it('when the length is zero or fractional, then at least one whole well per line is laid', () => {
    expect(lay({ variantIds: [WT], replicates: 1, length: 0 }).wells).toBe(1);
    expect(lay({ variantIds: [WT], replicates: 1, length: 2.9 }).wells).toBe(2);
  });

  it('when no variant is chosen and no extra line is asked for, then nothing is laid', () => {
    const r = lay({ variantIds: [] });
    expect(r.map.wells).toEqual({});
    expect(r).toMatchObject({ wells: 0, linesNeeded: 0 });
  });

  it('when a 384-well plate takes two variants in quadruplicate over 24 columns, then rows A–H are filled', () => {
    const r = lay({ replicates: 4, length: 24 }, emptyPlateMap(), 384);
    expect(r.wells).toBe(192);
    expect(r.map.wells.H24).toMatchObject({ variantId: D92N, replicate: 4 });
    expect(r.map.wells.I1).toBeUndefined();
    expect(r.linesAvailable).toBe(16);
  });
});

describe('replicate pattern down columns', () => {
  it('when the direction is columns, then replicates stack across columns and the band runs down rows', () => {
    const r = lay({ direction: 'columns', length: 8, start: { row: 0, column: 3 } });
    for (const row of ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H']) {
      expect(r.map.wells[`${row}4`]).toMatchObject({ variantId: WT, replicate: 1 });
      expect(r.map.wells[`${row}6`]).toMatchObject({ variantId: WT, replicate: 3 });
      expect(r.map.wells[`${row}9`]).toMatchObject({ variantId: D92N, replicate: 3 });
      expect(r.map.wells[`${row}10`]).toBeUndefined();
    }
    expect(r).toMatchObject({ wells: 48, linesNeeded: 6, linesAvailable: 9 });
  });
});

describe('replicate pattern after a pH fill', () => {
  it('when a plate is filled with pH along rows and then laid out, then every well keeps its pH and gains its role', () => {
    const points: PhPoint[] = [4, 5, 6, 7, 8, 9].map((pH) => ({ pH, buffer: 'b', bufferName: 'B' }));
    const filled = fillSeries(emptyPlateMap(), 96, {
      start: { row: 0, column: 0 },
      direction: 'along-row',
      points,
      span: 2,
      lines: 8,
    }).map;
    const r = lay({ blankLine: true }, filled);
    expect(r.map.wells.A1).toMatchObject({ role: 'sample', variantId: WT, replicate: 1, pH: 4, buffer: 'b' });
    expect(r.map.wells.F12).toMatchObject({ role: 'sample', variantId: D92N, replicate: 3, pH: 9 });
    expect(r.map.wells.G5).toMatchObject({ role: 'blank', pH: 6 });
    // Row H was filled with pH but not laid out: it keeps its pH as the fill left it.
    expect(r.map.wells.H12).toMatchObject({ role: 'sample', variantId: null, pH: 9 });
  });

  it('when a blank line falls on wells that held a variant, then the blanks drop the variant', () => {
    const first = lay({ variantIds: [WT], replicates: 8 });
    const r = lay({ variantIds: [], blankLine: true, start: { row: 7, column: 0 } }, first.map);
    expect(r.map.wells.H1).toMatchObject({ role: 'blank', variantId: null });
    expect(r.map.wells.G1).toMatchObject({ role: 'sample', variantId: WT, replicate: 7 });
  });
});

describe('replicate pattern from a start off the plate', () => {
  it('when the start lies below or right of the plate, then nothing is laid (no well beyond H or 12)', () => {
    for (const start of [
      { row: 10, column: 0 },
      { row: 0, column: 15 },
    ]) {
      for (const direction of ['rows', 'columns'] as const) {
        const r = lay({ start, direction });
        expect(r.map.wells).toEqual({});
        expect(r.wells).toBe(0);
      }
    }
    expect(lay({ start: { row: 10, column: 0 }, direction: 'rows' }).linesAvailable).toBe(0);
    expect(lay({ start: { row: 0, column: 15 }, direction: 'columns' }).linesAvailable).toBe(0);
  });
});
