// The bell model's summary fit in WebAssembly (assembly/bell.ts): the same result as
// fitProfile(…, { model: 'bell', detail: 'summary', profile: false, alternative: false }) for the
// fields of the command line's results format, without the JavaScript engine's warm-up. A profile
// the engine would refuse, or one too long for the kernel, is left to the engine, which says why.

import { gammaln } from 'simple-statistics';
import type { ProfileInput } from '../ph-data';
import { finiteOrNull } from '../result';
import { t975 } from '../uncertainty';
import { BELL_WASM_BASE64 } from './bell-wasm';

export interface BellSummary {
  /** points with a positive weight */
  n: number;
  dof: number;
  /** null when not determined */
  V: number | null;
  pKa1: number | null;
  pKa2: number | null;
  se: { V: number | null; pKa1: number | null; pKa2: number | null };
  pHopt: number | null;
  pHoptSe: number | null;
  ssr: number | null;
  converged: boolean;
  /** flag codes, in the order the engine lists them */
  flags: string[];
  starts: number;
  iterations: number;
}

/** One dataset of a file read by the kernel, in the file's order. */
export type FileItem =
  | { kind: 'fit'; id: string; summary: BellSummary }
  /** no starting point could be evaluated (the engine's 'bad_start'); n points */
  | { kind: 'no_start'; id: string; n: number }
  /** left to the engine: the dataset's JSON text, for JSON.parse */
  | { kind: 'engine'; text: string };

export interface BellKernel {
  /** profiles with more points than this are left to the engine */
  readonly maxPoints: number;
  /**
   * The summary fit; 'no_start' when no starting point could be evaluated (the engine's
   * 'bad_start'); null when the profile is left to the engine (it would refuse it, or it is longer
   * than maxPoints).
   */
  fit(input: ProfileInput): BellSummary | 'no_start' | null;
  /**
   * Every dataset of a datasets file (the reference README's format) given as its bytes, read
   * without JSON.parse, handed to `each` in the file's order. False, before any is handed over,
   * when the file is not one the kernel reads (not valid JSON, not ASCII, no "datasets" array of
   * objects, …): the caller reads it with JSON.parse.
   */
  fitFile(bytes: Uint8Array, each: (item: FileItem, index: number) => void): boolean;
  /**
   * A place for a file's bytes inside the kernel, so that a caller can read a file straight into
   * it (no copy); fitFileBuffer then reads them. Valid until the next call to the kernel.
   */
  fileBuffer(length: number): Uint8Array;
  /** fitFile on the bytes written into the last fileBuffer. */
  fitFileBuffer(each: (item: FileItem, index: number) => void): boolean;
  /** For tests: a JSON number as the kernel converts it; NaN when it leaves it to JSON.parse. */
  convertNumber(text: string): number;
}

/** Flag codes by bit, in the order flags.ts lists them. */
const FLAG_BITS = [
  'not_converged',
  'V_not_determined',
  'pKa1_not_determined',
  'pKa2_not_determined',
  'pKa1_outside_range',
  'pKa2_outside_range',
  'pKa_too_close',
  'narrow_bell',
  'too_few_points',
  'residual_runs',
] as const;

interface Exports {
  memory: WebAssembly.Memory;
  maxPoints(): number;
  pHPtr(): number;
  wPtr(): number;
  vPtr(): number;
  logFactPtr(): number;
  outPtr(): number;
  fitProfile(n: number, hasWeights: boolean): number;
  textBuffer(length: number): number;
  scanDatasets(): number;
  fitNext(): number;
  convertNumber(): number;
}

function decode(base64: string): Uint8Array<ArrayBuffer> {
  const text = atob(base64);
  const bytes = new Uint8Array(text.length);
  for (let i = 0; i < text.length; i++) bytes[i] = text.charCodeAt(i);
  return bytes;
}

const decoder = new TextDecoder();
/** Text of ASCII bytes (ids and datasets the kernel has checked): short ones without a decoder call. */
const ascii = (bytes: Uint8Array): string =>
  bytes.length <= 256 ? String.fromCharCode.apply(null, bytes as unknown as number[]) : decoder.decode(bytes);

