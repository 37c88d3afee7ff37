// Reads the copy of SCIENCE.md §2.5 in tests/fixtures: numbers are kept as printed text so that a
// check can use the printed precision as its tolerance.
import table from '../../fixtures/chemistry/science-buffer-table.json';

export interface PrintedNumber {
  value: number;
  /** Half a unit in the last printed decimal. */
  halfUlp: number;
  text: string;
}

export function printed(text: string): PrintedNumber | null {
  const clean = text
    .replace(/\[memory\]|\(cal\)/g, '')
    .trim()
    .replace('−', '-')
    .replace('+', '');
  if (clean === '–' || clean === '') return null;
  const decimals = clean.includes('.') ? clean.split('.')[1].length : 0;
  return { value: Number(clean), halfUlp: 0.5 * 10 ** -decimals, text };
}

export interface TableRow {
  buffer: string;
  systemId: string;
  step: number;
  zHA: number;
  pK25: string;
  dH: string;
  dCp: string;
  dpKdT: string;
  pK37: string;
  source: string;
}

export const tableRows = table.rows as TableRow[];
