// Files Bellwether must refuse, each with a typed error in words a scientist can act on,
// naming the sheet and cell where there is one. Nothing is half-read: one bad table fails the file.
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { parseReaderFile, type ParseResult } from '../../../server/import';
import { MAX_CELLS, MAX_FILE_BYTES } from '../../../server/import/limits';
import { readZipDirectory } from '../../../server/import/zip-directory';
import {
  SheetSpec,
  toText,
  toXlsx,
  wellNames,
  writePlateGrid,
  num,
} from '../../fixtures/readers/fixture-kit';
import { expectWellFormed } from './invariants';

const csv = (text: string) => Buffer.from(text, 'utf8');

async function refused(
  bytes: Uint8Array,
  name = 'upload.csv',
): Promise<Extract<ParseResult, { ok: false }>['error']> {
  const result = await parseReaderFile(bytes, name);
  expectWellFormed(result);
  if (result.ok)
    throw new Error(`expected ${name} to be refused, got ${result.value.blocks.length} block(s)`);
  return result.error;
}

/** A stored (uncompressed) zip written by hand: enough for the directory checks (PKWARE APPNOTE 4.3). */
function handZip(entries: { name: string; data: string; claimedSize?: number }[]): Buffer {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const { name, data, claimedSize } of entries) {
    const nameBytes = Buffer.from(name);
    const body = Buffer.from(data);
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt32LE(body.length, 18);
    local.writeUInt32LE(body.length, 22);
    local.writeUInt16LE(nameBytes.length, 26);
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt32LE(body.length, 20);
    central.writeUInt32LE(claimedSize ?? body.length, 24);
    central.writeUInt16LE(nameBytes.length, 28);
    central.writeUInt32LE(offset, 42);
    locals.push(local, nameBytes, body);
    centrals.push(central, nameBytes);
    offset += 30 + nameBytes.length + body.length;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(entries.length, 8);
  end.writeUInt16LE(entries.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...locals, directory, end]);
}

const grid96 = (sheet: SheetSpec, corner: string) =>
  writePlateGrid(
    sheet,
    corner,
    96,
    wellNames(96).map((_, i) => num(i / 100)),
  );

