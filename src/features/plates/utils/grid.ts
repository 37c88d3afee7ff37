// Plate coordinates for the editor: cells by 0-based row and column, rectangles between two cells.
import { plateDimensions, type PlateFormat } from '@shared/plate/geometry';

export type Cell = { row: number; column: number };

const ROW_LETTERS = 'ABCDEFGHIJKLMNOP';

export const rowLetter = (row: number) => ROW_LETTERS[row] ?? '?';
export const cellName = (cell: Cell) => `${rowLetter(cell.row)}${cell.column + 1}`;

/** 'B7' → { row: 1, column: 6 }; null for anything that is not a well of the format. */
export function cellOf(name: string, format: PlateFormat): Cell | null {
  const m = /^([A-Pa-p])(\d{1,2})$/.exec(name.trim());
  if (!m) return null;
  const { rows, columns } = plateDimensions(format);
  const row = ROW_LETTERS.indexOf(m[1].toUpperCase());
  const column = Number(m[2]) - 1;
  return row < rows && column >= 0 && column < columns ? { row, column } : null;
}

export function clampCell(cell: Cell, format: PlateFormat): Cell {
  const { rows, columns } = plateDimensions(format);
  return {
    row: Math.min(rows - 1, Math.max(0, cell.row)),
    column: Math.min(columns - 1, Math.max(0, cell.column)),
  };
}

/** Every well in the rectangle spanned by two cells (either corner first), row by row. */
export function rectNames(a: Cell, b: Cell): string[] {
  const names: string[] = [];
  for (let r = Math.min(a.row, b.row); r <= Math.max(a.row, b.row); r++) {
    for (let c = Math.min(a.column, b.column); c <= Math.max(a.column, b.column); c++) {
      names.push(cellName({ row: r, column: c }));
    }
  }
  return names;
}

export function allNames(format: PlateFormat): string[] {
  const { rows, columns } = plateDimensions(format);
  return rectNames({ row: 0, column: 0 }, { row: rows - 1, column: columns - 1 });
}

/** The smallest rectangle holding the named wells (null for none). */
export function boundsOf(names: Iterable<string>, format: PlateFormat): { top: Cell; bottom: Cell } | null {
  let top: Cell | null = null;
  let bottom: Cell | null = null;
  for (const name of names) {
    const c = cellOf(name, format);
    if (!c) continue;
    top = top ? { row: Math.min(top.row, c.row), column: Math.min(top.column, c.column) } : c;
    bottom = bottom ? { row: Math.max(bottom.row, c.row), column: Math.max(bottom.column, c.column) } : c;
  }
  return top && bottom ? { top, bottom } : null;
}
