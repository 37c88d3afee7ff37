// (b) Kinetic tables with one column per well: a header row holding a Time column and well
// names (A1 or A01), optionally a temperature column; one row per read below it.
import { kineticWells, readTemperatures, temperatureNote, type DetectContext, type Draft } from './draft';
import { ImportError, where } from './errors';
import { cellRef, cellText, columnLetters, overlaps, type Grid, type Region } from './grid';
import { TEMPERATURE_HEADER } from './headers';
import { isTimeHeader, readTime, unitFromHeader } from './time';
import { buildTimeAxis, type TimeCell } from './time-axis';
import { formatHolding, parseWellName, wellName, type WellPosition } from './wells';

interface HeaderColumns {
  wells: { column: number; position: WellPosition }[];
  temperature: number;
  skipped: { column: number; text: string }[];
}

export function findKineticColumns(context: DetectContext): Draft[] {
  const { grid, claimed } = context;
  const drafts: Draft[] = [];
  grid.forEachText((cell, headerRow, timeColumn) => {
    if (
      cell.t !== 's' ||
      !isTimeHeader(cell.v.trim()) ||
      claimed.some((r) => overlaps(r, point(headerRow, timeColumn)))
    )
      return;
    const header = readHeader(grid, headerRow, timeColumn);
    if (header.wells.length === 0) return;
    const times = readTimeColumn(grid, headerRow, timeColumn);
    if (times.length === 0) return;
    const used = [
      timeColumn,
      header.temperature,
      ...header.wells.map((w) => w.column),
      ...header.skipped.map((s) => s.column),
    ].filter((c) => c >= 0);
    const region: Region = {
      top: headerRow,
      left: Math.min(...used),
      bottom: headerRow + times.length,
      right: Math.max(...used),
    };
    if (claimed.some((taken) => overlaps(taken, region))) return;
    claimed.push(region);
    drafts.push({
      layout: 'wells-as-columns',
      region,
      corner: false,
      content: buildContent(context, headerRow, timeColumn, header, times),
    });
  });
  return drafts;
}

const point = (row: number, column: number): Region => ({
  top: row,
  left: column,
  bottom: row,
  right: column,
});

/**
 * The header cells that belong to this table: the unbroken run of filled cells around the Time
 * cell, up to another Time cell (so two tables side by side stay apart).
 */
function headerSpan(grid: Grid, headerRow: number, timeColumn: number): [number, number] {
  const belongs = (column: number) => {
    const text = grid.get(headerRow, column) ? cellText(grid.get(headerRow, column)).trim() : '';
    return text !== '' && !isTimeHeader(text);
  };
  let left = timeColumn;
  while (left > 0 && belongs(left - 1)) left--;
  let right = timeColumn;
  while (right + 1 < grid.columnCount && belongs(right + 1)) right++;
  return [left, right];
}

function readHeader(grid: Grid, headerRow: number, timeColumn: number): HeaderColumns {
  const header: HeaderColumns = { wells: [], temperature: -1, skipped: [] };
  const seen = new Map<string, number>();
  const [left, right] = headerSpan(grid, headerRow, timeColumn);
  for (let column = left; column <= right; column++) {
    if (column === timeColumn) continue;
    const cell = grid.get(headerRow, column);
    const text = cellText(cell).trim();
    const position = cell?.t === 's' ? parseWellName(text) : null;
    if (position) {
      const name = wellName(position);
      const earlier = seen.get(name);
      if (earlier !== undefined) {
        const ref = cellRef(headerRow, column);
        throw new ImportError(
          'duplicate_well',
          `${where(grid.name, ref)}well ${name} has a second column (the first is column ${columnLetters(earlier)}); each well needs one column.`,
          { sheet: grid.name, cell: ref },
        );
      }
      seen.set(name, column);
      header.wells.push({ column, position });
    } else if (header.temperature < 0 && TEMPERATURE_HEADER.test(text)) {
      header.temperature = column;
    } else {
      header.skipped.push({ column, text });
    }
  }
  return header;
}

/** Rows below the header while the time cell holds a time; a malformed time is an error. */
function readTimeColumn(grid: Grid, headerRow: number, timeColumn: number): TimeCell[] {
  const unit = unitFromHeader(grid.text(headerRow, timeColumn) ?? '');
  const cells: TimeCell[] = [];
  for (let row = headerRow + 1; row < grid.rowCount; row++) {
    const read = readTime(grid.get(row, timeColumn), unit);
    const ref = cellRef(row, timeColumn);
    if (read.kind === 'none') break;
    if (read.kind === 'bad')
      throw new ImportError('invalid_time', `${where(grid.name, ref)}${read.reason}.`, {
        sheet: grid.name,
        cell: ref,
      });
    cells.push({ read, ref });
  }
  return cells;
}

function buildContent(
  context: DetectContext,
  headerRow: number,
  timeColumn: number,
  header: HeaderColumns,
  times: TimeCell[],
): Draft['content'] {
  const { grid, notes } = context;
  const headerRef = cellRef(headerRow, timeColumn);
  const axis = buildTimeAxis(times, grid.name, headerRef, notes);
  const rowOf = (k: number) => headerRow + 1 + axis.order[k];
  const series = header.wells.map(({ column, position }) => ({
    position,
    cells: axis.times.map((_, k) => grid.get(rowOf(k), column)),
  }));
  let temperature = null;
  if (header.temperature >= 0) {
    temperature = readTemperatures(axis.times.map((_, k) => grid.get(rowOf(k), header.temperature)));
    notes.push({
      sheet: grid.name,
      cell: cellRef(headerRow, header.temperature),
      message: `${where(grid.name, cellRef(headerRow, header.temperature))}${temperatureNote(`the temperature column '${grid.text(headerRow, header.temperature)}'`, temperature)}`,
    });
  }
  for (const { column, text } of header.skipped) {
    notes.push({
      sheet: grid.name,
      cell: cellRef(headerRow, column),
      message: `${where(grid.name, cellRef(headerRow, column))}the column '${text}' is not a well and was skipped.`,
    });
  }
  return {
    kind: 'kinetic',
    plateFormat: formatHolding(header.wells.map((w) => w.position)),
    times_s: axis.times,
    timeSpelling: axis.spelling,
    temperature,
    ...kineticWells(series),
  };
}
