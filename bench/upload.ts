// Upload-to-stored time and memory of a 384-well kinetic workbook with 120 reads (issue 5 "Speed"):
// the real app in-process on a throwaway PostgreSQL cluster, listening once as server/index.ts
// does; each upload POSTs the file and its selection over HTTP to a fresh plate and waits for the
// 201 (parse, raw file, read and 384 well records stored in one transaction). Targets: under
// 1.5 s, within 1.5x of exceljs alone loading the same bytes, peak memory under 300 MB.
//   npx tsx bench/upload.ts [--runs 15]
// What is measured, each part in its own child process (this one only runs the database):
// - time: exceljs alone and the upload in one process, in blocks of two runs of one kind, the
//   blocks alternating (E E U U, U U E E, ...) so both see the same machine load. Only the second
//   run of a block is timed: it follows a run of its own kind, so each pays for the garbage of its
//   own kind. (In strict alternation an upload after an exceljs load paid for the young objects
//   exceljs left behind, a scavenge of about 20 ms.) The first round warms up and is reported
//   apart. The ratio is median upload / median exceljs over the same rounds, with the median of
//   the per-round ratios beside it. No collection is forced before a run: V8 then shrinks the heap
//   and exceljs alone took about twice as long, which made the ratio look better than it is.
//   Single runs vary by +-40 % on this 2-core machine; use 15 rounds or more.
// - memory: the peak resident memory (Linux VmHWM, reset after one warm-up run and a collection)
//   of a process that runs the app and only uploads, over one upload and over all of them, beside
//   its resident memory before (modules loaded, signed in); the same for a process with the same
//   modules that only loads the workbook with exceljs, for scale. Over many runs the peak is mostly
//   garbage V8 has not collected yet (after a forced collection the heap is back to its start).
// GENERATED DATA: the workbook and the records are invented (bench/lib).
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import ExcelJS from 'exceljs';
import { createDb, runMigrations } from '../server/db/client';
import { createDatabaseIfMissing, freePort, removeCluster, startCluster } from '../server/db/postgres';
import { seedBenchWorld, startBenchApp, type BenchWorld } from './lib/bench-app';
import { makeWorkbook, READS } from './lib/kinetic-workbook';

type Job = { url: string; world: BenchWorld; file: string; runs: number };
type Mode = 'timing' | 'upload-memory' | 'exceljs-memory';
type Timing = { excel: number[]; upload: number[] };
type Memory = { startMb: number; onePeakMb: number; peakMb: number };

const selection = JSON.stringify([{ type: 'kinetic', blockIndex: 0, wavelengthNm: 405 }]);
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const gc = () => (globalThis as { gc?: () => void }).gc?.();
const mb = (bytes: number) => bytes / 1024 / 1024;

async function loadWithExceljs(bytes: Buffer): Promise<void> {
  await new ExcelJS.Workbook().xlsx.load(bytes as unknown as Parameters<ExcelJS.Xlsx['load']>[0]);
}

async function timed(run: () => Promise<void>): Promise<number> {
  const start = performance.now();
  await run();
  return performance.now() - start;
}

/** Linux keeps the peak resident size (VmHWM) and lets a process reset it by writing 5 to clear_refs. */
function resetPeak(): void {
  fs.writeFileSync('/proc/self/clear_refs', '5');
}
function peakMb(): number {
  const kib = /VmHWM:\s+(\d+) kB/.exec(fs.readFileSync('/proc/self/status', 'utf8'));
  if (!kib) throw new Error('no VmHWM in /proc/self/status');
  return Number(kib[1]) / 1024;
}

