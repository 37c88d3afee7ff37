// The command-line format of /shared/reference/README.md ("Reader files"), key for key: the
// richer detail of the library result stays out of it.
import type { ParsedReaderFile, ReaderBlockJson, ReaderFileJson } from './types';

export function toCliJson(parsed: ParsedReaderFile): ReaderFileJson {
  const blocks: ReaderBlockJson[] = parsed.blocks.map((block) =>
    block.kind === 'endpoint'
      ? {
          kind: 'endpoint',
          plateFormat: block.plateFormat,
          sheet: block.sheet,
          label: block.label,
          wells: block.wells,
          flags: block.flags,
        }
      : {
          kind: 'kinetic',
          plateFormat: block.plateFormat,
          sheet: block.sheet,
          label: block.label,
          times_s: block.times_s,
          wells: block.wells,
          flags: block.flags,
        },
  );
  return { file: parsed.file, blocks };
}
