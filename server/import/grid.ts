// A sheet as the detectors see it: a sparse grid of typed cells, the same for xlsx and text files.

/** One non-empty cell. Dates and times are kept as spreadsheet serial days (1899-12-30 = day 0). */
export type Cell =
  | { t: 'n'; v: number }
  | { t: 's'; v: string }
  | { t: 'd'; days: number }
  | { t: 'b'; v: boolean }
  | { t: 'e'; v: string } // a spreadsheet error value such as '#DIV/0!'
  | { t: 'f'; formula: string } // a formula saved without its result
  | { t: 'm'; master: string }; // covered by a merged range whose value sits in `master`

export class Grid {
  readonly name: string;
  readonly index: number;
  /** rows[r][c], 0-based; holes are empty cells. */
  readonly rows: (Cell | undefined)[][] = [];
  columnCount = 0;
  /**
   * Text files only: set when the file does not end with a line break, so its last row may have
   * been cut short (row index and how many fields it has).
   */
  openLastRow: { row: number; fields: number } | null = null;

  constructor(name: string, index: number) {
    this.name = name;
    this.index = index;
  }

  get rowCount(): number {
    return this.rows.length;
  }

  /** Where the text cells are, row by row: detectors start only from text (headers, letters, well names). */
  private readonly texts: [number, number][] = [];
  private textsInOrder = true;

  set(row: number, column: number, cell: Cell): void {
    if (cell.t === 's') {
      const last = this.texts[this.texts.length - 1];
      if (last && (row < last[0] || (row === last[0] && column < last[1]))) this.textsInOrder = false;
      this.texts.push([row, column]);
    }
    let cells = this.rows[row];
    if (!cells) {
      cells = [];
      this.rows[row] = cells;
    }
    cells[column] = cell;
    if (column + 1 > this.columnCount) this.columnCount = column + 1;
  }

  get(row: number, column: number): Cell | undefined {
    if (row < 0 || column < 0) return undefined;
    return this.rows[row]?.[column];
  }

  /** Trimmed text of a text cell, or null for anything else (numbers included). */
  text(row: number, column: number): string | null {
    const cell = this.get(row, column);
    if (cell?.t !== 's') return null;
    const text = cell.v.trim();
    return text === '' ? null : text;
  }

  /** Calls fn for every text cell, row by row, left to right (numbers skipped: a sheet is mostly numbers). */
  forEachText(fn: (cell: Cell, row: number, column: number) => void): void {
    if (!this.textsInOrder) {
      this.texts.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
      this.textsInOrder = true;
    }
    for (const [row, column] of this.texts) fn(this.rows[row][column]!, row, column);
  }
}

/** 0-based column -> spreadsheet letters: 0 -> 'A', 25 -> 'Z', 26 -> 'AA'. */
export function columnLetters(column: number): string {
  let n = column + 1;
  let letters = '';
  while (n > 0) {
    const rest = (n - 1) % 26;
    letters = String.fromCharCode(65 + rest) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}

/** 0-based row and column -> 'B14'. */
export function cellRef(row: number, column: number): string {
  return `${columnLetters(column)}${row + 1}`;
}

/** 'B14' -> { row: 13, column: 1 }; null for anything else. */
export function parseRef(ref: string): { row: number; column: number } | null {
  const match = /^([A-Z]{1,3})(\d+)$/.exec(ref);
  if (!match) return null;
  const column = [...match[1]].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0) - 1;
  return { row: Number(match[2]) - 1, column };
}

/** What a cell holds, as a person would read it (for messages and raw values). */
export function cellText(cell: Cell | undefined): string {
  if (!cell) return '';
  switch (cell.t) {
    case 'n':
      return String(cell.v);
    case 's':
      return cell.v;
    case 'd':
      return `${cell.days} (a date or time value)`;
    case 'b':
      return cell.v ? 'TRUE' : 'FALSE';
    case 'e':
      return cell.v;
    case 'f':
      return `=${cell.formula}`;
    case 'm':
      return `(merged with ${cell.master})`;
  }
}

/** A rectangle of cells, 0-based and inclusive. */
export interface Region {
  top: number;
  left: number;
  bottom: number;
  right: number;
}

export function inRegion(region: Region, row: number, column: number): boolean {
  return row >= region.top && row <= region.bottom && column >= region.left && column <= region.right;
}

export function overlaps(a: Region, b: Region): boolean {
  return a.left <= b.right && b.left <= a.right && a.top <= b.bottom && b.top <= a.bottom;
}