describe('files that are not reader data', () => {
  it('refuses an empty file', async () => {
    expect(await refused(new Uint8Array(0))).toMatchObject({ code: 'empty_file' });
    expect(await refused(csv('  \r\n\r\n'))).toMatchObject({ code: 'empty_file' });
  });

  it('refuses a file over 20 MB before reading it', async () => {
    const error = await refused(Buffer.alloc(MAX_FILE_BYTES + 1, 0x41));
    expect(error.code).toBe('too_large');
    expect(error.message).toMatch(/20 MB/);
  });

  it('refuses binary junk, naming what it expected', async () => {
    let seed = 7;
    const junk = Buffer.from(
      Array.from({ length: 5000 }, () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) % 256),
    );
    const error = await refused(junk, 'plate.csv');
    expect(error.code).toBe('unsupported_type');
    expect(error.message).toMatch(/Excel workbooks \(\.xlsx\) and text tables \(\.csv, \.tsv or \.txt/);
  });

  it('names the known formats it refuses: PDF, legacy .xls, images', async () => {
    expect((await refused(csv('%PDF-1.7\n1 0 obj'))).message).toMatch(/PDF document/);
    const ole = Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0, 0, 0]);
    expect((await refused(ole, 'plate.xls')).message).toMatch(
      /Excel 97–2003 workbook \(\.xls\).*save it as \.xlsx or \.csv/,
    );
    expect((await refused(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a]))).message).toMatch(/PNG image/);
  });

  it('refuses a zip archive that is not a workbook', async () => {
    const error = await refused(handZip([{ name: 'notes.txt', data: 'hello' }]), 'plate.xlsx');
    expect(error).toMatchObject({ code: 'unsupported_type' });
    expect(error.message).toMatch(/zip archive but not an Excel workbook/);
  });

  it('refuses a workbook that unpacks to far more than any reader export (zip bomb)', async () => {
    const bomb = handZip([
      { name: 'xl/workbook.xml', data: '<workbook/>' },
      { name: 'xl/worksheets/sheet1.xml', data: '<x/>', claimedSize: 3_000_000_000 },
    ]);
    expect(await refused(bomb, 'bomb.xlsx')).toMatchObject({ code: 'too_large' });
  });

  it('refuses a workbook with more than 100 sheets', async () => {
    const sheets = Array.from({ length: 101 }, (_, i) => new SheetSpec(`S${i + 1}`));
    const error = await refused(await toXlsx(sheets), 'many.xlsx');
    expect(error.code).toBe('too_many_sheets');
    expect(error.message).toMatch(/101 sheets; Bellwether reads at most 100/);
  });

  it('refuses a workbook cut short, saying so', async () => {
    const sheet = new SheetSpec('Results');
    grid96(sheet, 'B2');
    const whole = await toXlsx([sheet]);
    for (const keep of [10, Math.floor(whole.length / 2), whole.length - 1]) {
      const error = await refused(whole.subarray(0, keep), 'cut.xlsx');
      expect(error.code).toBe('unreadable_workbook');
      expect(error.message).toMatch(/damaged or (was )?cut short/);
    }
  });

  it('refuses a workbook whose sheet is damaged inside, rather than read wrong numbers from it', async () => {
    const sheet = new SheetSpec('Results');
    grid96(sheet, 'B2');
    const whole = await toXlsx([sheet]);
    const entry = readZipDirectory(whole).find((e) => e.name === 'xl/worksheets/sheet1.xml')!;
    const dataStart =
      entry.localOffset +
      30 +
      whole.readUInt16LE(entry.localOffset + 26) +
      whole.readUInt16LE(entry.localOffset + 28);
    const flipped = Buffer.from(whole);
    flipped[dataStart + Math.floor(entry.packed / 2)] ^= 0xff;
    const error = await refused(flipped, 'damaged.xlsx');
    expect(error.code).toBe('unreadable_workbook');
    expect(error.message).toMatch(
      /its part 'xl\/worksheets\/sheet1\.xml' (does not match its checksum|cannot be unpacked)/,
    );
    const renamed = Buffer.from(whole);
    renamed[entry.localOffset + 30 + 3] ^= 0x20; // 'xl/w' -> 'xl/W' in the local header only
    expect((await refused(renamed, 'renamed.xlsx')).message).toMatch(/recorded under two different names/);
  });

  it('refuses a text table larger than a spreadsheet can hold, or with absurdly many cells', async () => {
    expect(await refused(csv(`${'1,'.repeat(20_000)}1\n`))).toMatchObject({ code: 'too_many_cells' });
    const tall = `${'1,2,3,4,5,6,7,8,9,10\n'.repeat(MAX_CELLS / 10 + 1)}`;
    const error = await refused(csv(tall));
    expect(error.code).toBe('too_many_cells');
    expect(error.message).toMatch(
      /larger than Bellwether accepts \(at most 1,048,576 rows, 16,384 columns and 1,500,000 cells\)/,
    );
  });

  it('refuses a text file whose quotation mark never closes', async () => {
    const error = await refused(csv('Label\n"Absorbance 405 nm\n,1,2,3\nA,0.1,0.2,0.3\n'));
    expect(error.code).toBe('unreadable_text');
    expect(error.message).toMatch(/Row 2: a quotation mark opens a field that never closes/);
  });

  it('says what it looked for when a readable file holds no reader data', async () => {
    const error = await refused(csv('Sample,Concentration\nFR1-WT,0.5\n'), 'samples.csv');
    expect(error.code).toBe('nothing_found');
    expect(error.message).toMatch(/No reader data was found in its sheet 'samples'/);
    expect(error.message).toMatch(/plate grids.*kinetic tables.*long tables/);
  });

  it('points at a Well column it could not use', async () => {
    const error = await refused(csv('Well,Conc\nA1,0.5\n'), 'lone.csv');
    expect(error.notes?.map((n) => n.message)).toEqual([
      "Sheet 'lone', cell A1: a 'Well' column without a value column beside it (named Value, Absorbance, OD, Fluorescence, RFU, Signal or Result) or times across; it was not read.",
    ]);
  });
});