function instantiate(): BellKernel {
  const module = new WebAssembly.Module(decode(BELL_WASM_BASE64));
  // log k! as runs-test.ts computes it, filled as far as the kernel has asked
  let logFact = new Float64Array(0);
  let logFactUpTo = 0;
  const instance = new WebAssembly.Instance(module, {
    env: {
      abort() {
        throw new Error('the bell kernel stopped on an internal check');
      },
      t975: (dof: number) => t975(dof) ?? NaN,
      needLogFactorials(k: number) {
        if (k <= logFactUpTo) return;
        views();
        while (logFactUpTo < k) {
          logFactUpTo++;
          logFact[logFactUpTo] = gammaln(logFactUpTo + 1);
        }
      },
    },
  });
  const x = instance.exports as unknown as Exports;
  const maxPoints = x.maxPoints();
  // views on the kernel's memory, made again when a file's bytes have made the memory grow
  let buffer: ArrayBuffer | null = null;
  let pH = new Float64Array(0);
  let v = new Float64Array(0);
  let w = new Float64Array(0);
  let out = new Float64Array(0);
  function views(): void {
    if (buffer === x.memory.buffer) return;
    buffer = x.memory.buffer;
    const f64 = (ptr: number, length: number) => new Float64Array(buffer as ArrayBuffer, ptr, length);
    pH = f64(x.pHPtr(), maxPoints);
    v = f64(x.vPtr(), maxPoints);
    w = f64(x.wPtr(), maxPoints);
    out = f64(x.outPtr(), 32);
    logFact = f64(x.logFactPtr(), maxPoints + 1);
  }
  views();

  /** The summary in `out` after a fit that returned 0. */
  function summary(): BellSummary {
    // status 0: fitted; a parameter held far away or not determined is reported as null
    const se = {
      V: out[3] === 0 ? finiteOrNull(out[6]) : null,
      pKa1: out[4] === 0 ? finiteOrNull(out[7]) : null,
      pKa2: out[5] === 0 ? finiteOrNull(out[8]) : null,
    };
    const bits = out[14];
    const flags: string[] = [];
    for (let b = 0; b < FLAG_BITS.length; b++) if (bits & (1 << b)) flags.push(FLAG_BITS[b]);
    return {
      n: out[18],
      dof: out[13],
      V: out[3] === 0 ? finiteOrNull(out[0]) : null,
      pKa1: out[4] === 0 ? finiteOrNull(out[1]) : null,
      pKa2: out[5] === 0 ? finiteOrNull(out[2]) : null,
      se,
      pHopt: finiteOrNull(out[9]),
      pHoptSe: finiteOrNull(out[10]),
      ssr: finiteOrNull(out[11]),
      converged: out[12] === 1,
      flags,
      starts: out[15],
      iterations: out[16],
    };
  }

  /** A view of the kernel's text buffer, made to hold `length` bytes. */
  function textView(length: number): Uint8Array {
    const ptr = x.textBuffer(length);
    views();
    return new Uint8Array(x.memory.buffer, ptr, length);
  }
  let text: Uint8Array = new Uint8Array(0);

  function fitText(each: (item: FileItem, index: number) => void): boolean {
    const bytes = text;
    const count = x.scanDatasets();
    if (count < 0) return false;
    for (let i = 0; i < count; i++) {
      const code = x.fitNext();
      if (code === 2) {
        each({ kind: 'engine', text: ascii(bytes.subarray(out[23], out[24])) }, i);
        continue;
      }
      const kind = out[20];
      const idText = kind === 0 ? '' : ascii(bytes.subarray(out[21], out[22]));
      // as the engine's reader names a dataset: a string as it is, a number as JavaScript prints it
      const id = kind === 1 ? idText : kind === 2 ? String(Number(idText)) : `#${i + 1}`;
      each(code === 1 ? { kind: 'no_start', id, n: out[25] } : { kind: 'fit', id, summary: summary() }, i);
    }
    return true;
  }

  return {
    maxPoints,
    fit(input) {
      if (input === null || typeof input !== 'object') return null;
      const { pH: xs, v: ys, w: ws } = input;
      if (!Array.isArray(xs) || !Array.isArray(ys)) return null;
      const n = xs.length;
      if (n === 0 || n > maxPoints || ys.length !== n) return null;
      const weighted = ws !== undefined && ws !== null;
      if (weighted && (!Array.isArray(ws) || ws.length !== n)) return null;
      views();
      for (let i = 0; i < n; i++) {
        const a = xs[i];
        const b = ys[i];
        if (typeof a !== 'number' || typeof b !== 'number') return null;
        pH[i] = a;
        v[i] = b;
      }
      if (weighted) {
        for (let i = 0; i < n; i++) {
          const c = ws[i];
          if (typeof c !== 'number') return null;
          w[i] = c;
        }
      }
      const code = x.fitProfile(n, weighted);
      if (code === 2) return null;
      if (code === 1) return 'no_start';
      return summary();
    },
    fitFile(bytes, each) {
      text = textView(bytes.length);
      text.set(bytes);
      return fitText(each);
    },
    fileBuffer(length) {
      text = textView(length);
      return text;
    },
    fitFileBuffer: fitText,
    convertNumber(number) {
      const bytes = new TextEncoder().encode(number);
      textView(bytes.length).set(bytes);
      return x.convertNumber();
    },
  };
}

let kernel: BellKernel | null | undefined;

/** The kernel, made once; null where WebAssembly is not available (the engine is used instead). */
export function bellKernel(): BellKernel | null {
  if (kernel === undefined) {
    try {
      kernel = typeof WebAssembly === 'object' ? instantiate() : null;
    } catch {
      kernel = null;
    }
  }
  return kernel;
}
