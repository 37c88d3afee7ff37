// A look at an xlsx file's zip directory before exceljs unpacks it: this refuses damaged or cut
// archives, zips that are not workbooks, too many sheets and zip bombs, cheaply and cleanly. Then
// every part is unpacked once and its CRC-32 checked, because the zip library inside exceljs does
// not check them, and a damaged sheet could otherwise be read with wrong numbers in it.
// Layout of the records: PKWARE APPNOTE.TXT, sections 4.3.7, 4.3.12 and 4.3.16.
import { crc32, inflateRawSync } from 'node:zlib';
import { ImportError } from './errors';
import { MAX_SHEETS, MAX_UNPACKED_BYTES } from './limits';
import { EXPECTED } from './sniff';

const END_OF_DIRECTORY = 0x06054b50;
const DIRECTORY_ENTRY = 0x02014b50;
const LOCAL_HEADER = 0x04034b50;
const STORED = 0;
const DEFLATED = 8;

export interface ZipEntry {
  name: string;
  method: number;
  crc: number;
  packed: number;
  unpacked: number;
  localOffset: number;
}

const damaged = (why: string) =>
  new ImportError(
    'unreadable_workbook',
    `The file starts like an Excel workbook (.xlsx) but ${why}: it is damaged or was cut short. Export or copy it again.`,
  );

export function readZipDirectory(bytes: Uint8Array): ZipEntry[] {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const end = findEndOfDirectory(view);
  if (end < 0) throw damaged('its table of contents (the zip directory at the end) is missing');
  const count = view.getUint16(end + 10, true);
  let offset = view.getUint32(end + 16, true);
  const entries: ZipEntry[] = [];
  for (let i = 0; i < count; i++) {
    if (offset + 46 > bytes.length || view.getUint32(offset, true) !== DIRECTORY_ENTRY) {
      throw damaged('its table of contents (the zip directory) is broken');
    }
    const nameLength = view.getUint16(offset + 28, true);
    if (offset + 46 + nameLength > bytes.length)
      throw damaged('its table of contents (the zip directory) is broken');
    entries.push({
      name: new TextDecoder().decode(bytes.subarray(offset + 46, offset + 46 + nameLength)),
      method: view.getUint16(offset + 10, true),
      crc: view.getUint32(offset + 16, true),
      packed: view.getUint32(offset + 20, true),
      unpacked: view.getUint32(offset + 24, true), // 0xFFFFFFFF (ZIP64) counts as 4 GB: refused as too large
      localOffset: view.getUint32(offset + 42, true),
    });
    offset += 46 + nameLength + view.getUint16(offset + 30, true) + view.getUint16(offset + 32, true);
  }
  return entries;
}

/** The end-of-directory record sits in the last 22 bytes, or before a comment of up to 65,535 bytes. */
function findEndOfDirectory(view: DataView): number {
  const last = view.byteLength - 22;
  for (let i = last; i >= 0 && i >= last - 65_535; i--) {
    if (view.getUint32(i, true) === END_OF_DIRECTORY) return i;
  }
  return -1;
}

/** Throws unless the archive is a workbook of sane size whose every part is intact. */
export function checkWorkbookArchive(bytes: Uint8Array): void {
  const entries = readZipDirectory(bytes);
  const names = entries.map((entry) => entry.name.replace(/^\//, ''));
  if (!names.includes('xl/workbook.xml')) {
    throw new ImportError(
      'unsupported_type',
      `The file is a zip archive but not an Excel workbook (it has no xl/workbook.xml). ${EXPECTED}.`,
    );
  }
  const sheets = names.filter((name) => /^xl\/worksheets\/[^/]+\.xml$/.test(name)).length;
  if (sheets > MAX_SHEETS) {
    throw new ImportError(
      'too_many_sheets',
      `The workbook has ${sheets} sheets; Bellwether reads at most ${MAX_SHEETS}. Keep only the sheets with reader data.`,
    );
  }
  const unpackedBytes = entries.reduce((sum, entry) => sum + entry.unpacked, 0);
  if (unpackedBytes > MAX_UNPACKED_BYTES) {
    const mb = Math.round(unpackedBytes / 1024 / 1024);
    throw new ImportError(
      'too_large',
      `The workbook unpacks to ${mb} MB, more than the ${MAX_UNPACKED_BYTES / 1024 / 1024} MB Bellwether accepts. Keep only the sheets with reader data.`,
    );
  }
  for (const entry of entries) verifyEntry(bytes, entry);
}

/** Unpacks one part and compares its size and CRC-32 with the directory's. */
function verifyEntry(bytes: Uint8Array, entry: ZipEntry): void {
  if (entry.name.endsWith('/')) return; // a folder
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const at = entry.localOffset;
  if (at + 30 > bytes.length || view.getUint32(at, true) !== LOCAL_HEADER) {
    throw damaged(`its part '${entry.name}' cannot be found`);
  }
  const nameLength = view.getUint16(at + 26, true);
  const localName = new TextDecoder().decode(bytes.subarray(at + 30, at + 30 + nameLength));
  // The zip library inside exceljs trusts the local name: a garbled one would drop the part unseen.
  if (localName !== entry.name)
    throw damaged(`its part '${entry.name}' is recorded under two different names`);
  const start = at + 30 + nameLength + view.getUint16(at + 28, true);
  if (start + entry.packed > bytes.length) throw damaged(`its part '${entry.name}' is cut off`);
  const packed = bytes.subarray(start, start + entry.packed);
  let data: Uint8Array;
  if (entry.method === STORED) {
    data = packed;
  } else if (entry.method === DEFLATED) {
    try {
      data = inflateRawSync(packed, { maxOutputLength: Math.max(1, entry.unpacked) });
    } catch {
      throw damaged(`its part '${entry.name}' cannot be unpacked`);
    }
  } else {
    throw damaged(
      `its part '${entry.name}' is packed in a way spreadsheet files do not use (method ${entry.method})`,
    );
  }
  if (data.length !== entry.unpacked || crc32(data) !== entry.crc) {
    throw damaged(`its part '${entry.name}' does not match its checksum`);
  }
}
