// Property tests: good files, mutated (cut short, rows shuffled, binary junk, huge numbers,
// formula cells, merged cells), must give a typed error or a correct result — never an exception,
// never a shortened or altered table presented as whole.
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  parseReaderFile,
  toCliJson,
  type ReaderBlockJson,
  type ReaderFileJson,
} from '../../../server/import';
import { buildFixtures, type Fixture } from '../../fixtures/readers/make-fixtures';
import {
  missing,
  num,
  SheetSpec,
  toText,
  toXlsx,
  wellNames,
  writePlateGrid,
  type Entry,
} from '../../fixtures/readers/fixture-kit';
import { expectWellFormed } from './invariants';

let fixtures: Fixture[];
let good: Fixture[];
const isXlsx = (f: Fixture) => f.name.endsWith('.xlsx');

beforeAll(async () => {
  fixtures = await buildFixtures();
  good = fixtures.filter((f) => f.expected !== null);
});

const RUNS = { numRuns: 60 };

/**
 * How many data points of `got` differ from `original`, or Infinity if some block of `got` is not
 * a part of an original block (same sheet, label, kind and plate; wells and times a subset).
 */
function pointsDiffering(got: ReaderFileJson, original: ReaderFileJson): number {
  let total = 0;
  for (const block of got.blocks) {
    const candidates = original.blocks
      .filter(
        (o) =>
          o.kind === block.kind &&
          o.sheet === block.sheet &&
          o.label === block.label &&
          o.plateFormat === block.plateFormat,
      )
      .map((o) => differences(block, o));
    total += Math.min(Infinity, ...candidates);
  }
  return total;
}

function differences(block: ReaderBlockJson, original: ReaderBlockJson): number {
  const same = (a: number | null, b: number | null, flagA?: string, flagB?: string) =>
    Object.is(a, b) && flagA === flagB;
  let n = 0;
  if (block.kind === 'endpoint' && original.kind === 'endpoint') {
    for (const [well, value] of Object.entries(block.wells)) {
      if (!(well in original.wells)) return Infinity;
      if (!same(value, original.wells[well], block.flags[well], original.flags[well])) n++;
    }
    return n;
  }
  if (block.kind !== 'kinetic' || original.kind !== 'kinetic') return Infinity;
  const index = block.times_s.map((t) => original.times_s.indexOf(t));
  if (index.some((i) => i < 0)) return Infinity;
  for (const [well, series] of Object.entries(block.wells)) {
    const full = original.wells[well];
    if (!full) return Infinity;
    series.forEach((v, k) => (Object.is(v, full[index[k]]) ? undefined : n++));
  }
  return n;
}

describe('files cut short at any byte', () => {
  it('text tables: a typed error, or blocks that are parts of the original with at most the cut value changed', async () => {
    const texts = () => good.filter((f) => !isXlsx(f));
    await fc.assert(
      fc.asyncProperty(fc.nat(), fc.double({ min: 0, max: 1, noNaN: true }), async (pick, fraction) => {
        const fixture = texts()[pick % texts().length];
        const cut = Math.max(1, Math.floor(fraction * (fixture.bytes.length - 1)));
        const result = await parseReaderFile(fixture.bytes.subarray(0, cut), fixture.name);
        expectWellFormed(result);
        if (!result.ok) return;
        const changed = pointsDiffering(toCliJson(result.value), fixture.expected!);
        // The one value allowed to differ is the number the cut went through ("0.1234" -> "0.12").
        expect(changed).toBeLessThanOrEqual(1);
      }),
      { numRuns: 300 },
    );
  });

  it('workbooks: always refused as damaged or cut short', async () => {
    const books = () => good.filter(isXlsx);
    await fc.assert(
      fc.asyncProperty(fc.nat(), fc.double({ min: 0, max: 1, noNaN: true }), async (pick, fraction) => {
        const fixture = books()[pick % books().length];
        const cut = Math.floor(fraction * (fixture.bytes.length - 1));
        const result = await parseReaderFile(fixture.bytes.subarray(0, cut), fixture.name);
        expectWellFormed(result);
        expect(result.ok).toBe(false);
      }),
      RUNS,
    );
  });
});

