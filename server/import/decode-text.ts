// Decoding a text table: a byte-order mark decides (UTF-8, UTF-16 LE/BE); without one, UTF-16
// recognised by its zero bytes, then strict UTF-8, then Latin-1 (Windows-1252), which accepts any
// bytes — so binary content is recognised afterwards by its control characters.
import { ImportError } from './errors';
import { EXPECTED } from './sniff';

export interface DecodedText {
  text: string;
  encoding: 'utf-8' | 'utf-16le' | 'utf-16be' | 'windows-1252';
}

export function decodeText(bytes: Uint8Array): DecodedText {
  const decoded = decode(bytes);
  if (looksBinary(decoded.text)) {
    throw new ImportError(
      'unsupported_type',
      `The file is neither an Excel workbook nor readable text (it holds binary data). ${EXPECTED}.`,
    );
  }
  return decoded;
}

function decode(bytes: Uint8Array): DecodedText {
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) {
    return { text: new TextDecoder('utf-8').decode(bytes.subarray(3)), encoding: 'utf-8' };
  }
  if (bytes[0] === 0xff && bytes[1] === 0xfe)
    return { text: new TextDecoder('utf-16le').decode(bytes.subarray(2)), encoding: 'utf-16le' };
  if (bytes[0] === 0xfe && bytes[1] === 0xff)
    return { text: new TextDecoder('utf-16be').decode(bytes.subarray(2)), encoding: 'utf-16be' };
  // Before UTF-8: ASCII written as UTF-16 is also valid UTF-8, full of NUL characters.
  const utf16 = utf16WithoutMark(bytes);
  if (utf16) return { text: new TextDecoder(utf16).decode(bytes), encoding: utf16 };
  try {
    return { text: new TextDecoder('utf-8', { fatal: true }).decode(bytes), encoding: 'utf-8' };
  } catch {
    // not UTF-8: Latin-1 below
  }
  return { text: new TextDecoder('windows-1252').decode(bytes), encoding: 'windows-1252' };
}

/** ASCII text in UTF-16 has a zero in every other byte: odd bytes for LE, even bytes for BE. */
function utf16WithoutMark(bytes: Uint8Array): 'utf-16le' | 'utf-16be' | null {
  const n = Math.min(bytes.length, 4096) & ~1;
  if (n < 4) return null;
  let evenZeros = 0;
  let oddZeros = 0;
  for (let i = 0; i < n; i += 2) {
    if (bytes[i] === 0) evenZeros++;
    if (bytes[i + 1] === 0) oddZeros++;
  }
  const pairs = n / 2;
  if (oddZeros > 0.4 * pairs && evenZeros < 0.05 * pairs) return 'utf-16le';
  if (evenZeros > 0.4 * pairs && oddZeros < 0.05 * pairs) return 'utf-16be';
  return null;
}

/**
 * Text files hold printable characters, tabs and line breaks. A NUL, or more than 1 % other
 * control characters (C0, DEL, C1) or undecodable characters, means binary content.
 */
function looksBinary(text: string): boolean {
  let odd = 0;
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code === 0) return true;
    const control =
      (code < 0x20 && code !== 0x09 && code !== 0x0a && code !== 0x0d && code !== 0x0c) ||
      (code >= 0x7f && code <= 0x9f);
    if (control || code === 0xfffd) odd++;
  }
  return odd > 0.01 * text.length;
}
