// The content, not the file name, decides how a file is read: a zip archive is tried as an
// Excel workbook; anything else must decode to text; known binary formats are refused by name.
import { ImportError } from './errors';

export const EXPECTED =
  'Bellwether reads Excel workbooks (.xlsx) and text tables (.csv, .tsv or .txt separated by commas, semicolons or tabs)';

export type FileKind = 'zip' | 'text';

const startsWith = (bytes: Uint8Array, magic: number[]) => magic.every((b, i) => bytes[i] === b);

/** Known binary formats a scientist might upload by mistake (magic numbers from each format's specification). */
const REFUSED: { magic: number[]; what: string; advice: string }[] = [
  {
    magic: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1],
    what: 'an old-style Excel 97–2003 workbook (.xls) or another legacy Office file',
    advice: 'Open it in a spreadsheet program and save it as .xlsx or .csv.',
  },
  {
    magic: [0x25, 0x50, 0x44, 0x46],
    what: 'a PDF document',
    advice: 'Export the reader data as .xlsx or .csv instead.',
  },
  { magic: [0x1f, 0x8b], what: 'a gzip-compressed file', advice: 'Unpack it first.' },
  {
    magic: [0x89, 0x50, 0x4e, 0x47],
    what: 'a PNG image',
    advice: 'Export the reader data as .xlsx or .csv instead.',
  },
  {
    magic: [0xff, 0xd8, 0xff],
    what: 'a JPEG image',
    advice: 'Export the reader data as .xlsx or .csv instead.',
  },
  { magic: [0x52, 0x61, 0x72, 0x21], what: 'a RAR archive', advice: 'Unpack it first.' },
  { magic: [0x37, 0x7a, 0xbc, 0xaf], what: 'a 7-Zip archive', advice: 'Unpack it first.' },
];

export function sniff(bytes: Uint8Array): FileKind {
  if (startsWith(bytes, [0x50, 0x4b, 0x03, 0x04])) return 'zip';
  if (startsWith(bytes, [0x50, 0x4b, 0x05, 0x06])) {
    throw new ImportError(
      'unsupported_type',
      `The file is an empty zip archive, not an Excel workbook. ${EXPECTED}.`,
    );
  }
  for (const known of REFUSED) {
    if (startsWith(bytes, known.magic)) {
      throw new ImportError('unsupported_type', `The file is ${known.what}. ${EXPECTED}. ${known.advice}`);
    }
  }
  return 'text';
}