async function child(mode: Mode, job: Job): Promise<Timing | Memory> {
  const bytes = fs.readFileSync(job.file);
  /** One warm-up run (code compiled), a collection, then the peak over one run and over all of them. */
  const memory = async (run: () => Promise<void>): Promise<Memory> => {
    await run();
    gc();
    resetPeak();
    const startMb = mb(process.memoryUsage().rss);
    await run();
    const onePeakMb = peakMb();
    for (let i = 1; i < job.runs + 1; i++) await run();
    return { startMb, onePeakMb, peakMb: peakMb() };
  };
  if (mode === 'exceljs-memory') return memory(() => loadWithExceljs(bytes));
  const app = await startBenchApp(job.url, job.world);
  try {
    if (mode === 'upload-memory')
      return await memory(async () => app.upload(await app.newPlate(), bytes, selection));
    const excel: number[] = [];
    const upload: number[] = [];
    const excelBlock = async () => {
      await loadWithExceljs(bytes);
      excel.push(await timed(() => loadWithExceljs(bytes)));
    };
    const uploadBlock = async () => {
      const [first, second] = [await app.newPlate(), await app.newPlate()];
      await app.upload(first, bytes, selection);
      upload.push(await timed(() => app.upload(second, bytes, selection)));
    };
    for (let i = 0; i < job.runs + 1; i++) {
      // Alternate which block goes first, so neither always runs on the warmer (or more loaded) side.
      if (i % 2 === 0) {
        await excelBlock();
        await uploadBlock();
      } else {
        await uploadBlock();
        await excelBlock();
      }
    }
    return { excel, upload };
  } finally {
    await app.close();
  }
}

async function main(): Promise<void> {
  const runsAt = process.argv.indexOf('--runs');
  const runs = runsAt > 0 ? Number(process.argv[runsAt + 1]) : 15;
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bellwether-bench-pg-'));
  const cluster = startCluster({ dataDir, port: await freePort(), throwaway: true, log: () => {} });
  try {
    await createDatabaseIfMissing(cluster.adminUrl('postgres'), 'bench');
    const url = cluster.adminUrl('bench');
    await runMigrations(url);
    const { pool, db } = createDb(url);
    const world = await seedBenchWorld(db);
    await pool.end();
    const bytes = await makeWorkbook();
    const file = path.join(dataDir, 'kinetic-384x120.xlsx');
    fs.writeFileSync(file, bytes);
    const job = JSON.stringify({ url, world, file, runs } satisfies Job);
    const self = fileURLToPath(import.meta.url);
    const measure = <T>(mode: Mode) =>
      JSON.parse(
        execFileSync(process.execPath, ['--expose-gc', '--import', 'tsx', self, '--child', mode, job], {
          encoding: 'utf8',
        }),
      ) as T;

    const { excel, upload } = measure<Timing>('timing');
    const uploadMemory = measure<Memory>('upload-memory');
    const excelMemory = measure<Memory>('exceljs-memory');
    const ratio = median(upload.slice(1)) / median(excel.slice(1));
    const paired = median(upload.slice(1).map((ms, i) => ms / excel[i + 1]));
    process.stdout.write(
      [
        `workbook: 384 wells x ${READS} reads, ${(bytes.length / 1024).toFixed(0)} KiB; ${runs} timed runs of each`,
        `first (warm-up) round: exceljs ${excel[0].toFixed(0)} ms, upload-to-stored ${upload[0].toFixed(0)} ms`,
        `exceljs load alone      median ${median(excel.slice(1)).toFixed(0)} ms`,
        `upload-to-stored (HTTP) median ${median(upload.slice(1)).toFixed(0)} ms   target < 1500 ms`,
        `ratio upload / exceljs  ${ratio.toFixed(2)} (median of per-round ratios ${paired.toFixed(2)})   target <= 1.5`,
        `app process, uploads only: RSS ${uploadMemory.startMb.toFixed(0)} MB before; peak ${uploadMemory.onePeakMb.toFixed(0)} MB over one upload, ${uploadMemory.peakMb.toFixed(0)} MB over ${runs + 1}   target < 300 MB`,
        `same modules, exceljs loads only: RSS ${excelMemory.startMb.toFixed(0)} MB before; peak ${excelMemory.onePeakMb.toFixed(0)} MB over one load, ${excelMemory.peakMb.toFixed(0)} MB over ${runs + 1}`,
        `load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} CPUs`,
      ].join('\n') + '\n',
    );
  } finally {
    cluster.stop();
    removeCluster(dataDir);
  }
}

const childAt = process.argv.indexOf('--child');
if (childAt >= 0) {
  const result = await child(process.argv[childAt + 1] as Mode, JSON.parse(process.argv[childAt + 2]) as Job);
  process.stdout.write(JSON.stringify(result));
  // Open handles (the job queue, idle database clients) may keep the event loop alive; the answer is written.
  process.exit(0);
} else {
  await main();
}
