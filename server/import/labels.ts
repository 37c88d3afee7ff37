// The label of a block is the nearest text above it or to its left ("Absorbance 405 nm",
// "Read 2: 340"); the wavelength is read from that label when it names one.
import { cellRef, inRegion, type Grid, type Region } from './grid';
import { LABEL_SEARCH_DISTANCE } from './limits';
import { parseNumberText } from './measure';
import type { Wavelengths } from './types';

export interface Label {
  text: string;
  cell: string;
}

/** Corner texts that head a grid but say nothing about it. */
const NOT_A_LABEL = /^(?:<>|well|wells|row|rows|col|column|#|\\|\/)$/i;
/** Look a little left of the block too: titles often start a column or two before the grid. */
const ABOVE_LEFT_SLACK = 3;

/** A label says something in words: bare numbers (values, column numbers in text files) are not labels. */
function isLabelText(text: string | null): text is string {
  return text !== null && !NOT_A_LABEL.test(text) && /\p{L}/u.test(text) && parseNumberText(text) === null;
}

export function findLabel(grid: Grid, region: Region, claimed: Region[], corner: boolean): Label | null {
  const isClaimed = (row: number, column: number) =>
    claimed.some((r) => r !== region && inRegion(r, row, column));
  if (corner) {
    const text = grid.text(region.top, region.left);
    if (isLabelText(text)) return { text, cell: cellRef(region.top, region.left) };
  }
  const above = searchAbove(grid, region, isClaimed);
  const left = searchLeft(grid, region, isClaimed);
  if (above && (!left || above.distance <= left.distance)) return above.label;
  return left ? left.label : null;
}

type Found = { label: Label; distance: number } | null;

function searchAbove(grid: Grid, region: Region, isClaimed: (r: number, c: number) => boolean): Found {
  for (let d = 1; d <= LABEL_SEARCH_DISTANCE && region.top - d >= 0; d++) {
    const row = region.top - d;
    const columns = [];
    for (let c = region.left; c <= region.right; c++) columns.push(c);
    for (let c = region.left - 1; c >= Math.max(0, region.left - ABOVE_LEFT_SLACK); c--) columns.push(c);
    for (const column of columns) {
      if (isClaimed(row, column)) {
        if (column >= region.left) return null; // another block sits right above this one
        continue;
      }
      const text = grid.text(row, column);
      if (isLabelText(text)) return { label: { text, cell: cellRef(row, column) }, distance: d };
    }
  }
  return null;
}

function searchLeft(grid: Grid, region: Region, isClaimed: (r: number, c: number) => boolean): Found {
  const bottom = Math.min(region.top + 1, region.bottom);
  for (let d = 1; d <= LABEL_SEARCH_DISTANCE && region.left - d >= 0; d++) {
    const column = region.left - d;
    for (let row = region.top; row <= bottom; row++) {
      if (isClaimed(row, column)) return null;
      const text = grid.text(row, column);
      if (isLabelText(text)) return { label: { text, cell: cellRef(row, column) }, distance: d };
    }
  }
  return null;
}

/** Plausible read wavelengths of UV-visible plate readers, in nm (common practice, no source). */
function plausible(nm: number): boolean {
  return nm >= 190 && nm <= 1100;
}

/**
 * "Absorbance 405 nm" -> 405; "OD600", "A340", "Abs 450" -> that number; "Read 2: 340" -> 340;
 * "Ex 485 / Em 520" or "485/520" -> excitation 485, emission 520.
 */
export function wavelengthsOf(label: string): Wavelengths {
  const none: Wavelengths = { nm: null, excitationNm: null, emissionNm: null };
  const pair =
    /ex(?:citation)?\D{0,12}?(\d{3,4})\D{1,24}?em(?:ission)?\D{0,12}?(\d{3,4})/i.exec(label) ??
    /(?:^|[^\d.])(\d{3,4})\s*(?:nm)?\s*\/\s*(\d{3,4})(?!\d)/.exec(label);
  if (pair && plausible(Number(pair[1])) && plausible(Number(pair[2]))) {
    return { nm: null, excitationNm: Number(pair[1]), emissionNm: Number(pair[2]) };
  }
  const patterns = [
    /(\d{3,4}(?:[.,]\d+)?)\s*nm\b/i,
    /(?:wavelength|lambda|λ)\s*[:=]?\s*(\d{3,4})(?!\d)/i,
    /(?:^|[^a-z])(?:abs(?:orbance)?|od|a)\s*[:=@]?\s*(\d{3,4})(?!\d)/i,
    /:\s*(\d{3,4})\s*$/,
  ];
  for (const pattern of patterns) {
    const match = pattern.exec(label);
    const nm = match ? Number(match[1].replace(',', '.')) : NaN;
    if (plausible(nm)) return { ...none, nm };
  }
  return none;
}
