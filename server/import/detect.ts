// Runs the detectors over each sheet, labels what they found, and assembles the blocks in file
// order (sheet by sheet, top to bottom, left to right).
import type { Draft, DetectContext } from './draft';
import { ImportError, where } from './errors';
import { findKineticColumns } from './find-kinetic-columns';
import { findKineticRows } from './find-kinetic-rows';
import { findLongTables } from './find-long-tables';
import { WELL_HEADER } from './headers';
import { findPlateGrids } from './find-plate-grids';
import { cellRef, inRegion, parseRef, type Grid, type Region } from './grid';
import { findLabel, wavelengthsOf } from './labels';
import type { BlockDetail, ParseNote, ParsedBlock } from './types';

/** Plate grids first (their letters and numbers are the most specific), long tables before the kinetic layouts. */
const DETECTORS = [findPlateGrids, findLongTables, findKineticColumns, findKineticRows];

export function detectBlocks(grids: Grid[], notes: ParseNote[]): ParsedBlock[] {
  const blocks: ParsedBlock[] = [];
  for (const grid of grids) {
    const context: DetectContext = { grid, claimed: [], notes };
    const drafts = DETECTORS.flatMap((detect) => blameCutShort(grid, () => detect(context)));
    drafts.sort((a, b) => a.region.top - b.region.top || a.region.left - b.region.left);
    for (const draft of drafts) {
      checkNotCutShort(grid, draft.region);
      blocks.push(toBlock(grid, draft, context.claimed));
    }
    noteLoneWellColumns(context);
  }
  return blocks;
}

function toBlock(grid: Grid, draft: Draft, claimed: Region[]): ParsedBlock {
  const found = findLabel(grid, draft.region, claimed, draft.corner);
  const topLeft = cellRef(draft.region.top, draft.region.left);
  const label = draft.headerLabel ?? found?.text ?? fallbackLabel(draft, topLeft);
  const detail: BlockDetail = {
    layout: draft.layout,
    location: {
      sheet: grid.name,
      sheetIndex: grid.index,
      topLeft,
      bottomRight: cellRef(draft.region.bottom, draft.region.right),
      rows: draft.region.bottom - draft.region.top + 1,
      columns: draft.region.right - draft.region.left + 1,
    },
    labelCell: draft.headerLabel !== undefined ? topLeft : (found?.cell ?? null),
    wavelength: wavelengthOf(label, grid.name),
    raw: {},
  };
  const base = { plateFormat: draft.content.plateFormat, sheet: grid.name, label };
  if (draft.content.kind === 'endpoint') {
    const { wells, flags, raw } = draft.content;
    return { kind: 'endpoint', ...base, wells, flags, detail: { ...detail, raw } };
  }
  const { times_s, wells, flags, points, timeSpelling, temperature } = draft.content;
  return {
    kind: 'kinetic',
    ...base,
    times_s,
    wells,
    flags,
    detail: { ...detail, points, timeSpelling, temperature },
  };
}

/** From the label, or else from the sheet's name (readers often name a sheet after its read: "Abs 405"). */
function wavelengthOf(label: string, sheet: string): BlockDetail['wavelength'] {
  const fromLabel = wavelengthsOf(label);
  const found = fromLabel.nm !== null || fromLabel.excitationNm !== null;
  return found ? fromLabel : wavelengthsOf(sheet);
}

function fallbackLabel(draft: Draft, topLeft: string): string {
  const what =
    draft.content.kind === 'kinetic'
      ? 'Kinetic table'
      : draft.layout === 'plate-grid'
        ? 'Plate grid'
        : 'Table';
  return `${what} at ${topLeft}`;
}

/**
 * A defect in the last cell of a text file that stops mid-line ('A0' for 'A05', '1:3' for
 * '1:30') is the cut, not the data: say that the file was cut short.
 */
function blameCutShort<T>(grid: Grid, detect: () => T): T {
  try {
    return detect();
  } catch (error) {
    const open = grid.openLastRow;
    const at = error instanceof ImportError && error.cell ? parseRef(error.cell) : null;
    if (!open || !at || at.row !== open.row || at.column !== open.fields - 1) throw error;
    throw new ImportError(
      'truncated',
      `${where(grid.name, (error as ImportError).cell)}the file ends in the middle of this line (${(error as ImportError).message.replace(/^Sheet '.*?', cell \w+: /, '')}); it looks cut short. Export it again.`,
      { sheet: grid.name, cell: (error as ImportError).cell },
    );
  }
}

/**
 * A text file that stops mid-row inside a block has lost the rest of that block: refuse it rather
 * than show a shortened plate as if it were whole.
 */
function checkNotCutShort(grid: Grid, region: Region): void {
  const open = grid.openLastRow;
  if (!open || open.row < region.top || open.row > region.bottom || open.fields > region.right) return;
  const cell = cellRef(open.row, open.fields);
  throw new ImportError(
    'truncated',
    `${where(grid.name, cell)}the file ends in the middle of a row of the table that starts at ${cellRef(region.top, region.left)}; it looks cut short. Export it again.`,
    { sheet: grid.name, cell },
  );
}

/** A 'Well' header that no table took: most likely its value column has a name Bellwether does not know. */
function noteLoneWellColumns({ grid, claimed, notes }: DetectContext): void {
  grid.forEachText((cell, row, column) => {
    if (cell.t !== 's' || !WELL_HEADER.test(cell.v.trim()) || claimed.some((r) => inRegion(r, row, column)))
      return;
    const ref = cellRef(row, column);
    notes.push({
      sheet: grid.name,
      cell: ref,
      message: `${where(grid.name, ref)}a '${cell.v.trim()}' column without a value column beside it (named Value, Absorbance, OD, Fluorescence, RFU, Signal or Result) or times across; it was not read.`,
    });
  });
}
