// Well names for 96- and 384-well plates (A1..H12 and A1..P24).
// A small local helper: shared/plate/ is being written in parallel and will replace it later.

export type PlateFormat = 96 | 384;

export const ROW_LETTERS = 'ABCDEFGHIJKLMNOP';

/** Rows and columns of each plate format (SBS/ANSI layouts: 8 × 12 and 16 × 24; common practice). */
export const PLATE_SHAPE: Record<PlateFormat, { rows: number; columns: number }> = {
  96: { rows: 8, columns: 12 },
  384: { rows: 16, columns: 24 },
};

export interface WellPosition {
  row: number; // 0-based: A = 0
  column: number; // 0-based: 1 = 0
}

const WELL_PATTERN = /^([A-Pa-p])0*([1-9]\d?)$/;
/** Something a person meant as a well name, even if it is out of range ('Q1', 'A25'). */
const WELL_LIKE_PATTERN = /^[A-Za-z]0*\d{1,3}$/;

/** 'A1', 'A01', 'a1' -> { row: 0, column: 0 }; anything else (or out of A1..P24) -> null. */
export function parseWellName(text: string): WellPosition | null {
  const match = WELL_PATTERN.exec(text.trim());
  if (!match) return null;
  const column = Number(match[2]);
  if (column > 24) return null;
  return { row: match[1].toUpperCase().charCodeAt(0) - 65, column: column - 1 };
}

export function looksLikeWellName(text: string): boolean {
  return WELL_LIKE_PATTERN.test(text.trim());
}

export function wellName(position: WellPosition): string {
  return `${ROW_LETTERS[position.row]}${position.column + 1}`;
}

/** All wells of a plate in reading order: A1, A2, ..., A12, B1, ... */
export function plateWells(format: PlateFormat): string[] {
  const { rows, columns } = PLATE_SHAPE[format];
  const names: string[] = [];
  for (let row = 0; row < rows; row++) {
    for (let column = 0; column < columns; column++) names.push(wellName({ row, column }));
  }
  return names;
}

/** The smallest plate format that holds every position. */
export function formatHolding(positions: Iterable<WellPosition>): PlateFormat {
  for (const p of positions) {
    if (p.row >= PLATE_SHAPE[96].rows || p.column >= PLATE_SHAPE[96].columns) return 384;
  }
  return 96;
}

/** Reading-order rank of a well, to list wells canonically. */
export function wellRank(position: WellPosition): number {
  return position.row * 24 + position.column;
}
