// Text tables (csv, tsv, txt) through papaparse, with the delimiter chosen from the content.
import Papa from 'papaparse';
import { decodeText, type DecodedText } from './decode-text';
import { ImportError } from './errors';
import { Grid } from './grid';
import { MAX_CELLS, MAX_COLUMNS, MAX_ROWS } from './limits';

export type Delimiter = ',' | ';' | '\t';

export interface TextSheet {
  grid: Grid;
  encoding: DecodedText['encoding'];
  delimiter: Delimiter;
}

/** The sheet of a text file is named after the file, as spreadsheet programs do when opening one. */
export function sheetNameFor(fileName: string): string {
  const base = fileName.split(/[\\/]/).pop() ?? '';
  const stem = base.replace(/\.[^.]*$/, '').trim();
  return stem === '' ? 'Sheet1' : stem;
}

export function readTextTable(bytes: Uint8Array, fileName: string): TextSheet {
  const { text, encoding } = decodeText(bytes);
  if (text.trim() === '')
    throw new ImportError('empty_file', 'The file holds no text: it is empty or blank.');
  const delimiter = detectDelimiter(text);
  guardSize(text, delimiter, sheetNameFor(fileName));
  const parsed = Papa.parse<string[]>(text, {
    delimiter,
    header: false,
    dynamicTyping: false,
    skipEmptyLines: false,
  });
  const unclosed = parsed.errors.find((e) => e.code === 'MissingQuotes');
  if (unclosed) {
    const line = (unclosed.row ?? 0) + 1;
    throw new ImportError(
      'unreadable_text',
      `Row ${line}: a quotation mark opens a field that never closes, so the rest of the file cannot be split into cells. The file may be cut short or damaged.`,
      { sheet: sheetNameFor(fileName) },
    );
  }
  const grid = new Grid(sheetNameFor(fileName), 0);
  const rows = parsed.data;
  if (rows.length > MAX_ROWS) tooBig(grid.name);
  rows.forEach((fields, row) => {
    if (fields.length > MAX_COLUMNS) tooBig(grid.name);
    fields.forEach((field, column) => {
      if (field.trim() !== '') grid.set(row, column, { t: 's', v: field });
    });
  });
  if (!/[\r\n]$/.test(text) && rows.length > 0) {
    grid.openLastRow = { row: rows.length - 1, fields: rows[rows.length - 1].length };
  }
  return { grid, encoding, delimiter };
}

/**
 * Tab if at least 30 % of the lines hold one, else semicolon likewise, else comma. Tab and
 * semicolon go first because their files use the comma as the decimal mark ("0,123").
 */
export function detectDelimiter(text: string): Delimiter {
  const lines = text.split(/\r\n|\n|\r/, 400).filter((line) => line.trim() !== '');
  const share = (ch: string) => lines.filter((line) => line.includes(ch)).length / Math.max(1, lines.length);
  if (share('\t') >= 0.3) return '\t';
  if (share(';') >= 0.3) return ';';
  return ',';
}

/** Counts separators before papaparse builds millions of strings. */
function guardSize(text: string, delimiter: Delimiter, sheet: string): void {
  let cells = 1;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (ch === delimiter || ch === '\n') cells++;
  }
  if (cells > MAX_CELLS) tooBig(sheet);
}

function tooBig(sheet: string): never {
  throw new ImportError(
    'too_many_cells',
    `The table is larger than Bellwether accepts (at most ${MAX_ROWS.toLocaleString('en')} rows, ${MAX_COLUMNS.toLocaleString('en')} columns and ${MAX_CELLS.toLocaleString('en')} cells).`,
    { sheet },
  );
}
