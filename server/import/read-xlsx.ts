// Excel workbooks through exceljs, each worksheet turned into a Grid. Formula cells give their
// saved result; dates and times become serial days; cells covered by a merge are marked as such.
import ExcelJS from 'exceljs';
import { ImportError } from './errors';
import { Grid, type Cell } from './grid';
import { MAX_CELLS, MAX_COLUMNS, MAX_ROWS, MAX_SHEETS } from './limits';
import { checkWorkbookArchive } from './zip-directory';

const MS_PER_DAY = 86_400_000;
/** Serial day of 1970-01-01 in the 1900 date system; 1904 workbooks count 1462 days fewer. */
const UNIX_EPOCH_SERIAL = 25_569;
const DATE1904_OFFSET = 1_462;

export async function readWorkbook(bytes: Uint8Array): Promise<Grid[]> {
  checkWorkbookArchive(bytes);
  const workbook = new ExcelJS.Workbook();
  try {
    const buffer = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    await workbook.xlsx.load(buffer as unknown as Parameters<typeof workbook.xlsx.load>[0]);
  } catch (error) {
    const failure = new ImportError(
      'unreadable_workbook',
      'The file starts like an Excel workbook (.xlsx) but its content could not be read: it may be damaged, or written by a program that does not follow the xlsx format. Open it in a spreadsheet program and save it again as .xlsx, or export it as .csv.',
    );
    failure.technical = error instanceof Error ? error.message : String(error);
    throw failure;
  }
  const date1904 = Boolean(workbook.properties?.date1904);
  const sheets = workbook.worksheets;
  if (sheets.length > MAX_SHEETS) {
    throw new ImportError(
      'too_many_sheets',
      `The workbook has ${sheets.length} sheets; Bellwether reads at most ${MAX_SHEETS}.`,
    );
  }
  let cells = 0;
  return sheets.map((sheet, index) => {
    const grid = new Grid(sheet.name, index);
    sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
      row.eachCell({ includeEmpty: false }, (cell, columnNumber) => {
        if (rowNumber > MAX_ROWS || columnNumber > MAX_COLUMNS || ++cells > MAX_CELLS) tooBig(sheet.name);
        const value = toCell(cell, date1904);
        if (value) grid.set(rowNumber - 1, columnNumber - 1, value);
      });
    });
    return grid;
  });
}

function tooBig(sheet: string): never {
  throw new ImportError(
    'too_many_cells',
    `Sheet '${sheet}' is larger than Bellwether accepts (at most ${MAX_ROWS.toLocaleString('en')} rows, ${MAX_COLUMNS.toLocaleString('en')} columns and ${MAX_CELLS.toLocaleString('en')} filled cells in the workbook).`,
    { sheet },
  );
}

function toCell(cell: ExcelJS.Cell, date1904: boolean): Cell | undefined {
  if (cell.isMerged && cell.master.address !== cell.address) return { t: 'm', master: cell.master.address };
  if (cell.type === ExcelJS.ValueType.Formula) {
    // cell.result, not cell.value.result: exceljs 4.4 drops a saved result of 0, '' or FALSE from
    // cell.value (its copy keeps only truthy fields), which would turn a reading of 0 into a gap.
    const result: unknown = cell.result;
    return result === undefined || result === null
      ? { t: 'f', formula: String(cell.formula ?? '') }
      : fromValue(result, date1904);
  }
  return fromValue(cell.value, date1904);
}

function fromValue(value: unknown, date1904: boolean): Cell | undefined {
  if (value === null || value === undefined) return undefined;
  if (typeof value === 'number') return { t: 'n', v: value };
  if (typeof value === 'string') return value === '' ? undefined : { t: 's', v: value };
  if (typeof value === 'boolean') return { t: 'b', v: value };
  if (value instanceof Date) {
    const days = UNIX_EPOCH_SERIAL + value.getTime() / MS_PER_DAY - (date1904 ? DATE1904_OFFSET : 0);
    return Number.isFinite(days) ? { t: 'd', days } : { t: 'e', v: 'an invalid date' };
  }
  if (typeof value !== 'object') return undefined;
  const record = value as Record<string, unknown>;
  if ('error' in record) return { t: 'e', v: String(record.error) };
  if ('formula' in record || 'sharedFormula' in record) {
    const result = record.result;
    const formula = String(record.formula ?? record.sharedFormula ?? '');
    return result === undefined || result === null ? { t: 'f', formula } : fromValue(result, date1904);
  }
  if (Array.isArray(record.richText)) return fromValue(richText(record.richText), date1904);
  if ('text' in record) {
    const text = record.text;
    return fromValue(
      typeof text === 'object' && text && 'richText' in text
        ? richText((text as { richText: unknown }).richText)
        : text,
      date1904,
    );
  }
  return undefined;
}

function richText(parts: unknown): string {
  if (!Array.isArray(parts)) return '';
  return parts.map((part) => String((part as { text?: unknown })?.text ?? '')).join('');
}
