// A look at an xlsx file's zip directory before exceljs unpacks it: this refuses damaged or cut
// archives, zips that are not workbooks, too many sheets and zip bombs, cheaply and cleanly.
// Layout of the records: PKWARE APPNOTE.TXT, sections 4.3.12 and 4.3.16.
import { ImportError } from './errors';
import { MAX_SHEETS, MAX_UNPACKED_BYTES } from './limits';
import { EXPECTED } from './sniff';

const END_OF_DIRECTORY = 0x06054b50;
const DIRECTORY_ENTRY = 0x02014b50;

export interface ZipDirectory {
  names: string[];
  unpackedBytes: number;
}

const damaged = (why: string) =>
  new ImportError(
    'unreadable_workbook',
    `The file starts like an Excel workbook (.xlsx) but ${why}: it is damaged or was cut short. Export or copy it again.`,
  );

export function readZipDirectory(bytes: Uint8Array): ZipDirectory {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const end = findEndOfDirectory(view);
  if (end < 0) throw damaged('its table of contents (the zip directory at the end) is missing');
  const count = view.getUint16(end + 10, true);
  let offset = view.getUint32(end + 16, true);
  const names: string[] = [];
  let unpackedBytes = 0;
  for (let i = 0; i < count; i++) {
    if (offset + 46 > bytes.length || view.getUint32(offset, true) !== DIRECTORY_ENTRY) {
      throw damaged('its table of contents (the zip directory) is broken');
    }
    const unpacked = view.getUint32(offset + 24, true);
    const nameLength = view.getUint16(offset + 28, true);
    const extraLength = view.getUint16(offset + 30, true);
    const commentLength = view.getUint16(offset + 32, true);
    if (offset + 46 + nameLength > bytes.length)
      throw damaged('its table of contents (the zip directory) is broken');
    names.push(new TextDecoder().decode(bytes.subarray(offset + 46, offset + 46 + nameLength)));
    unpackedBytes += unpacked; // 0xFFFFFFFF (a ZIP64 entry) counts as 4 GB, so it is refused below
    offset += 46 + nameLength + extraLength + commentLength;
  }
  return { names, unpackedBytes };
}

/** The end-of-directory record sits in the last 22 bytes, or before a comment of up to 65,535 bytes. */
function findEndOfDirectory(view: DataView): number {
  const last = view.byteLength - 22;
  for (let i = last; i >= 0 && i >= last - 65_535; i--) {
    if (view.getUint32(i, true) === END_OF_DIRECTORY) return i;
  }
  return -1;
}

/** Throws unless the archive looks like a workbook of sane size. */
export function checkWorkbookArchive(bytes: Uint8Array): void {
  const { names, unpackedBytes } = readZipDirectory(bytes);
  if (!names.some((name) => name.replace(/^\//, '') === 'xl/workbook.xml')) {
    throw new ImportError(
      'unsupported_type',
      `The file is a zip archive but not an Excel workbook (it has no xl/workbook.xml). ${EXPECTED}.`,
    );
  }
  const sheets = names.filter((name) => /^\/?xl\/worksheets\/[^/]+\.xml$/.test(name)).length;
  if (sheets > MAX_SHEETS) {
    throw new ImportError(
      'too_many_sheets',
      `The workbook has ${sheets} sheets; Bellwether reads at most ${MAX_SHEETS}. Keep only the sheets with reader data.`,
    );
  }
  if (unpackedBytes > MAX_UNPACKED_BYTES) {
    const mb = Math.round(unpackedBytes / 1024 / 1024);
    throw new ImportError(
      'too_large',
      `The workbook unpacks to ${mb} MB, more than the ${MAX_UNPACKED_BYTES / 1024 / 1024} MB Bellwether accepts. Keep only the sheets with reader data.`,
    );
  }
}