describe('tables with a defect, named by sheet and cell', () => {
  it('names the sheet and cell of an impossible time', async () => {
    const sheet = new SheetSpec('Kinetic');
    sheet.put(0, 2, 'Time');
    sheet.put(0, 3, 'A1');
    for (let k = 0; k < 13; k++) {
      sheet.put(1 + k, 2, k === 12 ? '1:75' : `0:${String(k * 4).padStart(2, '0')}`);
      sheet.put(1 + k, 3, 0.1 + k / 100);
    }
    const error = await refused(await toXlsx([sheet]), 'kinetic.xlsx');
    expect(error).toEqual({
      code: 'invalid_time',
      message: "Sheet 'Kinetic', cell C14: the time '1:75' is not a valid m:ss time.",
      sheet: 'Kinetic',
      cell: 'C14',
    });
  });

  it('fails the whole file when one table is broken, though another is fine', async () => {
    const good = new SheetSpec('Endpoint');
    grid96(good, 'A1');
    const bad = new SheetSpec('Kinetic');
    bad.put(0, 0, 'Time [s]');
    bad.put(0, 1, 'A1');
    bad.put(1, 0, 0);
    bad.put(1, 1, 0.1);
    bad.put(2, 0, { formula: 'A2+30' });
    bad.put(2, 1, 0.2);
    const error = await refused(await toXlsx([good, bad]), 'mixed.xlsx');
    expect(error.code).toBe('invalid_time');
    expect(error.message).toMatch(
      /^Sheet 'Kinetic', cell A3: the time is a formula \(=A2\+30\) saved without its result/,
    );
  });

  it('refuses two reads at the same time, naming both cells', async () => {
    const error = await refused(csv('Time [s],A1,A2\n0,0.1,0.2\n30,0.2,0.3\n30,0.3,0.4\n'), 'dup.csv');
    expect(error).toMatchObject({ code: 'duplicate_time', cell: 'A4' });
    expect(error.message).toBe(
      "Sheet 'dup', cell A4: the time 30 s appears twice (also in cell A3); each read needs its own time.",
    );
  });

  it('refuses a well with two columns (A1 and A01 are the same well)', async () => {
    const error = await refused(csv('Time [s],A1,A01\n0,0.1,0.2\n30,0.2,0.3\n'), 'dup.csv');
    expect(error).toMatchObject({ code: 'duplicate_well', cell: 'C1' });
    expect(error.message).toMatch(/well A1 has a second column \(the first is column B\)/);
  });

  it('refuses a well twice in a long table without times', async () => {
    const error = await refused(csv('Well,Value\nA1,0.1\nB1,0.2\nA1,0.3\n'), 'long.csv');
    expect(error).toMatchObject({ code: 'duplicate_well', cell: 'A4' });
    expect(error.message).toMatch(/well A1 appears a second time \(first on row 2\)/);
  });

  it('refuses a well listed twice down a table of reads across', async () => {
    const error = await refused(csv('Well,0 s,30 s\nA1,0.1,0.2\nA2,0.3,0.4\nA1,0.5,0.6\n'), 'rows.csv');
    expect(error).toMatchObject({ code: 'duplicate_well', cell: 'A4' });
    expect(error.message).toMatch(/well A1 has a second row \(the first is row 2\)/);
  });

  it('does not mistake a list of sample names for wells when no times head it', async () => {
    const result = await parseReaderFile(
      csv('Sample,Buffer\nA1,citrate\nQ5,acetate\nA1,MES\n'),
      'samples.csv',
    );
    expect(result.ok || result.error.code).toBe('nothing_found');
  });

  it('refuses a well name outside A1..P24', async () => {
    const error = await refused(csv('Well,Value\nA1,0.1\nA25,0.2\n'), 'long.csv');
    expect(error).toMatchObject({ code: 'invalid_well', cell: 'A3' });
    expect(error.message).toMatch(/'A25' is not a well of a 96- or 384-well plate \(A1 to P24\)/);
  });

  it('refuses a text table that stops in the middle of a plate row', async () => {
    const sheet = new SheetSpec('cut');
    grid96(sheet, 'A1');
    const whole = toText(sheet, { delimiter: ',' }).toString('utf8').trimEnd();
    const error = await refused(csv(whole.slice(0, whole.lastIndexOf(',') - 3)), 'cut.csv');
    expect(error.code).toBe('truncated');
    expect(error.message).toMatch(
      /^Sheet 'cut', cell [A-Z]+9: the file ends in the middle of a row of the table that starts at A1; it looks cut short/,
    );
  });
});

