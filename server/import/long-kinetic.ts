// Long tables with a Time column: many rows share one time (one row per well and read), so the
// times are resolved once per table and each row is mapped to its read.
import {
  kineticWells,
  readTemperatures,
  temperatureNote,
  type DetectContext,
  type KineticContent,
} from './draft';
import { ImportError, where } from './errors';
import { cellRef, type Cell } from './grid';
import { resolveTimes, type TimeCell } from './time-axis';
import { formatHolding, wellName, type WellPosition } from './wells';

export interface LongRow {
  row: number;
  position: WellPosition;
  time?: TimeCell;
}

export interface ReadIndex {
  times: number[]; // distinct times, ascending (s)
  readOfRow: number[]; // for each row of the table, the index of its read in `times`
  spelling: string;
  temperature: (number | null)[] | null;
}

/** The reads of a long table, its notes (unit assumed, temperature kept apart) written once. */
export function readIndex(
  context: DetectContext,
  rows: LongRow[],
  timeHeader: string,
  temperatureColumn: number,
): ReadIndex {
  const { grid, notes } = context;
  const { seconds, spelling } = resolveTimes(
    rows.map((r) => r.time!),
    grid.name,
    timeHeader,
    notes,
  );
  const times = [...new Set(seconds)].sort((a, b) => a - b);
  const indexOfTime = new Map(times.map((t, i) => [t, i]));
  const readOfRow = seconds.map((s) => indexOfTime.get(s)!);
  let temperature: ReadIndex['temperature'] = null;
  if (temperatureColumn >= 0) {
    const cells: (Cell | undefined)[] = new Array(times.length).fill(undefined);
    rows.forEach(({ row }, i) => (cells[readOfRow[i]] ??= grid.get(row, temperatureColumn)));
    temperature = readTemperatures(cells);
    const ref = cellRef(rows[0].row - 1, temperatureColumn);
    const what = `the temperature column '${grid.text(rows[0].row - 1, temperatureColumn)}'`;
    notes.push({
      sheet: grid.name,
      cell: ref,
      message: `${where(grid.name, ref)}${temperatureNote(what, temperature)}`,
    });
  }
  return { times, readOfRow, spelling, temperature };
}

/** One value column of a long table as time courses; a well twice at one time is an error. */
export function longKineticContent(
  { grid }: DetectContext,
  rows: LongRow[],
  reads: ReadIndex,
  valueColumn: number,
): KineticContent {
  const byWell = new Map<string, { position: WellPosition; cells: (Cell | undefined)[] }>();
  const seen = new Map<string, number>();
  rows.forEach(({ row, position }, i) => {
    const name = wellName(position);
    const read = reads.readOfRow[i];
    const earlier = seen.get(`${name}@${read}`);
    if (earlier !== undefined) {
      const cell = cellRef(row, valueColumn);
      throw new ImportError(
        'duplicate_time',
        `${where(grid.name, cell)}well ${name} has two values at ${reads.times[read]} s (rows ${earlier + 1} and ${row + 1}).`,
        { sheet: grid.name, cell },
      );
    }
    seen.set(`${name}@${read}`, row);
    let entry = byWell.get(name);
    if (!entry) {
      entry = { position, cells: new Array<Cell | undefined>(reads.times.length).fill(undefined) };
      byWell.set(name, entry);
    }
    entry.cells[read] = grid.get(row, valueColumn);
  });
  return {
    kind: 'kinetic',
    plateFormat: formatHolding(rows.map((r) => r.position)),
    times_s: reads.times,
    timeSpelling: reads.spelling,
    temperature: reads.temperature,
    ...kineticWells([...byWell.values()]),
  };
}
