// The reader-file parser: bytes of an uploaded plate-reader export in, the blocks it holds out
// (end-point plate grids and kinetic time courses), or a typed error a scientist can act on.
// Never throws: every failure of exceljs, papaparse or the detectors becomes { ok: false }.
import { detectBlocks } from './detect';
import { ImportError } from './errors';
import type { Grid } from './grid';
import { MAX_FILE_BYTES } from './limits';
import { readTextTable } from './read-text';
import { readWorkbook } from './read-xlsx';
import { sniff } from './sniff';
import type { ParsedReaderFile, ParseNote, ParseResult } from './types';

export { toCliJson } from './cli-json';
export type * from './types';

const LOOKED_FOR =
  'plate grids (row letters A–H or A–P down a column against column numbers 1–12 or 1–24 across a row), ' +
  'kinetic tables (a Time column with one column per well named A1 or A01, or one row per well with the times across), ' +
  'or long tables with a Well column and a Value column (optionally Time)';

export async function parseReaderFile(bytes: Uint8Array, fileName: string): Promise<ParseResult> {
  try {
    return { ok: true, value: await parse(bytes, fileName) };
  } catch (error) {
    if (error instanceof ImportError) return { ok: false, error: error.toParseError() };
    return {
      ok: false,
      error: {
        code: 'internal',
        message: `'${fileName}' could not be read because of an unexpected problem in Bellwether. Nothing was imported; please send the file to your administrator.`,
        technical: error instanceof Error ? (error.stack ?? error.message) : String(error),
      },
    };
  }
}

async function parse(bytes: Uint8Array, fileName: string): Promise<ParsedReaderFile> {
  if (bytes.length === 0) throw new ImportError('empty_file', 'The file is empty (0 bytes).');
  if (bytes.length > MAX_FILE_BYTES) {
    const mb = (bytes.length / 1024 / 1024).toFixed(1);
    throw new ImportError(
      'too_large',
      `The file is ${mb} MB; Bellwether accepts reader files up to ${MAX_FILE_BYTES / 1024 / 1024} MB.`,
    );
  }
  const notes: ParseNote[] = [];
  let grids: Grid[];
  let text: ParsedReaderFile['text'];
  const kind = sniff(bytes);
  if (kind === 'zip') {
    grids = await readWorkbook(bytes);
  } else {
    const sheet = readTextTable(bytes, fileName);
    grids = [sheet.grid];
    text = { encoding: sheet.encoding, delimiter: sheet.delimiter };
  }
  const blocks = detectBlocks(grids, notes);
  if (blocks.length === 0) {
    const sheets = grids.length === 1 ? `its sheet '${grids[0].name}'` : `any of its ${grids.length} sheets`;
    throw new ImportError(
      'nothing_found',
      `No reader data was found in ${sheets}. Bellwether looked for ${LOOKED_FOR}.`,
      {},
      notes,
    );
  }
  const parsed: ParsedReaderFile = {
    file: fileName,
    fileType: kind === 'zip' ? 'xlsx' : 'text',
    blocks,
    notes,
  };
  if (text) parsed.text = text;
  return parsed;
}
