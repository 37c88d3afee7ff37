// `bellwether parse FILE`: what the reader-file parser finds, as the JSON of
// /shared/reference/README.md ("Reader files") on standard output: indented by 2 spaces, with
// arrays of numbers on one line (a 384-well run of 120 reads stays readable).
// Notes (skipped columns, assumed units) go to standard error; exit 1 when nothing is found or
// the file cannot be read, 2 on wrong usage.
import { readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import { parseReaderFile, toCliJson } from '../import';

const USAGE =
  'usage: bellwether parse FILE   (an .xlsx workbook or a .csv/.tsv/.txt table from a plate reader)\n';

export async function run(args: string[]): Promise<number> {
  if (args.includes('--help') || args.includes('-h')) {
    process.stdout.write(USAGE);
    return 0;
  }
  if (args.length !== 1) {
    process.stderr.write(`bellwether parse: expected exactly one file\n${USAGE}`);
    return 2;
  }
  const path = args[0];
  let bytes: Buffer;
  try {
    bytes = await readFile(path);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const why =
      code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (error as Error).message;
    process.stderr.write(`bellwether parse: cannot open '${path}': ${why}\n`);
    return 1;
  }
  const result = await parseReaderFile(bytes, basename(path));
  if (!result.ok) {
    process.stderr.write(`bellwether parse: ${result.error.message}\n`);
    for (const note of result.error.notes ?? []) process.stderr.write(`note: ${note.message}\n`);
    return 1;
  }
  for (const note of result.value.notes) process.stderr.write(`note: ${note.message}\n`);
  process.stdout.write(`${formatJson(toCliJson(result.value))}\n`);
  return 0;
}

/** JSON with 2-space indentation; arrays of plain values (times, a well's reads) stay on one line. */
export function formatJson(value: unknown, indent = ''): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.every((item) => item === null || typeof item !== 'object'))
      return `[${value.map((item) => JSON.stringify(item)).join(', ')}]`;
    return value.length === 0
      ? '[]'
      : `[\n${value.map((item) => inner + formatJson(item, inner)).join(',\n')}\n${indent}]`;
  }
  const entries = Object.entries(value as Record<string, unknown>);
  if (entries.length === 0) return '{}';
  return `{\n${entries.map(([key, item]) => `${inner}${JSON.stringify(key)}: ${formatJson(item, inner)}`).join(',\n')}\n${indent}}`;
}