describe('rows shuffled', () => {
  const orderFree = [
    'kinetic-mss.csv',
    'kinetic-hmmss.tsv',
    'kinetic-unsorted.csv',
    'kinetic-latin1.csv',
    'long-endpoint.csv',
  ];

  it('tables whose rows may come in any order give the same result whatever the order', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...orderFree), fc.nat(), async (name, seed) => {
        const fixture = fixtures.find((f) => f.name === name)!;
        const encoding = name.includes('latin1') ? 'latin1' : 'utf8';
        const original = await parseReaderFile(fixture.bytes, name);
        if (!original.ok) throw new Error(original.error.message);
        const { location } = original.value.blocks[0].detail;
        const top = Number(location.topLeft.replace(/^[A-Z]+/, ''));
        const lines = fixture.bytes.toString(encoding).split('\r\n');
        const data = lines.slice(top, top + location.rows - 1); // the rows under the header (1-based top = header)
        const shuffled = fc.sample(
          fc.shuffledSubarray(data, { minLength: data.length, maxLength: data.length }),
          { numRuns: 1, seed },
        )[0];
        const bytes = Buffer.from(
          [...lines.slice(0, top), ...shuffled, ...lines.slice(top + data.length)].join('\r\n'),
          encoding,
        );
        const result = await parseReaderFile(bytes, name);
        expectWellFormed(result);
        expect(result.ok && toCliJson(result.value)).toEqual(fixture.expected);
      }),
      RUNS,
    );
  });

  it('any text file with its lines in any order: no invented numbers, nothing missing passed off as zero', async () => {
    const texts = () => good.filter((f) => !isXlsx(f) && !f.name.includes('utf16'));
    await fc.assert(
      fc.asyncProperty(fc.nat(), fc.nat(), async (pick, seed) => {
        const fixture = texts()[pick % texts().length];
        const encoding = fixture.name.includes('latin1') ? 'latin1' : 'utf8';
        const lines = fixture.bytes.toString(encoding).split('\r\n');
        const shuffled = fc.sample(
          fc.shuffledSubarray(lines, { minLength: lines.length, maxLength: lines.length }),
          { numRuns: 1, seed },
        )[0];
        const result = await parseReaderFile(Buffer.from(shuffled.join('\r\n'), encoding), fixture.name);
        expectWellFormed(result);
        if (!result.ok) return;
        const known = new Set(fixture.expected!.blocks.flatMap((b) => Object.values(b.wells).flat()));
        for (const block of toCliJson(result.value).blocks) {
          for (const v of Object.values(block.wells).flat()) if (v !== null) expect(known.has(v)).toBe(true);
        }
      }),
      RUNS,
    );
  });
});

