// Workbooks whose zip is intact but whose XML inside is broken or odd: exceljs must not crash the
// parser. The archive is rebuilt with correct checksums, so the damage reaches exceljs itself.
import { crc32, inflateRawSync } from 'node:zlib';
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { parseReaderFile } from '../../../server/import';
import { readZipDirectory } from '../../../server/import/zip-directory';
import { buildFixtures, type Fixture } from '../../fixtures/readers/make-fixtures';
import { expectWellFormed } from './invariants';

type Parts = Map<string, Buffer>;

function unzip(bytes: Buffer): Parts {
  const parts: Parts = new Map();
  for (const entry of readZipDirectory(bytes)) {
    const at = entry.localOffset;
    const start = at + 30 + bytes.readUInt16LE(at + 26) + bytes.readUInt16LE(at + 28);
    const packed = bytes.subarray(start, start + entry.packed);
    parts.set(entry.name, entry.method === 8 ? inflateRawSync(packed) : Buffer.from(packed));
  }
  return parts;
}

/** A stored (uncompressed) zip with correct sizes and CRC-32 (PKWARE APPNOTE 4.3.7, 4.3.12, 4.3.16). */
function zip(parts: Parts): Buffer {
  const chunks: Buffer[] = [];
  const directory: Buffer[] = [];
  let offset = 0;
  for (const [name, data] of parts) {
    const nameBytes = Buffer.from(name);
    const header = Buffer.alloc(30);
    header.writeUInt32LE(0x04034b50, 0);
    header.writeUInt16LE(20, 4);
    header.writeUInt32LE(crc32(data), 14);
    header.writeUInt32LE(data.length, 18);
    header.writeUInt32LE(data.length, 22);
    header.writeUInt16LE(nameBytes.length, 26);
    const entry = Buffer.alloc(46);
    entry.writeUInt32LE(0x02014b50, 0);
    entry.writeUInt16LE(20, 4);
    entry.writeUInt16LE(20, 6);
    entry.writeUInt32LE(crc32(data), 16);
    entry.writeUInt32LE(data.length, 20);
    entry.writeUInt32LE(data.length, 24);
    entry.writeUInt16LE(nameBytes.length, 28);
    entry.writeUInt32LE(offset, 42);
    chunks.push(header, nameBytes, data);
    directory.push(entry, nameBytes);
    offset += 30 + nameBytes.length + data.length;
  }
  const dir = Buffer.concat(directory);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(parts.size, 8);
  end.writeUInt16LE(parts.size, 10);
  end.writeUInt32LE(dir.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...chunks, dir, end]);
}

let books: Fixture[];
beforeAll(async () => {
  books = (await buildFixtures()).filter((f) => f.name.endsWith('.xlsx'));
});

describe('workbooks rebuilt from their parts', () => {
  it('read exactly as the originals when nothing is changed (the rebuilding itself is sound)', async () => {
    for (const book of books) {
      const result = await parseReaderFile(zip(unzip(book.bytes)), book.name);
      expect(result.ok && result.value.blocks.length, book.name).toBe(book.expected!.blocks.length);
    }
  });

  it('with a part cut short, junk in its XML, or a part missing: a typed error or well-formed blocks', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.nat(),
        fc.nat(),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.constantFrom('cut', 'junk', 'drop', 'tags'),
        fc.uint8Array({ minLength: 1, maxLength: 40 }),
        async (pickBook, pickPart, fraction, how, junk) => {
          const book = books[pickBook % books.length];
          const parts = unzip(book.bytes);
          const names = [...parts.keys()];
          const name = names[pickPart % names.length];
          const data = parts.get(name)!;
          const at = Math.floor(fraction * data.length);
          if (how === 'drop') parts.delete(name);
          if (how === 'cut') parts.set(name, data.subarray(0, at));
          if (how === 'junk')
            parts.set(name, Buffer.concat([data.subarray(0, at), Buffer.from(junk), data.subarray(at)]));
          if (how === 'tags')
            parts.set(
              name,
              Buffer.concat([
                data.subarray(0, at),
                Buffer.from('<c r="ZZZ0" t="q"><v>x</v></c></row><row r="-1">'),
                data.subarray(at),
              ]),
            );
          expectWellFormed(await parseReaderFile(zip(parts), book.name));
        },
      ),
      { numRuns: 150 },
    );
  });
});
