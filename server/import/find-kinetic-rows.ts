// (b) Kinetic tables with one row per well: well names (A1 or A01) down a column, the read
// times across the header row above them, optionally a temperature row between the two.
import { kineticWells, readTemperatures, temperatureNote, type DetectContext, type Draft } from './draft';
import { ImportError, where } from './errors';
import { cellRef, cellText, inRegion, overlaps, type Grid, type Region } from './grid';
import { TEMPERATURE_HEADER } from './headers';
import { parseNumberText, readMeasure } from './measure';
import { readTime, unitFromHeader } from './time';
import type { ParseNote } from './types';
import { buildTimeAxis, type TimeCell } from './time-axis';
import { formatHolding, looksLikeWellName, parseWellName, wellName, type WellPosition } from './wells';

/** Header cells before the first time that may be skipped (e.g. "Content", "Sample"). */
const MAX_SKIPPED_HEADER_COLUMNS = 6;

export function findKineticRows(context: DetectContext): Draft[] {
  const { grid, claimed } = context;
  const drafts: Draft[] = [];
  grid.forEachText((cell, row, column) => {
    if (
      cell.t !== 's' ||
      row === 0 ||
      !parseWellName(cell.v) ||
      claimed.some((r) => inRegion(r, row, column))
    )
      return;
    if (grid.text(row - 1, column) !== null && parseWellName(grid.text(row - 1, column)!)) return; // not the first well
    const found = readTable(context, row, column);
    if (!found) return;
    if (claimed.some((taken) => overlaps(taken, found.region))) return;
    claimed.push(found.region);
    drafts.push({ layout: 'wells-as-rows', region: found.region, corner: false, content: found.content });
  });
  return drafts;
}

function readTable(
  context: DetectContext,
  firstRow: number,
  wellColumn: number,
): { region: Region; content: Draft['content'] } | null {
  const { grid, notes } = context;
  // A temperature row may sit between the time header and the first well.
  const hasTemperatureRow =
    TEMPERATURE_HEADER.test(grid.text(firstRow - 1, wellColumn) ?? '') && firstRow >= 2;
  const headerRow = hasTemperatureRow ? firstRow - 2 : firstRow - 1;
  // The corner above the wells is a header (empty, "Well", "Time [s]"), never a value.
  const cornerCell = grid.get(headerRow, wellColumn);
  if (cornerCell && (cornerCell.t !== 's' || parseNumberText(cornerCell.v) !== null)) return null;
  const corner = grid.text(headerRow, wellColumn) ?? '';
  const times = readTimeRow(grid, headerRow, wellColumn, unitFromHeader(corner));
  if (times.cells.length < 2) return null;
  const headerRef = cellRef(headerRow, wellColumn);
  const axisNotes: ParseNote[] = [];
  const axis = timeAxisOrNull(times.cells, grid.name, headerRef, axisNotes, corner === '');
  if (!axis) return null;
  // Only now, with a time header found, is the column of wells a table whose defects are errors.
  const wells = readWellRun(grid, firstRow, wellColumn);
  const columnOf = (k: number) => times.columns[axis.order[k]];
  const series = wells.map(({ row, position }) => ({
    position,
    cells: axis.times.map((_, k) => grid.get(row, columnOf(k))),
  }));
  if (!series.some((s) => s.cells.some((cell) => readMeasure(cell).value !== null))) return null; // no reading: not a table
  notes.push(...axisNotes);
  for (const { column, text } of times.skipped) {
    notes.push({
      sheet: grid.name,
      cell: cellRef(headerRow, column),
      message: `${where(grid.name, cellRef(headerRow, column))}the column '${text}' holds no times and was skipped.`,
    });
  }
  const temperature = hasTemperatureRow
    ? readTemperatures(axis.times.map((_, k) => grid.get(firstRow - 1, columnOf(k))))
    : null;
  if (hasTemperatureRow) {
    const ref = cellRef(firstRow - 1, wellColumn);
    notes.push({
      sheet: grid.name,
      cell: ref,
      message: `${where(grid.name, ref)}${temperatureNote(`the temperature row '${grid.text(firstRow - 1, wellColumn)}'`, temperature!)}`,
    });
  }
  const region: Region = {
    top: headerRow,
    left: wellColumn,
    bottom: wells[wells.length - 1].row,
    right: Math.max(...times.columns),
  };
  return {
    region,
    content: {
      kind: 'kinetic',
      plateFormat: formatHolding(wells.map((w) => w.position)),
      times_s: axis.times,
      timeSpelling: axis.spelling,
      temperature,
      ...kineticWells(series),
    },
  };
}

/**
 * The header's times, or null when a header without a name repeats a time: then the row above the
 * wells was not a time header at all.
 */
function timeAxisOrNull(
  cells: TimeCell[],
  sheet: string,
  headerRef: string,
  notes: ParseNote[],
  unnamed: boolean,
) {
  try {
    return buildTimeAxis(cells, sheet, headerRef, notes);
  } catch (error) {
    if (unnamed && error instanceof ImportError && error.code === 'duplicate_time') return null;
    throw error;
  }
}

function readWellRun(
  grid: Grid,
  firstRow: number,
  column: number,
): { row: number; position: WellPosition }[] {
  const wells: { row: number; position: WellPosition }[] = [];
  const seen = new Map<string, number>();
  for (let row = firstRow; row < grid.rowCount; row++) {
    const text = grid.text(row, column);
    const position = text === null ? null : parseWellName(text);
    if (!position) {
      if (text !== null && looksLikeWellName(text)) {
        const ref = cellRef(row, column);
        throw new ImportError(
          'invalid_well',
          `${where(grid.name, ref)}'${text}' is not a well of a 96- or 384-well plate (A1 to P24).`,
          { sheet: grid.name, cell: ref },
        );
      }
      break;
    }
    const name = wellName(position);
    const earlier = seen.get(name);
    if (earlier !== undefined) {
      const ref = cellRef(row, column);
      throw new ImportError(
        'duplicate_well',
        `${where(grid.name, ref)}well ${name} has a second row (the first is row ${earlier + 1}); each well needs one row. If a second read follows, give it its own header row of times.`,
        { sheet: grid.name, cell: ref },
      );
    }
    seen.set(name, row);
    wells.push({ row, position });
  }
  return wells;
}

function readTimeRow(
  grid: Grid,
  headerRow: number,
  wellColumn: number,
  unit: ReturnType<typeof unitFromHeader>,
) {
  const cells: TimeCell[] = [];
  const columns: number[] = [];
  const skipped: { column: number; text: string }[] = [];
  for (let column = wellColumn + 1; column < grid.columnCount; column++) {
    const cell = grid.get(headerRow, column);
    const read = readTime(cell, unit);
    const ref = cellRef(headerRow, column);
    if (read.kind === 'bad') {
      if (cells.length === 0) return { cells, columns, skipped };
      throw new ImportError('invalid_time', `${where(grid.name, ref)}${read.reason}.`, {
        sheet: grid.name,
        cell: ref,
      });
    }
    if (read.kind === 'none') {
      if (cells.length > 0 || skipped.length >= MAX_SKIPPED_HEADER_COLUMNS || !cell) break;
      skipped.push({ column, text: cellText(cell) });
      continue;
    }
    cells.push({ read, ref });
    columns.push(column);
  }
  return { cells, columns, skipped: cells.length > 0 ? skipped : [] };
}