describe('binary junk', () => {
  it('random bytes: a typed error, never an exception', async () => {
    await fc.assert(
      fc.asyncProperty(fc.uint8Array({ minLength: 1, maxLength: 4096 }), async (bytes) => {
        expectWellFormed(await parseReaderFile(bytes, 'junk.csv'));
      }),
      { numRuns: 200 },
    );
  });

  it('random bytes behind a zip signature: a typed error, never an exception', async () => {
    await fc.assert(
      fc.asyncProperty(fc.uint8Array({ minLength: 0, maxLength: 4096 }), async (bytes) => {
        const result = await parseReaderFile(Buffer.concat([Buffer.from('PK\x03\x04'), bytes]), 'junk.xlsx');
        expectWellFormed(result);
        expect(result.ok).toBe(false);
      }),
      { numRuns: 200 },
    );
  });

  it('junk inserted into or written over a text file: a typed error or well-formed blocks', async () => {
    // Text has no checksum: junk written over a digit gives another valid number, so only the form is checked.
    const texts = () => good.filter((f) => !isXlsx(f));
    await fc.assert(
      fc.asyncProperty(
        fc.nat(),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.uint8Array({ minLength: 1, maxLength: 64 }),
        fc.boolean(),
        async (pick, fraction, junk, overwrite) => {
          const fixture = texts()[pick % texts().length];
          expectWellFormed(
            await parseReaderFile(mutate(fixture.bytes, fraction, junk, overwrite), fixture.name),
          );
        },
      ),
      { numRuns: 150 },
    );
  });

  it('junk inserted into or written over a workbook: a typed error, or exactly the original result', async () => {
    // Every part of an xlsx carries a CRC-32: damage anywhere that matters must be caught, never read as data.
    const books = () => good.filter(isXlsx);
    await fc.assert(
      fc.asyncProperty(
        fc.nat(),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.uint8Array({ minLength: 1, maxLength: 16 }),
        fc.boolean(),
        async (pick, fraction, junk, overwrite) => {
          const fixture = books()[pick % books().length];
          const result = await parseReaderFile(
            mutate(fixture.bytes, fraction, junk, overwrite),
            fixture.name,
          );
          expectWellFormed(result);
          if (result.ok) expect(toCliJson(result.value)).toEqual(fixture.expected);
        },
      ),
      { numRuns: 150 },
    );
  });
});

function mutate(original: Buffer, fraction: number, junk: Uint8Array, overwrite: boolean): Buffer {
  const at = Math.floor(fraction * original.length);
  if (!overwrite) return Buffer.concat([original.subarray(0, at), Buffer.from(junk), original.subarray(at)]);
  const bytes = Buffer.from(original);
  Buffer.from(junk).copy(bytes, at);
  return bytes;
}

// ---- Generated plates whose cells hold anything a reader or a person may write ----

const HUGE = ['1e308', '-1.7976931348623157e308', '1e309', '9'.repeat(400), '-1e-320', '4.9e-324'];
const MARKERS = ['OVER', 'Overflow', 'Sat', '>3.5', '****', 'OVRFLW'];

type Format = 'xlsx' | 'comma' | 'semicolon' | 'tab';

function cellArbitrary(format: Format): fc.Arbitrary<Entry> {
  const plain = fc.double({ noNaN: true, noDefaultInfinity: true }).map((v) => num(v === 0 ? 0 : v));
  const huge = fc.constantFrom(...HUGE).map((text): Entry => {
    const value = Number(text);
    return Number.isFinite(value)
      ? { spec: format === 'xlsx' ? value : text, value }
      : missing(text, 'invalid');
  });
  const options: fc.Arbitrary<Entry>[] = [
    plain,
    huge,
    fc.constantFrom(...MARKERS).map((m) => missing(m, 'saturated')),
    fc.constant(missing(undefined, 'empty')),
  ];
  if (format === 'xlsx') {
    options.push(
      // 0 drawn often: exceljs hides a saved result of 0 from cell.value, and the reader must not lose it.
      fc.oneof(fc.constant(0), fc.double({ min: -10, max: 10, noNaN: true })).map((r): Entry => ({
        spec: { formula: 'PI()*2', result: r === 0 ? 0 : r },
        value: r === 0 ? 0 : r,
      })),
      fc.constant(missing({ formula: 'NOW()-NOW()' }, 'invalid')),
      fc.constant(missing({ error: '#VALUE!' }, 'invalid')),
    );
  }
  return fc.oneof(...options);
}

const plateArbitrary = fc.constantFrom<Format>('xlsx', 'comma', 'semicolon', 'tab').chain((format) =>
  fc.record({
    format: fc.constant(format),
    plate: fc.constantFrom<96 | 384>(96, 384),
    top: fc.integer({ min: 1, max: 30 }),
    left: fc.integer({ min: 0, max: 12 }),
    cells: fc.array(cellArbitrary(format), { minLength: 384, maxLength: 384 }),
  }),
);

