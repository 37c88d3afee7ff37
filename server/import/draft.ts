// What a detector hands back: where a block sits and what it holds, before its label is found.
import { readMeasure, worseFlag } from './measure';
import type { Cell, Grid, Region } from './grid';
import type { BlockLayout, ParseNote, PlateFormat, PointFlag, WellFlag } from './types';
import { wellName, wellRank, type WellPosition } from './wells';

export interface EndpointContent {
  kind: 'endpoint';
  plateFormat: PlateFormat;
  wells: Record<string, number | null>;
  flags: Record<string, WellFlag>;
  raw: Record<string, string>;
}

export interface KineticContent {
  kind: 'kinetic';
  plateFormat: PlateFormat;
  times_s: number[];
  wells: Record<string, (number | null)[]>;
  flags: Record<string, WellFlag>;
  points: Record<string, PointFlag[]>;
  timeSpelling: string;
  temperature: (number | null)[] | null;
}

export interface Draft {
  layout: BlockLayout;
  region: Region;
  /** The block's top-left cell is a free corner that may hold its label (plate grids). */
  corner: boolean;
  /** A long table's value-column header ("Absorbance 405 nm"), a label of last resort or first choice. */
  headerLabel?: string;
  content: EndpointContent | KineticContent;
}

/** What every detector works with: the sheet, the regions already taken, and the notes so far. */
export interface DetectContext {
  grid: Grid;
  claimed: Region[];
  notes: ParseNote[];
}

/** Reads each well's cells (already in time order) into values, flags and missing points. */
export function kineticWells(
  series: { position: WellPosition; cells: (Cell | undefined)[] }[],
): Pick<KineticContent, 'wells' | 'flags' | 'points'> {
  const wells: KineticContent['wells'] = {};
  const flags: KineticContent['flags'] = {};
  const points: KineticContent['points'] = {};
  const sorted = [...series].sort((a, b) => wellRank(a.position) - wellRank(b.position));
  for (const { position, cells } of sorted) {
    const name = wellName(position);
    const missing: PointFlag[] = [];
    wells[name] = cells.map((cell, index) => {
      if (cell?.t === 'n' && Number.isFinite(cell.v)) return cell.v; // the common case, without an allocation
      const measure = readMeasure(cell);
      if (measure.value !== null) return measure.value;
      missing.push({ index, flag: measure.flag, raw: measure.raw });
      flags[name] = worseFlag(flags[name], measure.flag);
      return null;
    });
    if (missing.length > 0) points[name] = missing;
  }
  return { wells, flags, points };
}

/** A temperature column or row read as numbers (°C as written); unreadable cells are null. */
export function readTemperatures(cells: (Cell | undefined)[]): (number | null)[] {
  return cells.map((cell) => readMeasure(cell).value);
}

/** "the temperature column 'Temp [°C]' (36.9 to 37.1) was kept apart ..." — the note every kinetic layout writes. */
export function temperatureNote(what: string, values: (number | null)[]): string {
  const known = values.filter((v): v is number => v !== null);
  const low = known.reduce((a, b) => Math.min(a, b), Infinity);
  const high = known.reduce((a, b) => Math.max(a, b), -Infinity);
  const range = known.length > 0 ? ` (${low} to ${high})` : '';
  return `${what}${range} is not a well: it was kept apart as the temperature of each read.`;
}
