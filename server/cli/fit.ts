// `bellwether fit FILE.json [--model bell|acid|base|bell-plateau|auto] [--bootstrap N] [--timing]`
// Reads the datasets format of the reference README, writes its results format to stdout.
// Exit codes: 0 when the file was valid (a dataset that cannot be fitted is reported in place),
// 2 for bad arguments, 1 for a file that cannot be read or is not a datasets file.
import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { performance } from 'node:perf_hooks';
import { ENGINE_VERSION, fitProfile, NO_START_MESSAGE, type ModelId, type ProfileFit } from '@shared/fitting';
import {
  bellKernel,
  type BellKernel,
  type BellSummary,
  type FileItem,
} from '@shared/fitting/wasm/bell-kernel';

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

/** A dataset as the engine takes it: only the shape that lets a result name its dataset is checked here. */
function datasetOf(d: object, i: number): Dataset {
  const { id, pH, v, w } = d as Record<string, unknown>;
  return {
    id: typeof id === 'string' || typeof id === 'number' ? String(id) : `#${i + 1}`,
    pH,
    v,
    w,
  } as Dataset;
}

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
    out.push(datasetOf(d as object, i));
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

/** The results-format record of the WebAssembly bell fit (same fields and order as resultOf). */
function kernelResult(id: string, s: BellSummary): Record<string, unknown> {
  return {
    id,
    model: 'bell',
    n: s.n,
    dof: s.dof,
    V: s.V,
    pKa1: s.pKa1,
    pKa2: s.pKa2,
    se: s.se,
    pHopt: s.pHopt,
    pHopt_se: s.pHoptSe,
    ssr: s.ssr,
    converged: s.converged,
    flags: s.flags,
  };
}

/**
 * The bell model without bootstrap goes through the WebAssembly kernel (no warm-up; the same
 * results, checked by tests/unit/fitting/bell-wasm.test.ts); null leaves the profile to the engine
 * (a profile the engine refuses, with its message, or one longer than the kernel takes).
 */
function fitWithKernel(d: Dataset, kernel: BellKernel): Record<string, unknown> | null {
  let s: BellSummary | 'no_start' | null;
  try {
    s = kernel.fit(d);
  } catch {
    return null; // an unexpected stop of the kernel: the engine fits this profile instead
  }
  if (s === null) return null;
  if (s === 'no_start') return failedResult(d.id, 'bell', d.pH.length, 'bad_start', NO_START_MESSAGE);
  return kernelResult(d.id, s);
}

/** The results-format record of one dataset of a file the kernel has read. */
function fromFileItem(item: FileItem, i: number, args: Args, kernel: BellKernel): Record<string, unknown> {
  if (item.kind === 'fit') return kernelResult(item.id, item.summary);
  if (item.kind === 'no_start') return failedResult(item.id, 'bell', item.n, 'bad_start', NO_START_MESSAGE);
  // a dataset the kernel does not take from the bytes: parsed here, and fitted as any other
  return fitOne(datasetOf(JSON.parse(item.text) as object, i), args, kernel);
}

function fitOne(d: Dataset, args: Args, kernel: BellKernel | null): Record<string, unknown> {
  const n = Array.isArray(d.pH) ? d.pH.length : 0;
  if (kernel) {
    const result = fitWithKernel(d, kernel);
    if (result) return result;
  }
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

/**
 * A regular file read into the buffer `place(size)` gives, whole; null for anything else (a pipe,
 * an empty file), which the caller reads with readFile. Errors are thrown as readFile throws them.
 */
function readInto(path: string, place: (size: number) => Uint8Array): Uint8Array | null {
  const fd = openSync(path, 'r');
  try {
    const stats = fstatSync(fd);
    const size = stats.size;
    if (!stats.isFile() || size === 0) return null;
    const buffer = place(size);
    let done = 0;
    while (done < size) {
      const n = readSync(fd, buffer, done, size - done, done);
      if (n === 0) return null; // the file shrank while it was read
      done += n;
    }
    return buffer;
  } finally {
    closeSync(fd);
  }
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
  // BELLWETHER_FIT_ENGINE=js sends every profile to the engine (for comparisons; DEVELOPERS.md)
  const useKernel =
    args.model === 'bell' && args.bootstrap === 0 && process.env.BELLWETHER_FIT_ENGINE !== 'js';
  const kernel = useKernel ? bellKernel() : null;
  let bytes: Uint8Array;
  let direct = false;
  try {
    // a regular file goes straight into the kernel's buffer; anything else through readFile
    const placed = kernel ? readInto(args.file, (size) => kernel.fileBuffer(size)) : null;
    direct = placed !== null;
    bytes = placed ?? (await readFile(args.file));
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    process.stderr.write(`bellwether fit: cannot read ${args.file}${code ? ` (${code})` : ''}\n`);
    return 1;
  }
  let results: Record<string, unknown>[] | null = null;
  let t0 = performance.now();
  if (kernel) {
    // the kernel reads the file itself; a file it does not read goes to JSON.parse below
    const records: Record<string, unknown>[] = [];
    const each = (item: FileItem, i: number) => records.push(fromFileItem(item, i, args, kernel));
    let read: boolean;
    try {
      read = direct ? kernel.fitFileBuffer(each) : kernel.fitFile(bytes, each);
    } catch {
      read = false; // an unexpected stop of the kernel: the file is read and fitted as below
    }
    if (read) results = records;
  }
  if (!results) {
    const datasets = readDatasets(new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes));
    if (typeof datasets === 'string') {
      process.stderr.write(`bellwether fit: ${args.file} is not a datasets file: ${datasets}\n`);
      return 1;
    }
    t0 = performance.now();
    results = datasets.map((d) => fitOne(d, args, kernel));
  }
  const loop = (performance.now() - t0) / 1000;
  const engine = { name: 'bellwether', version: ENGINE_VERSION, model: args.model };
  process.stdout.write(JSON.stringify({ engine, results }) + '\n');
  if (args.timing) {
    const rate = loop > 0 ? Math.round(results.length / loop) : 0;
    process.stderr.write(`fit_loop_s=${loop.toFixed(4)} n=${results.length} fits_per_s=${rate}\n`);
  }
  return 0;
}
