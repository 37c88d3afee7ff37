// `bellwether fit FILE.json [--model bell|acid|base|bell-plateau|auto] [--bootstrap N] [--timing]`
// Reads the datasets format of the reference README, writes its results format to stdout.
// Exit codes: 0 when the file was valid (a dataset that cannot be fitted is reported in place),
// 2 for bad arguments, 1 for a file that cannot be read or is not a datasets file.
// Large files are fitted on every core: worker threads and this thread take chunks of datasets
// from a shared counter, and the results are put back in the order of the file (the numbers do not
// depend on which thread fitted a dataset). BELLWETHER_THREADS=N sets the number of threads
// (1: this thread only); BELLWETHER_THREADS_REPORT=1 says on standard error how the work was shared.
import { readFile, stat } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { performance } from 'node:perf_hooks';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import { ENGINE_VERSION, fitProfile, type ModelId, type ProfileFit } from '@shared/fitting';

const MODELS = ['bell', 'acid', 'base', 'bell-plateau', 'auto'] as const;
type CliModel = (typeof MODELS)[number];

const usage = `usage: bellwether fit FILE.json [--model ${MODELS.join('|')}] [--bootstrap N] [--timing]

Fits an activity-against-pH model to every dataset of FILE.json ({ "datasets": [{ "id", "pH", "v", "w"? }] })
and writes the results as JSON to standard output.
  --model      model to fit (default bell); auto proposes the simplest adequate model
  --bootstrap  residual-bootstrap resamples for the optimum and the half-activity window
  --timing     print fit_loop_s=<s> n=<datasets> fits_per_s=<n> to standard error
`;

interface Args {
  file: string;
  model: CliModel;
  bootstrap: number;
  timing: boolean;
}

function parseArgs(args: string[]): Args | string {
  let file: string | null = null;
  let model: CliModel = 'bell';
  let bootstrap = 0;
  let timing = false;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '--timing') timing = true;
    else if (a === '--model') {
      const m = args[++i];
      if (!MODELS.includes(m as CliModel))
        return `--model needs one of ${MODELS.join(', ')}${m ? `, not '${m}'` : ''}`;
      model = m as CliModel;
    } else if (a === '--bootstrap') {
      const v = args[++i];
      if (!v || !/^\d+$/.test(v) || Number(v) > 1_000_000)
        return '--bootstrap needs a whole number of resamples (0 to 1000000)';
      bootstrap = Number(v);
    } else if (a.startsWith('-')) return `unknown option '${a}'`;
    else if (file === null) file = a;
    else return `only one FILE.json is read, got '${file}' and '${a}'`;
  }
  if (file === null) return 'no FILE.json given';
  return { file, model, bootstrap, timing };
}

type Dataset = { id: string; pH: number[]; v: number[]; w?: number[] | null };

function readDatasets(text: string): Dataset[] | string {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return `it is not valid JSON (${error instanceof Error ? error.message : String(error)})`;
  }
  const list = (json as { datasets?: unknown } | null)?.datasets;
  if (!Array.isArray(list)) return 'it has no "datasets" array';
  const out: Dataset[] = [];
  for (const [i, d] of list.entries()) {
    if (d === null || typeof d !== 'object') return `dataset ${i + 1} is not an object`;
    const { id, pH, v, w } = d as Record<string, unknown>;
    // contents are checked by the engine; here only the shape that lets a result name its dataset
    out.push({
      id: typeof id === 'string' || typeof id === 'number' ? String(id) : `#${i + 1}`,
      pH,
      v,
      w,
    } as Dataset);
  }
  return out;
}

const PARAMS: Record<ModelId, string[]> = {
  bell: ['V', 'pKa1', 'pKa2'],
  acid: ['V', 'pKa'],
  base: ['V', 'pKa'],
  'bell-plateau': ['V_lo', 'V_mid', 'V_hi', 'pKa1', 'pKa2'],
  three: ['V', 'pKa', 'pKb', 'pKc'],
};

