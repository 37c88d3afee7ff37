/**
 * Plate geometry: 96-well (8 rows × 12 columns) and 384-well (16 × 24) formats (ANSI/SLAS 4-2004
 * footprint layouts [memory]). Rows are letters A–H or A–P, columns 1–12 or 1–24.
 *
 * Canonical well names have no leading zero ('A1', 'P24'); parsing also accepts 'A01' and lower case
 * ('a01'), and surrounding spaces. Row and column indices are 0-based. The default iteration order is
 * row-major (A1, A2, …, A12, B1, …), the order reader files list wells in; column-major is offered too.
 */
import { fail, ok, type PlateResult } from './result';

export type PlateFormat = 96 | 384;
export type WellOrder = 'row-major' | 'column-major';

export interface Well {
  /** Canonical name, e.g. 'B7'. */
  name: string;
  /** 0-based row index (A = 0). */
  row: number;
  /** 0-based column index (column 1 = 0). */
  column: number;
}

const DIMENSIONS: Record<PlateFormat, { rows: number; columns: number }> = {
  96: { rows: 8, columns: 12 },
  384: { rows: 16, columns: 24 },
};

const ROW_LETTERS = 'ABCDEFGHIJKLMNOP';

export function isPlateFormat(v: unknown): v is PlateFormat {
  return v === 96 || v === 384;
}

/** Rows and columns of a format. */
export function plateDimensions(format: PlateFormat): { rows: number; columns: number } {
  return { ...DIMENSIONS[format] };
}

function formatError(format: unknown): PlateResult<never> {
  return fail('invalid_input', `Plate format must be 96 or 384 wells (got ${String(format)}).`);
}

/** Canonical name of the well at 0-based (row, column). */
export function wellName(format: PlateFormat, row: number, column: number): PlateResult<string> {
  if (!isPlateFormat(format)) return formatError(format);
  const { rows, columns } = DIMENSIONS[format];
  if (
    !Number.isInteger(row) ||
    !Number.isInteger(column) ||
    row < 0 ||
    column < 0 ||
    row >= rows ||
    column >= columns
  ) {
    return fail('invalid_well', `No well at row ${row + 1}, column ${column + 1} on a ${format}-well plate.`);
  }
  return ok(`${ROW_LETTERS[row]}${column + 1}`);
}

const WELL_PATTERN = /^([A-Za-z])(\d{1,2})$/;

/** Parses 'A1', 'A01', 'a01' (spaces around are ignored) into a well of the given format. */
export function parseWell(text: unknown, format: PlateFormat): PlateResult<Well> {
  if (!isPlateFormat(format)) return formatError(format);
  if (typeof text !== 'string')
    return fail('invalid_well', `A well name must be text such as 'A1' (got ${String(text)}).`);
  const match = WELL_PATTERN.exec(text.trim());
  const { rows, columns } = DIMENSIONS[format];
  const lastName = `${ROW_LETTERS[rows - 1]}${columns}`;
  if (!match) {
    return fail(
      'invalid_well',
      `'${text}' is not a well name: use a row letter and a column number, e.g. 'A1' or 'A01'.`,
    );
  }
  const row = ROW_LETTERS.indexOf(match[1].toUpperCase());
  const column = Number(match[2]) - 1;
  if (row < 0 || row >= rows || column < 0 || column >= columns) {
    return fail('invalid_well', `'${text}' is not on a ${format}-well plate (A1 to ${lastName}).`);
  }
  return ok({ name: `${ROW_LETTERS[row]}${column + 1}`, row, column });
}

/** Position of a well in the given iteration order (0 … format − 1). */
export function wellIndex(well: Well, format: PlateFormat, order: WellOrder = 'row-major'): number {
  const { rows, columns } = DIMENSIONS[format];
  return order === 'row-major' ? well.row * columns + well.column : well.column * rows + well.row;
}

/** All wells of a format in the given order. */
export function listWells(format: PlateFormat, order: WellOrder = 'row-major'): Well[] {
  if (!isPlateFormat(format)) return [];
  const { rows, columns } = DIMENSIONS[format];
  const wells: Well[] = [];
  const outer = order === 'row-major' ? rows : columns;
  const inner = order === 'row-major' ? columns : rows;
  for (let a = 0; a < outer; a++) {
    for (let b = 0; b < inner; b++) {
      const row = order === 'row-major' ? a : b;
      const column = order === 'row-major' ? b : a;
      wells.push({ name: `${ROW_LETTERS[row]}${column + 1}`, row, column });
    }
  }
  return wells;
}

/** Wells of the outer ring (first or last row or column): the ones most exposed to evaporation. */
export function isEdgeWell(well: Well, format: PlateFormat): boolean {
  const { rows, columns } = DIMENSIONS[format];
  return well.row === 0 || well.column === 0 || well.row === rows - 1 || well.column === columns - 1;
}
