// (c) Long tables: one row per well (or per well and time) under a header row naming a Well
// column and one or more value columns ("Value", "Absorbance 405 nm", "OD600", "RFU", ...),
// optionally a Time column (the table is then a time course) and a temperature column.
import type { DetectContext, Draft, EndpointContent } from './draft';
import { ImportError, where } from './errors';
import { cellRef, cellText, overlaps, type Region } from './grid';
import { BARE_VALUE_HEADER, TEMPERATURE_HEADER, VALUE_HEADER, WELL_HEADER } from './headers';
import { longKineticContent, readIndex, type LongRow } from './long-kinetic';
import { readMeasure } from './measure';
import { isTimeHeader, readTime, unitFromHeader } from './time';
import type { TimeCell } from './time-axis';
import { formatHolding, looksLikeWellName, parseWellName, plateWells, wellName } from './wells';

export function findLongTables(context: DetectContext): Draft[] {
  const { grid, claimed } = context;
  const drafts: Draft[] = [];
  grid.forEachText((cell, headerRow, wellColumn) => {
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
    const reads =
      timeColumn >= 0 ? readIndex(context, rows, cellRef(headerRow, timeColumn), temperatureColumn) : null;
    for (const valueColumn of valueColumns) {
      const content = reads
        ? longKineticContent(context, rows, reads, valueColumn)
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

function readRows(
  { grid }: DetectContext,
  headerRow: number,
  wellColumn: number,
  timeColumn: number,
): LongRow[] {
  const rows: LongRow[] = [];
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
    const entry: LongRow = { row, position };
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
  rows: LongRow[],
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
