import { describe, expect, it } from 'vitest';
import { emptyPlateMap, type PlateMap } from '@shared/plate-map/schema';
import type { PhPoint } from '@/features/plates/api/get-study-context';
import { fillSeries, type FillSeriesInput } from '@/features/plates/utils/fill-series';
import { well, WT } from './wells';

// Invented series: acetate below pH 5.5, MES to 6.5, HEPES above (UI-logic input, no source needed).
const point = (pH: number): PhPoint => {
  const buffer = pH < 5.5 ? 'acetate' : pH < 6.5 ? 'mes' : 'hepes';
  return { pH, buffer, bufferName: buffer.toUpperCase() };
};
const series = (...pHs: number[]) => pHs.map(point);

const fill = (
  input: Partial<FillSeriesInput> & Pick<FillSeriesInput, 'points'>,
  map = emptyPlateMap(),
  format: 96 | 384 = 96,
) =>
  fillSeries(map, format, {
    start: { row: 0, column: 0 },
    direction: 'along-row',
    span: 1,
    lines: 1,
    ...input,
  });

const pHs = (map: PlateMap, names: string[]) => names.map((n) => map.wells[n]?.pH ?? null);

// A 96-well plate has rows A–H and columns 1–12; a 384-well plate rows A–P and columns 1–24
// (common practice, no source).
describe('fill pH series along a row', () => {
  it('when five points fill from A1, then A1–A5 take them in order with their buffers and nothing else is set', () => {
    const r = fill({ points: series(4, 4.5, 5, 5.5, 6) });
    expect(pHs(r.map, ['A1', 'A2', 'A3', 'A4', 'A5'])).toEqual([4, 4.5, 5, 5.5, 6]);
    expect(r.map.wells.A1.buffer).toBe('acetate');
    expect(r.map.wells.A4.buffer).toBe('mes');
    expect(Object.keys(r.map.wells)).toHaveLength(5);
    expect(r).toMatchObject({ wells: 5, pointsPlaced: 5, pointsLeftOut: 0 });
  });

  it('when each point spans two wells over three rows, then every pH takes a 3 × 2 block', () => {
    const r = fill({ start: { row: 1, column: 1 }, points: series(4, 5, 6), span: 2, lines: 3 });
    for (const row of ['B', 'C', 'D']) {
      expect(
        pHs(
          r.map,
          [2, 3, 4, 5, 6, 7].map((c) => `${row}${c}`),
        ),
      ).toEqual([4, 4, 5, 5, 6, 6]);
    }
    expect(r.map.wells.A2).toBeUndefined();
    expect(r.map.wells.E2).toBeUndefined();
    expect(r.map.wells.B8).toBeUndefined();
    expect(r).toMatchObject({ wells: 18, pointsPlaced: 3, pointsLeftOut: 0 });
  });

  it('when the points run off the right edge, then only whole points are placed and the rest are counted as left out', () => {
    const r = fill({ start: { row: 0, column: 9 }, points: series(3, 4, 5, 6, 7) });
    expect(pHs(r.map, ['A10', 'A11', 'A12'])).toEqual([3, 4, 5]);
    expect(r).toMatchObject({ wells: 3, pointsPlaced: 3, pointsLeftOut: 2 });
  });

  it('when a spanned point would be cut by the edge, then it is left out whole rather than put in one well', () => {
    // From A10: three wells of room, two per point → one point, A12 stays empty.
    const r = fill({ start: { row: 0, column: 9 }, points: series(5, 6), span: 2 });
    expect(pHs(r.map, ['A10', 'A11', 'A12'])).toEqual([5, 5, null]);
    expect(r).toMatchObject({ wells: 2, pointsPlaced: 1, pointsLeftOut: 1 });
  });

  it('when more rows are asked for than remain below the start, then the band stops at the last row', () => {
    const r = fill({ start: { row: 6, column: 0 }, points: series(7), lines: 5 });
    expect(Object.keys(r.map.wells).sort()).toEqual(['G1', 'H1']);
    expect(r.wells).toBe(2);
  });

  it('when a 384-well row takes 25 points, then 24 fit (A1–A24) and one is left out', () => {
    const points = Array.from({ length: 25 }, (_, i) => point(3 + i * 0.25));
    const r = fill({ points }, emptyPlateMap(), 384);
    expect(r.map.wells.A24.pH).toBe(3 + 23 * 0.25);
    expect(r.map.wells.B1).toBeUndefined();
    expect(r).toMatchObject({ wells: 24, pointsPlaced: 24, pointsLeftOut: 1 });
  });
});

