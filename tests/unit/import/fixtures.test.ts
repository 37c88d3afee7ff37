// The generated fixture files (tests/fixtures/readers, written by make-fixtures.ts) parse to what
// the generator says they hold; re-running the generator gives files with the same content.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  parseReaderFile,
  toCliJson,
  type ParsedKineticBlock,
  type ParsedReaderFile,
} from '../../../server/import';
import { buildFixtures, FIXTURE_DIR, type Fixture } from '../../fixtures/readers/make-fixtures';
import { NOTICE } from '../../fixtures/readers/fixture-kit';
import { readTextTable } from '../../../server/import/read-text';
import { readWorkbook } from '../../../server/import/read-xlsx';
import { expectWellFormed } from './invariants';

let fixtures: Fixture[];
const committed = (name: string) => readFileSync(join(FIXTURE_DIR, name));

async function parseCommitted(name: string): Promise<ParsedReaderFile> {
  const result = await parseReaderFile(committed(name), name);
  if (!result.ok) throw new Error(`${name}: ${result.error.message}`);
  return result.value;
}

beforeAll(async () => {
  fixtures = await buildFixtures();
});

describe('the committed fixture files', () => {
  it('are exactly the files the generator writes (none missing, none stale)', () => {
    const onDisk = readdirSync(FIXTURE_DIR).filter((f) => !f.endsWith('.ts') && f !== 'README.md');
    expect(onDisk.sort()).toEqual(fixtures.map((f) => f.name).sort());
  });

  it('each say, on every sheet, that their data are generated', async () => {
    for (const fixture of fixtures) {
      const bytes = committed(fixture.name);
      const sheets = fixture.name.endsWith('.xlsx')
        ? await readWorkbook(bytes)
        : [readTextTable(bytes, fixture.name).grid];
      for (const sheet of sheets) {
        const texts: string[] = [];
        sheet.forEachText((cell) => cell.t === 's' && texts.push(cell.v));
        expect(texts, `${fixture.name} / ${sheet.name}`).toContain(NOTICE);
      }
    }
  });

  it('parse to exactly what the generator put in them (source: make-fixtures.ts)', async () => {
    for (const fixture of fixtures) {
      const result = await parseReaderFile(committed(fixture.name), fixture.name);
      expectWellFormed(result);
      if (fixture.expected === null) {
        expect(result.ok, fixture.name).toBe(false);
        if (!result.ok) expect(result.error.code).toBe(fixture.errorCode);
        continue;
      }
      expect(result.ok, fixture.name).toBe(true);
      if (result.ok) expect(toCliJson(result.value), fixture.name).toEqual(fixture.expected);
    }
  });

  it('re-running the generator reproduces the same parsed content, notes included', async () => {
    for (const fixture of fixtures) {
      const fresh = await parseReaderFile(fixture.bytes, fixture.name);
      const old = await parseReaderFile(committed(fixture.name), fixture.name);
      expect(fresh, fixture.name).toEqual(old);
    }
  });
});

