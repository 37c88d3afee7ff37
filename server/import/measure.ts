// Reading one cell as a measured value. A value that cannot be trusted is null with a reason,
// never zero: a zero would look like a real reading of an inactive well.
import { cellText, type Cell } from './grid';
import type { WellFlag } from './types';

export type Measure = { value: number } | { value: null; flag: WellFlag; raw: string };

/**
 * A decimal number written with '.' or ',' as the decimal mark and no thousands separators,
 * optionally in scientific notation: "0.123", "0,123", "-1.5e-3", ".5", "1E+2".
 */
const NUMBER_TEXT = /^[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?$/;

/** Readers write values above their range as OVER, Overflow, Sat, ">3.5", "****" (common practice, no source). */
const SATURATED_TEXT =
  /^(?:over(?:flow)?|ovrflw|ovfl|sat(?:urated)?|[>≥]\s*[+-]?[\d.,]+(?:[eE][+-]?\d+)?|\*{2,}|#+)$/i;

/** Ways an unmeasured well is written. */
const EMPTY_TEXT = /^(?:-+|–|—|n\/?a|n\.a\.|none|empty)$/i;

/** Parses a number written as text; null when the text is not a plain number (or is not finite). */
export function parseNumberText(text: string): number | null {
  const trimmed = text.trim().replace(/\u2212/g, '-');
  if (!NUMBER_TEXT.test(trimmed)) return null;
  const value = Number(trimmed.replace(',', '.'));
  return Number.isFinite(value) ? value : null;
}

export function readMeasure(cell: Cell | undefined): Measure {
  if (!cell) return { value: null, flag: 'empty', raw: '' };
  switch (cell.t) {
    case 'n':
      return Number.isFinite(cell.v)
        ? { value: cell.v }
        : { value: null, flag: 'invalid', raw: String(cell.v) };
    case 's':
      return readMeasureText(cell.v);
    default:
      // Dates, booleans, spreadsheet errors, formulas without a saved result, merged-over cells.
      return { value: null, flag: 'invalid', raw: cellText(cell) };
  }
}

function readMeasureText(text: string): Measure {
  const trimmed = text.trim();
  if (trimmed === '' || EMPTY_TEXT.test(trimmed)) return { value: null, flag: 'empty', raw: text };
  const value = parseNumberText(trimmed);
  if (value !== null) return { value };
  if (SATURATED_TEXT.test(trimmed)) return { value: null, flag: 'saturated', raw: text };
  return { value: null, flag: 'invalid', raw: text };
}

/** When one well has several missing points, its flag is the most telling one. */
const FLAG_RANK: Record<WellFlag, number> = { saturated: 3, invalid: 2, empty: 1 };

export function worseFlag(a: WellFlag | undefined, b: WellFlag): WellFlag {
  return a && FLAG_RANK[a] >= FLAG_RANK[b] ? a : b;
}

/** An integer written as a number or as text ("7", "07"), for column headers 1..24. */
export function readInteger(cell: Cell | undefined): number | null {
  if (!cell) return null;
  if (cell.t === 'n') return Number.isInteger(cell.v) ? cell.v : null;
  if (cell.t === 's' && /^\s*\d{1,3}\s*$/.test(cell.v)) return Number(cell.v);
  return null;
}