describe('odd but readable files', () => {
  it('reads a grid in a sheet whose last cell is far away (XFD1048576)', async () => {
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet('Sparse');
    for (let c = 1; c <= 12; c++) sheet.getCell(1, 1 + c).value = c;
    'ABCDEFGH'.split('').forEach((letter, r) => {
      sheet.getCell(2 + r, 1).value = letter;
      for (let c = 1; c <= 12; c++) sheet.getCell(2 + r, 1 + c).value = r + c / 100;
    });
    sheet.getCell('XFD1048576').value = 'far away';
    const result = await parseReaderFile(Buffer.from(await workbook.xlsx.writeBuffer()), 'sparse.xlsx');
    expectWellFormed(result);
    expect(result.ok && result.value.blocks[0].kind === 'endpoint' && result.value.blocks[0].wells.H12).toBe(
      7.12,
    );
  });

  it('reads UTF-16 text without a byte-order mark', async () => {
    const result = await parseReaderFile(Buffer.from('Well\tValue\r\nA1\t0,5\r\n', 'utf16le'), 'nobom.txt');
    expect(result.ok && result.value.text).toEqual({ encoding: 'utf-16le', delimiter: '\t' });
    expect(result.ok && result.value.blocks[0].wells).toEqual({ A1: 0.5 });
  });

  it('reads a plate grid whose column numbers are text ("01".."12") and row letters lower case', async () => {
    const header = ',' + Array.from({ length: 12 }, (_, i) => String(i + 1).padStart(2, '0')).join(',');
    const rows = 'abcdefgh'
      .split('')
      .map((l, r) => `${l},${Array.from({ length: 12 }, (_, c) => (r * 12 + c) / 1000).join(',')}`);
    const result = await parseReaderFile(
      csv(`Absorbance 405 nm\n${header}\n${rows.join('\n')}\n`),
      'lower.csv',
    );
    expectWellFormed(result);
    expect(result.ok && result.value.blocks[0].wells.H12).toBe(0.095);
  });

  it('reads a long table with two value columns as two blocks named by their headers', async () => {
    const result = await parseReaderFile(csv('Well,Abs 405,Abs 600\nA1,0.1,0.5\nA2,0.2,OVER\n'), 'two.csv');
    expectWellFormed(result);
    if (!result.ok) throw new Error(result.error.message);
    expect(result.value.blocks.map((b) => [b.label, b.detail.wavelength.nm, b.wells])).toEqual([
      ['Abs 405', 405, { A1: 0.1, A2: 0.2 }],
      ['Abs 600', 600, { A1: 0.5, A2: null }],
    ]);
    expect(result.value.blocks[1].flags).toEqual({ A2: 'saturated' });
  });

  it('keeps two kinetic tables side by side apart', async () => {
    const lines = [
      'Read 1: 405,,,,Read 2: 600',
      'Time [s],A1,A2,,Time [s],A1,A2',
      '0,0.1,0.2,,0,0.5,0.6',
      '30,0.11,0.21,,30,0.51,0.61',
    ];
    const result = await parseReaderFile(csv(`${lines.join('\n')}\n`), 'pair.csv');
    expectWellFormed(result);
    if (!result.ok) throw new Error(result.error.message);
    expect(result.value.blocks.map((b) => [b.label, b.detail.location.topLeft, b.wells])).toEqual([
      ['Read 1: 405', 'A2', { A1: [0.1, 0.11], A2: [0.2, 0.21] }],
      ['Read 2: 600', 'E2', { A1: [0.5, 0.51], A2: [0.6, 0.61] }],
    ]);
  });

  it('reads time values of a workbook in the 1904 date system', async () => {
    const workbook = new ExcelJS.Workbook();
    workbook.properties.date1904 = true;
    const sheet = workbook.addWorksheet('Mac');
    sheet.getCell('A1').value = 'Time';
    sheet.getCell('B1').value = 'A1';
    [0, 45, 90].forEach((s, k) => {
      // In the 1904 system day 0 is 1904-01-01: a time of day is that date plus the time.
      sheet.getCell(2 + k, 1).value = new Date(Date.UTC(1904, 0, 1) + s * 1000);
      sheet.getCell(2 + k, 1).numFmt = 'mm:ss';
      sheet.getCell(2 + k, 2).value = 0.1 * (k + 1);
    });
    const result = await parseReaderFile(Buffer.from(await workbook.xlsx.writeBuffer()), 'mac.xlsx');
    expectWellFormed(result);
    expect(result.ok && result.value.blocks[0].kind === 'kinetic' && result.value.blocks[0].times_s).toEqual([
      0, 45, 90,
    ]);
  });

  it('takes the wavelength from the sheet name when the label has none', async () => {
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet('Abs 405');
    sheet.addRow(['Time [s]', 'A1']);
    sheet.addRow([0, 0.1]);
    sheet.addRow([30, 0.2]);
    const result = await parseReaderFile(Buffer.from(await workbook.xlsx.writeBuffer()), 'named.xlsx');
    expect(result.ok && [result.value.blocks[0].label, result.value.blocks[0].detail.wavelength.nm]).toEqual([
      'Kinetic table at A1',
      405,
    ]);
  });
});
