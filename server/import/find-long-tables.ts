// (c) Long tables: one row per well (or per well and time) under a header row naming a Well
// column and one or more value columns ("Value", "Absorbance 405 nm", "OD600", "RFU", ...),
// optionally a Time column (the table is then a time course) and a temperature column.
import {
  kineticWells,
  readTemperatures,
  temperatureNote,
  type DetectContext,
  type Draft,
  type EndpointContent,
} from './draft';
import { ImportError, where } from './errors';
import { cellRef, cellText, overlaps, type Cell, type Region } from './grid';
import { readMeasure } from './measure';
import { isTimeHeader, readTime, unitFromHeader } from './time';
import { resolveTimes, type TimeCell } from './time-axis';
import {
  formatHolding,
  looksLikeWellName,
  parseWellName,
  plateWells,
  wellName,
  type WellPosition,
} from './wells';

export const WELL_HEADER = /^well(?:\s*(?:id|name|position|pos\.?|no\.?))?$/i;
const VALUE_HEADER =
  /^(?:values?|abs(?:orbance)?|od|optical density|fluorescence|fluo|rfu|rlu|signal|results?|raw(?: data)?|measurements?|reading|intensity|luminescence|counts?)(?![a-z])/i;
const BARE_VALUE_HEADER = /^(?:values?|results?|measurements?|reading|raw(?: data)?)$/i;
export const TEMPERATURE_HEADER = /^(?:temp(?:erature)?\b|t\s*°|°c\b)|\btemperature\b/i;

interface Row {
  row: number;
  position: WellPosition;
  time?: TimeCell;
}

export function findLongTables(context: DetectContext): Draft[] {
  const { grid, claimed } = context;
  const drafts: Draft[] = [];
  grid.forEach((cell, headerRow, wellColumn) => {
    if (cell.t !== 's' || !WELL_HEADER.test(cell.v.trim())) return;
    const header = (grid.rows[headerRow] ?? []).map((c) => (c?.t === 's' ? c.v.trim() : ''));
    const valueColumns = header.flatMap((text, c) =>
      c !== wellColumn && VALUE_HEADER.test(text) ? [c] : [],
    );
    if (valueColumns.length === 0) return;
    const timeColumn = header.findIndex((text, c) => c !== wellColumn && isTimeHeader(text));
    const temperatureColumn = header.findIndex(
      (text, c) => c !== wellColumn && TEMPERATURE_HEADER.test(text),
    );
    const rows = readRows(context, headerRow, wellColumn, timeColumn);
    if (rows.length === 0) return;
    const used = [wellColumn, ...valueColumns, timeColumn, temperatureColumn].filter((c) => c >= 0);
    const region: Region = {
      top: headerRow,
      left: Math.min(...used),
      bottom: rows[rows.length - 1].row,
      right: Math.max(...used),
    };
    if (claimed.some((taken) => overlaps(taken, region))) return;
    claimed.push(region);
    for (const valueColumn of valueColumns) {
      const content =
        timeColumn >= 0
          ? kineticContent(context, rows, valueColumn, temperatureColumn, cellRef(headerRow, timeColumn))
          : endpointContent(context, rows, valueColumn, wellColumn);
      const headerText = header[valueColumn];
      drafts.push({
        layout: 'long-table',
        region,
        corner: false,
        headerLabel: BARE_VALUE_HEADER.test(headerText) ? undefined : headerText,
        content,
      });
    }
  });
  return drafts;
}

function readRows({ grid }: DetectContext, headerRow: number, wellColumn: number, timeColumn: number): Row[] {
  const rows: Row[] = [];
  const unit = timeColumn >= 0 ? unitFromHeader(grid.text(headerRow, timeColumn) ?? '') : null;
  for (let row = headerRow + 1; row < grid.rowCount; row++) {
    const text = grid.text(row, wellColumn);
    const position = text === null ? null : parseWellName(text);
    if (!position) {
      if (text !== null && looksLikeWellName(text)) {
        throw new ImportError(
          'invalid_well',
          `${where(grid.name, cellRef(row, wellColumn))}'${text}' is not a well of a 96- or 384-well plate (A1 to P24).`,
          {
            sheet: grid.name,
            cell: cellRef(row, wellColumn),
          },
        );
      }
      break;
    }
    const entry: Row = { row, position };
    if (timeColumn >= 0) entry.time = readTimeCell(grid, row, timeColumn, unit);
    rows.push(entry);
  }
  return rows;
}

