// Parse speed of a 384-well kinetic workbook with 120 reads (issue 5 "Speed"):
// exceljs alone reading it, against parseReaderFile (exceljs + detection), and peak memory.
//   npx tsx bench/import.ts [--runs 5]
// Each measurement runs in its own child process so its peak memory (max RSS) is its own.
// GENERATED DATA: the workbook is invented here (seeded), not a measurement.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import ExcelJS from 'exceljs';
import { parseReaderFile } from '../server/import';

import { makeWorkbook, READS } from './lib/kinetic-workbook';

type Mode = 'none' | 'exceljs' | 'parse' | 'paired';

async function loadWithExceljs(bytes: Buffer): Promise<void> {
  await new ExcelJS.Workbook().xlsx.load(bytes as unknown as Parameters<ExcelJS.Xlsx['load']>[0]);
}

async function parseWithBellwether(bytes: Buffer): Promise<void> {
  const result = await parseReaderFile(bytes, 'bench.xlsx');
  if (
    !result.ok ||
    result.value.blocks[0].kind !== 'kinetic' ||
    result.value.blocks[0].times_s.length !== READS
  ) {
    throw new Error(`parse did not find the ${READS}-read table`);
  }
}

/**
 * No collection is forced before a run: V8 then shrinks the heap and the next exceljs load took
 * about twice as long, which flattered the ratio. In 'paired' mode the two alternate, so each pays
 * as often for the other's garbage as for its own.
 */
async function timed(run: () => Promise<void>): Promise<number> {
  const start = performance.now();
  await run();
  return performance.now() - start;
}

/** 'paired' runs the two in turn in one process, so both see the same machine load (the fair ratio). */
async function child(mode: Mode, file: string, runs: number): Promise<void> {
  const bytes = readFileSync(file);
  const times: number[] = [];
  const ratios: number[] = [];
  for (let i = 0; i < runs; i++) {
    if (mode === 'exceljs') times.push(await timed(() => loadWithExceljs(bytes)));
    if (mode === 'parse') times.push(await timed(() => parseWithBellwether(bytes)));
    if (mode === 'paired') {
      // Alternate which goes first, so neither always runs on the warmer (or the more loaded) side.
      const exceljsFirst = i % 2 === 0;
      const first = await timed(() => (exceljsFirst ? loadWithExceljs(bytes) : parseWithBellwether(bytes)));
      const second = await timed(() => (exceljsFirst ? parseWithBellwether(bytes) : loadWithExceljs(bytes)));
      if (i > 0) ratios.push(exceljsFirst ? second / first : first / second); // pair 0 pays for compiling both
    }
  }
  process.stdout.write(JSON.stringify({ times, ratios, maxRssMb: process.resourceUsage().maxRSS / 1024 }));
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main(): Promise<void> {
  const runs = Number(process.argv[process.argv.indexOf('--runs') + 1]) || 5;
  const dir = mkdtempSync(join(tmpdir(), 'bellwether-bench-'));
  const file = join(dir, 'kinetic-384x120.xlsx');
  try {
    writeFileSync(file, await makeWorkbook());
    const self = fileURLToPath(import.meta.url);
    const measure = (mode: Mode) =>
      JSON.parse(
        execFileSync(
          process.execPath,
          ['--expose-gc', '--import', 'tsx', self, '--child', mode, file, String(runs)],
          {
            encoding: 'utf8',
          },
        ),
      ) as { times: number[]; ratios: number[]; maxRssMb: number };
    const base = measure('none');
    const exceljs = measure('exceljs');
    const parse = measure('parse');
    const paired = measure('paired');
    const size = readFileSync(file).length;
    const lines = [
      `workbook: 384 wells x ${READS} reads (+ time, temperature), ${(size / 1024).toFixed(0)} KiB, ${runs} runs each`,
      `exceljs load alone   median ${median(exceljs.times).toFixed(0)} ms  (first run ${exceljs.times[0].toFixed(0)} ms)  peak RSS ${exceljs.maxRssMb.toFixed(0)} MB`,
      `parseReaderFile      median ${median(parse.times).toFixed(0)} ms  (first run ${parse.times[0].toFixed(0)} ms)  peak RSS ${parse.maxRssMb.toFixed(0)} MB`,
      `parse / exceljs, paired runs in one process: median ${median(paired.ratios).toFixed(2)} (min ${Math.min(...paired.ratios).toFixed(2)}, max ${Math.max(...paired.ratios).toFixed(2)})`,
      `process baseline (tsx and modules loaded, no work) peak RSS ${base.maxRssMb.toFixed(0)} MB; machine load average ${loadavg()[0].toFixed(1)} on ${cpus().length} CPUs`,
    ];
    process.stdout.write(`${lines.join('\n')}\n`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

const childAt = process.argv.indexOf('--child');
if (childAt >= 0) {
  await child(
    process.argv[childAt + 1] as Mode,
    process.argv[childAt + 2],
    Number(process.argv[childAt + 3]),
  );
} else {
  await main();
}