function resultOf(id: string, fit: ProfileFit, bootstrap: number): Record<string, unknown> {
  const out: Record<string, unknown> = { id, model: fit.model, n: fit.n, dof: fit.dof };
  const se: Record<string, number | null> = {};
  for (const name of PARAMS[fit.model]) {
    out[name] = fit.parameters[name].value;
    se[name] = fit.parameters[name].se;
  }
  out.se = se;
  out.pHopt = fit.pHopt.value;
  out.pHopt_se = fit.pHopt.se;
  out.ssr = fit.ssr;
  out.converged = fit.converged;
  out.flags = fit.flags.map((f) => f.code);
  if (bootstrap > 0) {
    out.pHopt_ci95_boot = fit.pHopt.boot95;
    out.window = [fit.window.lo.value, fit.window.hi.value];
    out.window_lo_ci95_boot = fit.window.lo.boot95;
    out.window_hi_ci95_boot = fit.window.hi.boot95;
    out.bootstrap = fit.bootstrap;
  }
  return out;
}

function failedResult(
  id: string,
  model: CliModel,
  n: number,
  code: string,
  message: string,
): Record<string, unknown> {
  const fitted = model === 'auto' ? 'bell' : model;
  const out: Record<string, unknown> = { id, model: fitted, n, dof: null };
  for (const name of PARAMS[fitted]) out[name] = null;
  out.se = Object.fromEntries(PARAMS[fitted].map((name) => [name, null]));
  Object.assign(out, {
    pHopt: null,
    pHopt_se: null,
    ssr: null,
    converged: false,
    flags: [code],
    error: message,
  });
  return out;
}

function fitOne(d: Dataset, args: Args): Record<string, unknown> {
  const n = Array.isArray(d.pH) ? d.pH.length : 0;
  // only what the results format holds is computed: no profile likelihood, no alternative fit,
  // no residual or covariance tables
  const fit = fitProfile(d, {
    model: args.model,
    profile: false,
    alternative: false,
    bootstrap: args.bootstrap,
    detail: 'summary',
  });
  return fit.ok
    ? resultOf(d.id, fit.value, args.bootstrap)
    : failedResult(d.id, args.model, n, fit.error.code, fit.error.message);
}

/** Datasets per claim from the shared counter: small enough to even out the threads' shares. */
const CHUNK = 50;
/** Files smaller than this (about 400 datasets of 45 points) are fitted on this thread alone:
 *  starting a worker would cost more than it saves. */
const PARALLEL_FROM_BYTES = 200_000;

type WorkerInput = { kind: 'bellwether-fit'; file: string; args: Args; counter: SharedArrayBuffer };
/** A run of consecutive results, already as JSON without the surrounding brackets. */
type Piece = { start: number; json: string };

/** Claims chunks from the shared counter until none is left; each chunk becomes one piece. */
function fitClaimed(datasets: Dataset[], args: Args, counter: Int32Array): Piece[] {
  const pieces: Piece[] = [];
  for (;;) {
    const start = Atomics.add(counter, 0, CHUNK);
    if (start >= datasets.length) return pieces;
    pieces.push({ start, json: fitRange(datasets, args, start, Math.min(start + CHUNK, datasets.length)) });
  }
}

function fitRange(datasets: Dataset[], args: Args, start: number, end: number): string {
  const parts: string[] = [];
  for (let i = start; i < end; i++) parts.push(JSON.stringify(fitOne(datasets[i], args)));
  return parts.join(',');
}

/** Worker threads run this module file itself, which only compiled JavaScript can do. */
const canStartWorkers = /\.m?js$/.test(new URL(import.meta.url).pathname);

function threadCount(bytes: number): number {
  const asked = Number(process.env.BELLWETHER_THREADS);
  const cores = Number.isInteger(asked) && asked > 0 ? asked : availableParallelism();
  if (!canStartWorkers || bytes < PARALLEL_FROM_BYTES) return 1;
  return Math.max(1, Math.min(cores, 16, Math.floor(bytes / (PARALLEL_FROM_BYTES / 2))));
}

/**
 * Worker threads started before this thread reads the file, so that their start-up overlaps the
 * reading; each reads and parses the file itself, then claims chunks from the shared counter.
 * A worker that fails gives nothing back, and the chunks it claimed are fitted here.
 */
