// Replicate patterns: each variant takes `replicates` consecutive rows (or columns), numbered
// 1…n, over a band of `length` wells; optionally a line of blanks and a line of buffer-only
// wells follow. Triplicates down rows for two variants from A1 over 12 columns fill A–F.
import { plateDimensions, type PlateFormat } from '@shared/plate/geometry';
import type { PlateMap } from '@shared/plate-map/schema';
import { patchEach, type WellPatch } from './edit-map';
import { cellName, type Cell } from './grid';

export type PatternInput = {
  start: Cell;
  /** 'rows': replicates stack down rows, the band runs along columns; 'columns': the transpose. */
  direction: 'rows' | 'columns';
  variantIds: string[];
  replicates: number;
  length: number;
  blankLine: boolean;
  bufferLine: boolean;
};

export type PatternResult = { map: PlateMap; wells: number; linesNeeded: number; linesAvailable: number };

export function replicatePattern(map: PlateMap, format: PlateFormat, input: PatternInput): PatternResult {
  const { rows, columns } = plateDimensions(format);
  const byRows = input.direction === 'rows';
  // A start off the plate leaves no lines (a negative count would slice from the end and write
  // wells beyond the last row or column).
  const linesAvailable = Math.max(0, byRows ? rows - input.start.row : columns - input.start.column);
  const bandRoom = Math.max(0, byRows ? columns - input.start.column : rows - input.start.row);
  const length = Math.min(Math.max(1, Math.floor(input.length)), bandRoom);
  const lines: WellPatch[] = [];
  for (const variantId of input.variantIds) {
    for (let r = 1; r <= input.replicates; r++) lines.push({ role: 'sample', variantId, replicate: r });
  }
  if (input.blankLine) lines.push({ role: 'blank', replicate: 1 });
  if (input.bufferLine) lines.push({ role: 'buffer', replicate: 1 });
  const patches = new Map<string, WellPatch>();
  lines.slice(0, linesAvailable).forEach((patch, line) => {
    for (let k = 0; k < length; k++) {
      const cell = byRows
        ? { row: input.start.row + line, column: input.start.column + k }
        : { row: input.start.row + k, column: input.start.column + line };
      patches.set(cellName(cell), patch);
    }
  });
  return { map: patchEach(map, patches), wells: patches.size, linesNeeded: lines.length, linesAvailable };
}