async function writePlate(
  p: { format: Format; plate: 96 | 384; top: number; left: number; cells: Entry[] },
  merges: string[] = [],
) {
  const sheet = new SheetSpec('Plate');
  sheet.put(p.top - 1, p.left, 'Absorbance 405 nm');
  const corner = `${String.fromCharCode(65 + p.left)}${p.top + 1}`;
  const block = writePlateGrid(sheet, corner, p.plate, p.cells.slice(0, p.plate));
  sheet.merges.push(...merges);
  const bytes =
    p.format === 'xlsx'
      ? await toXlsx([sheet])
      : toText(sheet, {
          delimiter: p.format === 'comma' ? ',' : p.format === 'semicolon' ? ';' : '\t',
          decimalComma: p.format !== 'comma',
        });
  return { bytes, block: { ...block, label: 'Absorbance 405 nm' }, corner };
}

describe('plates holding huge numbers, markers, empty cells, formulas', () => {
  it('read every cell right: numbers as numbers, the rest null with its reason', async () => {
    await fc.assert(
      fc.asyncProperty(plateArbitrary, async (p) => {
        const { bytes, block } = await writePlate(p);
        const result = await parseReaderFile(bytes, p.format === 'xlsx' ? 'plate.xlsx' : 'plate.csv');
        expectWellFormed(result);
        expect(result.ok).toBe(true);
        if (result.ok)
          expect(toCliJson(result.value).blocks).toEqual([{ ...block, sheet: result.value.blocks[0].sheet }]);
      }),
      { numRuns: 40 },
    );
  });
});

describe('merged cells', () => {
  const mergeArbitrary = fc.array(
    fc.record({
      row: fc.integer({ min: 0, max: 20 }),
      column: fc.integer({ min: 0, max: 30 }),
      width: fc.integer({ min: 1, max: 4 }),
      height: fc.integer({ min: 1, max: 3 }),
    }),
    { maxLength: 4 },
  );
  const letters = (c: number): string =>
    c < 26
      ? String.fromCharCode(65 + c)
      : letters(Math.floor(c / 26) - 1) + String.fromCharCode(65 + (c % 26));

  it('anywhere over a plate: a typed error, or the plate with only merged-over wells missing', async () => {
    await fc.assert(
      fc.asyncProperty(mergeArbitrary, fc.constantFrom<96 | 384>(96, 384), async (rects, plate) => {
        // Non-overlapping rectangles only: spreadsheet programs cannot merge a cell twice.
        const taken = new Set<string>();
        const kept = rects.filter((r) => {
          const cells = [];
          for (let i = 0; i < r.height; i++)
            for (let j = 0; j < r.width; j++) cells.push(`${r.row + i},${r.column + j}`);
          if (cells.length < 2 || cells.some((c) => taken.has(c))) return false;
          cells.forEach((c) => taken.add(c));
          return true;
        });
        const merges = kept.map(
          (r) => `${letters(r.column)}${r.row + 1}:${letters(r.column + r.width - 1)}${r.row + r.height}`,
        );
        const cells = wellNames(384).map((_, i) => num(i / 1000));
        const { bytes, block } = await writePlate({ format: 'xlsx', plate, top: 2, left: 1, cells }, merges);
        const result = await parseReaderFile(bytes, 'merged.xlsx');
        expectWellFormed(result);
        if (!result.ok) return;
        for (const found of toCliJson(result.value).blocks) {
          if (found.kind !== 'endpoint') continue;
          for (const [well, value] of Object.entries(found.wells)) {
            // Either the written value, or missing because a merge covers the cell.
            if (value !== null) expect(value).toBe(block.wells[well]);
            else expect(found.flags[well]).toBe('invalid');
          }
        }
      }),
      { numRuns: 40 },
    );
  });
});
