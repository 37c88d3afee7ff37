// The time axis of a kinetic table: every time cell read, bare numbers given a unit, the reads
// put in time order. Two reads at the same time cannot both be right: that is an error.
import { ImportError, where } from './errors';
import { resolveBareTimes, type TimeRead } from './time';
import type { ParseNote } from './types';

export interface TimeCell {
  read: Extract<TimeRead, { kind: 'time' } | { kind: 'number' }>;
  ref: string;
}

export interface ResolvedTimes {
  seconds: number[]; // one per cell, in file order
  spelling: string;
}

/** Seconds for every time cell; bare numbers get one unit for the whole column (noted). */
export function resolveTimes(
  cells: TimeCell[],
  sheet: string,
  header: string,
  notes: ParseNote[],
): ResolvedTimes {
  const seconds: number[] = new Array(cells.length);
  const spellings = new Set<string>();
  const bare = cells.flatMap((cell, i) =>
    cell.read.kind === 'number' ? [{ i, value: cell.read.value }] : [],
  );
  if (bare.length > 0) {
    const resolved = resolveBareTimes(bare.map((b) => b.value));
    bare.forEach((b, k) => (seconds[b.i] = resolved.seconds[k]));
    spellings.add(resolved.spelling);
    notes.push({
      sheet,
      cell: header,
      message: `${where(sheet, header)}the times have no unit; they were read as ${resolved.assumed}.`,
    });
  }
  cells.forEach((cell, i) => {
    if (cell.read.kind === 'time') {
      seconds[i] = cell.read.seconds;
      spellings.add(cell.read.spelling);
    }
  });
  return { seconds, spelling: spellings.size === 1 ? [...spellings][0] : 'mixed' };
}

export interface TimeAxis {
  times: number[]; // seconds, ascending
  order: number[]; // order[k] = file index of the k-th read in time order
  spelling: string;
}

/** One read per time cell (tables with wells as columns or rows). */
export function buildTimeAxis(
  cells: TimeCell[],
  sheet: string,
  header: string,
  notes: ParseNote[],
): TimeAxis {
  const { seconds, spelling } = resolveTimes(cells, sheet, header, notes);
  const order = cells.map((_, i) => i).sort((a, b) => seconds[a] - seconds[b] || a - b);
  for (let k = 1; k < order.length; k++) {
    if (seconds[order[k]] === seconds[order[k - 1]]) {
      const [first, second] = [order[k - 1], order[k]].sort((a, b) => a - b).map((i) => cells[i].ref);
      throw new ImportError(
        'duplicate_time',
        `${where(sheet, second)}the time ${seconds[order[k]]} s appears twice (also in cell ${first}); each read needs its own time.`,
        { sheet, cell: second },
      );
    }
  }
  if (order.some((fileIndex, k) => fileIndex !== k)) {
    notes.push({
      sheet,
      cell: header,
      message: `${where(sheet, header)}the reads were not in time order; they were sorted by time.`,
    });
  }
  return { times: order.map((i) => seconds[i]), order, spelling };
}
