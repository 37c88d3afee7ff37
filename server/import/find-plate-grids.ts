// (a) End-point plate grids: row letters A–H (96) or A–P (384) down a column, column numbers
// 1–12 or 1–24 across the row above, the values in between. Anywhere on the sheet, any number.
import type { DetectContext, Draft, EndpointContent } from './draft';
import { cellRef, overlaps, type Region } from './grid';
import { readInteger, readMeasure } from './measure';
import type { PlateFormat } from './types';
import { PLATE_SHAPE, ROW_LETTERS, plateWells } from './wells';

export function findPlateGrids({ grid, claimed, notes }: DetectContext): Draft[] {
  const drafts: Draft[] = [];
  grid.forEachText((cell, row, column) => {
    if (cell.t !== 's' || cell.v.trim().toUpperCase() !== 'A' || row === 0) return;
    const letters = countLetters(grid, row, column);
    const numbers = countNumbers(grid, row - 1, column + 1);
    const format = formatOf(letters, numbers);
    if (!format) {
      if (letters >= 2 && numbers >= 2) {
        notes.push({
          sheet: grid.name,
          cell: cellRef(row - 1, column),
          message: `Sheet '${grid.name}', cell ${cellRef(row - 1, column)}: a grid with rows A–${ROW_LETTERS[letters - 1]} and columns 1–${numbers} is not a whole 96- or 384-well plate; it was not read.`,
        });
      }
      return;
    }
    const { rows, columns } = PLATE_SHAPE[format];
    const region: Region = { top: row - 1, left: column, bottom: row + rows - 1, right: column + columns };
    if (claimed.some((taken) => overlaps(taken, region))) return;
    claimed.push(region);
    drafts.push({ layout: 'plate-grid', region, corner: true, content: readGrid(grid, row, column, format) });
  });
  return drafts;
}

function countLetters(grid: DetectContext['grid'], row: number, column: number): number {
  let n = 0;
  while (n < ROW_LETTERS.length && grid.text(row + n, column)?.toUpperCase() === ROW_LETTERS[n]) n++;
  return n;
}

function countNumbers(grid: DetectContext['grid'], row: number, column: number): number {
  let n = 0;
  while (n < 24 && readInteger(grid.get(row, column + n)) === n + 1) n++;
  return n;
}

/** 16 letters and 24 numbers make a 384-well grid; 8 letters and 12 numbers a 96-well one. */
function formatOf(letters: number, numbers: number): PlateFormat | null {
  if (letters >= 16 && numbers >= 24) return 384;
  if (letters >= 8 && numbers >= 12 && numbers < 24) return 96;
  return null;
}

function readGrid(
  grid: DetectContext['grid'],
  firstRow: number,
  letterColumn: number,
  plateFormat: PlateFormat,
): EndpointContent {
  const { columns } = PLATE_SHAPE[plateFormat];
  const content: EndpointContent = { kind: 'endpoint', plateFormat, wells: {}, flags: {}, raw: {} };
  plateWells(plateFormat).forEach((name, i) => {
    const measure = readMeasure(
      grid.get(firstRow + Math.floor(i / columns), letterColumn + 1 + (i % columns)),
    );
    content.wells[name] = measure.value;
    if (measure.value === null) {
      content.flags[name] = measure.flag;
      content.raw[name] = measure.raw;
    }
  });
  return content;
}