describe('what the import screen learns beyond the CLI format', () => {
  it('places each block: layout, sheet, top-left cell, size, label cell and wavelength', async () => {
    const multi = await parseCommitted('endpoint-96-multi.xlsx');
    // Grids written at D3, T3 and D17 of 'Plate 1' and B2 of 'Plate 2' (make-fixtures.ts, endpoint96Multi).
    expect(
      multi.blocks.map((b) => [
        b.detail.location.sheet,
        b.detail.location.topLeft,
        b.detail.location.bottomRight,
      ]),
    ).toEqual([
      ['Plate 1', 'D3', 'P11'],
      ['Plate 1', 'T3', 'AF11'],
      ['Plate 1', 'D17', 'P25'],
      ['Plate 2', 'B2', 'N10'],
    ]);
    expect(multi.blocks.map((b) => b.detail.labelCell)).toEqual(['D2', 'T2', 'B17', 'B2']);
    expect(multi.blocks.map((b) => b.detail.wavelength.nm)).toEqual([405, 600, 450, 340]);
    expect(multi.blocks[0].detail.location).toMatchObject({ sheetIndex: 0, rows: 9, columns: 13 });
    expect(multi.blocks[3].detail.location.sheetIndex).toBe(1);
    expect(multi.blocks.every((b) => b.detail.layout === 'plate-grid')).toBe(true);
  });

  it('keeps the original text of each flagged well', async () => {
    const tricky = await parseCommitted('endpoint-384-flags.xlsx');
    const raw = tricky.blocks[0].detail.raw;
    // Cells written by make-fixtures.ts, endpoint384Tricky.
    expect(raw).toMatchObject({
      A1: 'OVER',
      A4: '>65000',
      A5: '****',
      A6: '',
      C2: '=SQRT(4)*100',
      C3: '#DIV/0!',
      E2: '1e400',
    });
    expect(raw.D2).toBe('(merged with D9)'); // wells D1:D2 sit at D9:E9 below the corner C5
    expect(tricky.blocks[0].detail.wavelength).toEqual({ nm: null, excitationNm: 485, emissionNm: 520 });
  });

  it('reports how times were written, the temperature kept apart, and each missing point', async () => {
    const spellings: Record<string, string> = {
      'kinetic-seconds.xlsx': 's',
      'kinetic-minutes-a01.xlsx': 'min',
      'kinetic-mss.csv': 'm:ss',
      'kinetic-hmmss.tsv': 'h:mm:ss',
      'kinetic-excel-time.xlsx': 'spreadsheet time',
    };
    for (const [name, spelling] of Object.entries(spellings)) {
      const block = (await parseCommitted(name)).blocks[0] as ParsedKineticBlock;
      expect(block.detail.timeSpelling, name).toBe(spelling);
    }
    const seconds = (await parseCommitted('kinetic-seconds.xlsx')).blocks[0] as ParsedKineticBlock;
    expect(seconds.detail.temperature).toHaveLength(20);
    expect(seconds.detail.temperature!.every((t) => t! >= 36.9 && t! <= 37.1)).toBe(true); // generator: 36.9 + 0.2·u
    const minutes = (await parseCommitted('kinetic-minutes-a01.xlsx')).blocks[0] as ParsedKineticBlock;
    expect(minutes.detail.temperature).toBeNull();
    // Well A4 written OVER at reads 13–15, well A6 empty at read 8 (make-fixtures.ts, kineticMinutesA01).
    expect(minutes.detail.points.A4).toEqual(
      [12, 13, 14].map((index) => ({ index, flag: 'saturated', raw: 'OVER' })),
    );
    expect(minutes.detail.points.A6).toEqual([{ index: 7, flag: 'empty', raw: '' }]);
  });

  it('notes what it skipped or assumed', async () => {
    const notes = async (name: string) => (await parseCommitted(name)).notes.map((n) => n.message).join('\n');
    expect(await notes('kinetic-minutes-a01.xlsx')).toMatch(
      /Sheet 'Read 340', cell A4: the column 'Cycle' is not a well and was skipped/,
    );
    expect(await notes('kinetic-seconds.xlsx')).toMatch(
      /temperature column 'Temp\. \[°C\]' \(36\.9 to 37\.1\) is not a well/,
    );
    expect(await notes('kinetic-excel-time.xlsx')).toMatch(
      /Sheet 'Fractions', cell A2: the times have no unit; they were read as fractions of a day/,
    );
    expect(await notes('kinetic-unsorted.csv')).toMatch(/not in time order; they were sorted by time/);
    expect(await notes('kinetic-wells-as-rows.xlsx')).toMatch(
      /the column 'Content' holds no times and was skipped/,
    );
  });

  it('reports the encoding and delimiter it detected in text files', async () => {
    const cases: [string, string, string][] = [
      ['endpoint-96-semicolon.csv', 'utf-8', ';'],
      ['endpoint-96-tab.txt', 'utf-8', '\t'],
      ['endpoint-utf8-bom.csv', 'utf-8', ','],
      ['kinetic-wells-as-rows-utf16.txt', 'utf-16le', '\t'],
      ['long-endpoint-utf16be.csv', 'utf-16be', ';'],
      ['kinetic-latin1.csv', 'windows-1252', ';'],
    ];
    for (const [name, encoding, delimiter] of cases) {
      expect((await parseCommitted(name)).text, name).toEqual({ encoding, delimiter });
    }
  });

  it('says in its error what it looked for, and which near misses it saw', async () => {
    const result = await parseReaderFile(committed('nothing-here.csv'), 'nothing-here.csv');
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.error.message).toMatch(/row letters A–H or A–P.*column numbers 1–12 or 1–24/);
    expect(result.error.message).toMatch(/Time column/);
    expect(result.error.message).toMatch(/Well column and a Value column/);
    expect(result.error.notes?.[0].message).toMatch(
      /cell A4: a grid with rows A–D and columns 1–12 is not a whole 96- or 384-well plate/,
    );
  });
});

it('the notice every fixture carries names the generator', () => {
  expect(NOTICE).toMatch(/Generated test data.*make-fixtures\.ts.*not a measurement/);
});