describe('fill pH series down a column', () => {
  it('when eight points fill down from A1, then A1–H1 take them and the band covers the asked columns', () => {
    const r = fill({ direction: 'down-column', points: series(3, 4, 5, 6, 7, 8, 9, 10), lines: 2 });
    expect(pHs(r.map, ['A1', 'B1', 'C1', 'D1', 'E1', 'F1', 'G1', 'H1'])).toEqual([3, 4, 5, 6, 7, 8, 9, 10]);
    expect(pHs(r.map, ['A2', 'H2'])).toEqual([3, 10]);
    expect(r.map.wells.A3).toBeUndefined();
    expect(r).toMatchObject({ wells: 16, pointsPlaced: 8, pointsLeftOut: 0 });
  });

  it('when the column runs out, then the points that did not fit are counted', () => {
    const r = fill({
      direction: 'down-column',
      start: { row: 5, column: 11 },
      points: series(4, 5, 6, 7),
      lines: 4,
    });
    expect(pHs(r.map, ['F12', 'G12', 'H12'])).toEqual([4, 5, 6]);
    // Only one column remains to the right of column 12.
    expect(r).toMatchObject({ wells: 3, pointsPlaced: 3, pointsLeftOut: 1 });
  });
});

describe('fill pH series: what it keeps and odd input', () => {
  it('when wells already have roles and variants, then only their pH and buffer change', () => {
    const before: PlateMap = {
      wells: {
        A1: well({ variantId: WT, replicate: 2, pH: 9, buffer: 'hepes' }),
        A2: well({ role: 'blank', replicate: 1 }),
      },
      replicatesRequired: 3,
    };
    const r = fill({ points: series(4, 5) }, before);
    expect(r.map.wells.A1).toEqual(well({ variantId: WT, replicate: 2, pH: 4, buffer: 'acetate' }));
    expect(r.map.wells.A2).toEqual(well({ role: 'blank', replicate: 1, pH: 5, buffer: 'acetate' }));
    expect(before.wells.A1.pH).toBe(9);
  });

  it('when a well without a role is filled, then it becomes a sample', () => {
    expect(fill({ points: series(6) }).map.wells.A1.role).toBe('sample');
  });

  it('when span and lines are zero, negative or fractional, then they count as at least one whole well', () => {
    const zero = fill({ points: series(4, 5), span: 0, lines: -2 });
    expect(Object.keys(zero.map.wells).sort()).toEqual(['A1', 'A2']);
    const fractional = fill({ points: series(4, 5), span: 1.9, lines: 2.7 });
    expect(Object.keys(fractional.map.wells).sort()).toEqual(['A1', 'A2', 'B1', 'B2']);
  });

  it('when there are no points, then the map has no new wells and nothing is reported placed', () => {
    const r = fill({ points: [] });
    expect(r.map.wells).toEqual({});
    expect(r).toMatchObject({ wells: 0, pointsPlaced: 0, pointsLeftOut: 0 });
  });

  it('when a point has no buffer, then the wells get the pH and an empty buffer', () => {
    const r = fill({ points: [{ pH: 7, buffer: null, bufferName: null }] });
    expect(r.map.wells.A1).toMatchObject({ pH: 7, buffer: null });
  });
});

describe('fill pH series from a start off the plate', () => {
  it('when the start lies below or right of the plate, then no well is filled and every point is counted as left out', () => {
    for (const start of [
      { row: 8, column: 0 },
      { row: 0, column: 14 },
    ]) {
      for (const direction of ['along-row', 'down-column'] as const) {
        const r = fill({ start, direction, points: series(4, 5, 6) });
        expect(r.map.wells).toEqual({});
        expect(r).toMatchObject({ wells: 0, pointsPlaced: 0, pointsLeftOut: 3 });
      }
    }
  });
});