function startWorkers(file: string, args: Args, threads: number) {
  const shared = new SharedArrayBuffer(4);
  const done: Promise<Piece[]>[] = [];
  const workers: Worker[] = [];
  for (let k = 1; k < threads; k++) {
    const input: WorkerInput = { kind: 'bellwether-fit', file, args, counter: shared };
    const worker = new Worker(new URL(import.meta.url), { workerData: input });
    workers.push(worker);
    done.push(
      new Promise<Piece[]>((resolve) => {
        worker.once('message', (pieces: Piece[]) => resolve(pieces));
        worker.once('error', () => resolve([]));
        worker.once('exit', () => resolve([]));
      }),
    );
  }
  return {
    counter: new Int32Array(shared),
    done,
    stop: () => {
      for (const w of workers) void w.terminate();
    },
  };
}

/** Every result as JSON, in the order of the file: this thread's chunks, then the workers'. */
async function fitAll(datasets: Dataset[], args: Args, pool: ReturnType<typeof startWorkers>): Promise<string> {
  const pieces = fitClaimed(datasets, args, pool.counter);
  const mine = pieces.length;
  for (const theirs of await Promise.all(pool.done)) pieces.push(...theirs);
  if (process.env.BELLWETHER_THREADS_REPORT === '1') {
    process.stderr.write(
      `threads=${1 + pool.done.length} chunks=${Math.ceil(datasets.length / CHUNK)} chunks_by_workers=${pieces.length - mine}\n`,
    );
  }
  const byStart = new Map(pieces.map((p) => [p.start, p.json]));
  const ordered: string[] = [];
  for (let start = 0; start < datasets.length; start += CHUNK) {
    const json = byStart.get(start) ?? fitRange(datasets, args, start, Math.min(start + CHUNK, datasets.length));
    if (json !== '') ordered.push(json);
  }
  return ordered.join(',');
}

async function runWorker(input: WorkerInput): Promise<Piece[]> {
  const datasets = readDatasets(await readFile(input.file, 'utf8'));
  return typeof datasets === 'string' ? [] : fitClaimed(datasets, input.args, new Int32Array(input.counter));
}

if (!isMainThread && parentPort && (workerData as WorkerInput | null)?.kind === 'bellwether-fit') {
  const port = parentPort;
  void runWorker(workerData as WorkerInput).then((pieces) => port.postMessage(pieces));
}

export async function run(argv: string[]): Promise<number> {
  if (argv.includes('--help') || argv.includes('-h')) {
    process.stdout.write(usage);
    return 0;
  }
  const args = parseArgs(argv);
  if (typeof args === 'string') {
    process.stderr.write(`bellwether fit: ${args}\n\n${usage}`);
    return 2;
  }
  let text: string;
  let pool: ReturnType<typeof startWorkers> | null = null;
  try {
    const { size } = await stat(args.file);
    pool = startWorkers(args.file, args, threadCount(size));
    text = await readFile(args.file, 'utf8');
  } catch (error) {
    pool?.stop();
    const code = (error as NodeJS.ErrnoException).code;
    process.stderr.write(`bellwether fit: cannot read ${args.file}${code ? ` (${code})` : ''}\n`);
    return 1;
  }
  const datasets = readDatasets(text);
  if (typeof datasets === 'string') {
    pool.stop();
    process.stderr.write(`bellwether fit: ${args.file} is not a datasets file: ${datasets}\n`);
    return 1;
  }
  const t0 = performance.now();
  const results = await fitAll(datasets, args, pool);
  const loop = (performance.now() - t0) / 1000;
  const engine = { name: 'bellwether', version: ENGINE_VERSION, model: args.model };
  // the same bytes as JSON.stringify({ engine, results }) of the result objects
  process.stdout.write(`{"engine":${JSON.stringify(engine)},"results":[${results}]}\n`);
  if (args.timing) {
    const rate = loop > 0 ? Math.round(datasets.length / loop) : 0;
    process.stderr.write(`fit_loop_s=${loop.toFixed(4)} n=${datasets.length} fits_per_s=${rate}\n`);
  }
  return 0;
}