function readTimeCell(
  grid: DetectContext['grid'],
  row: number,
  column: number,
  unit: ReturnType<typeof unitFromHeader>,
): TimeCell {
  const ref = cellRef(row, column);
  const read = readTime(grid.get(row, column), unit);
  if (read.kind === 'time' || read.kind === 'number') return { read, ref };
  const reason =
    read.kind === 'bad'
      ? read.reason
      : `the time is missing or unreadable ('${cellText(grid.get(row, column))}')`;
  throw new ImportError('invalid_time', `${where(grid.name, ref)}${reason}.`, {
    sheet: grid.name,
    cell: ref,
  });
}

function endpointContent(
  { grid }: DetectContext,
  rows: Row[],
  valueColumn: number,
  wellColumn: number,
): EndpointContent {
  const plateFormat = formatHolding(rows.map((r) => r.position));
  const content: EndpointContent = { kind: 'endpoint', plateFormat, wells: {}, flags: {}, raw: {} };
  const seen = new Map<string, number>();
  for (const { row, position } of rows) {
    const name = wellName(position);
    const earlier = seen.get(name);
    if (earlier !== undefined) duplicateWell(grid.name, name, earlier, row, wellColumn);
    seen.set(name, row);
  }
  // Canonical order: the wells this table lists, A1 first.
  for (const name of plateWells(plateFormat)) {
    const row = seen.get(name);
    if (row === undefined) continue;
    const measure = readMeasure(grid.get(row, valueColumn));
    content.wells[name] = measure.value;
    if (measure.value === null) {
      content.flags[name] = measure.flag;
      content.raw[name] = measure.raw;
    }
  }
  return content;
}

function duplicateWell(sheet: string, name: string, firstRow: number, row: number, column: number): never {
  const cell = cellRef(row, column);
  throw new ImportError(
    'duplicate_well',
    `${where(sheet, cell)}well ${name} appears a second time (first on row ${firstRow + 1}) in a table without a time column; each well needs one value.`,
    { sheet, cell },
  );
}

function kineticContent(
  context: DetectContext,
  rows: Row[],
  valueColumn: number,
  temperatureColumn: number,
  timeHeader: string,
): Draft['content'] {
  const { grid, notes } = context;
  // Many rows share one time in a long table: resolve every cell, then index the distinct times.
  const { seconds, spelling } = resolveTimes(
    rows.map((r) => r.time!),
    grid.name,
    timeHeader,
    notes,
  );
  const times = [...new Set(seconds)].sort((a, b) => a - b);
  const indexOfTime = new Map(times.map((t, i) => [t, i]));
  const byWell = new Map<string, { position: WellPosition; cells: (Cell | undefined)[] }>();
  const temperatureCells: (Cell | undefined)[] = new Array(times.length).fill(undefined);
  const seen = new Map<string, number>();
  rows.forEach(({ row, position }, i) => {
    const name = wellName(position);
    const index = indexOfTime.get(seconds[i])!;
    const earlier = seen.get(`${name}@${index}`);
    if (earlier !== undefined) {
      const cell = cellRef(row, valueColumn);
      throw new ImportError(
        'duplicate_time',
        `${where(grid.name, cell)}well ${name} has two values at ${times[index]} s (rows ${earlier + 1} and ${row + 1}).`,
        { sheet: grid.name, cell },
      );
    }
    seen.set(`${name}@${index}`, row);
    let entry = byWell.get(name);
    if (!entry) {
      entry = { position, cells: new Array<Cell | undefined>(times.length).fill(undefined) };
      byWell.set(name, entry);
    }
    entry.cells[index] = grid.get(row, valueColumn);
    if (temperatureColumn >= 0) temperatureCells[index] ??= grid.get(row, temperatureColumn);
  });
  const temperature = temperatureColumn >= 0 ? readTemperatures(temperatureCells) : null;
  if (temperature) {
    const ref = cellRef(rows[0].row - 1, temperatureColumn);
    notes.push({
      sheet: grid.name,
      cell: ref,
      message: `${where(grid.name, ref)}${temperatureNote(`the temperature column '${grid.text(rows[0].row - 1, temperatureColumn)}'`, temperature)}`,
    });
  }
  return {
    kind: 'kinetic',
    plateFormat: formatHolding(rows.map((r) => r.position)),
    times_s: times,
    timeSpelling: spelling,
    temperature,
    ...kineticWells([...byWell.values()]),
  };
}
