// Fill a pH series along rows or columns: from a start well, each step in the chosen direction
// takes the next pH point (and its buffer); the band covers `lines` rows (or columns) across.
import { plateDimensions, type PlateFormat } from '@shared/plate/geometry';
import type { PlateMap } from '@shared/plate-map/schema';
import type { PhPoint } from '../api/get-study-context';
import { patchEach, type WellPatch } from './edit-map';
import { cellName, type Cell } from './grid';

export type FillDirection = 'along-row' | 'down-column';

export type FillSeriesInput = {
  start: Cell;
  direction: FillDirection;
  points: PhPoint[];
  /** Wells per point in the fill direction (2 = each pH twice in a row). */
  span: number;
  /** How many rows (along-row) or columns (down-column) the band covers, from the start. */
  lines: number;
};

export type FillResult = { map: PlateMap; wells: number; pointsPlaced: number; pointsLeftOut: number };

export function fillSeries(map: PlateMap, format: PlateFormat, input: FillSeriesInput): FillResult {
  const { rows, columns } = plateDimensions(format);
  const alongRow = input.direction === 'along-row';
  // A start off the plate leaves no room (never a negative count of wells).
  const room = Math.max(0, alongRow ? columns - input.start.column : rows - input.start.row);
  const across = Math.max(0, alongRow ? rows - input.start.row : columns - input.start.column);
  const span = Math.max(1, Math.floor(input.span));
  const lines = Math.min(Math.max(1, Math.floor(input.lines)), across);
  const fit = lines > 0 ? Math.min(input.points.length, Math.floor(room / span)) : 0;
  const patches = new Map<string, WellPatch>();
  for (let p = 0; p < fit; p++) {
    const { pH, buffer } = input.points[p];
    for (let s = 0; s < span; s++) {
      for (let l = 0; l < lines; l++) {
        const step = p * span + s;
        const cell = alongRow
          ? { row: input.start.row + l, column: input.start.column + step }
          : { row: input.start.row + step, column: input.start.column + l };
        patches.set(cellName(cell), { pH, buffer });
      }
    }
  }
  return {
    map: patchEach(map, patches),
    wells: patches.size,
    pointsPlaced: fit,
    pointsLeftOut: input.points.length - fit,
  };
}
