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

export interface BellKernel {
  /** profiles with more points than this are left to the engine */
  readonly maxPoints: number;
  /**
   * The summary fit; 'no_start' when no starting point could be evaluated (the engine's
   * 'bad_start'); null when the profile is left to the engine (it would refuse it, or it is longer
   * than maxPoints).
   */
  fit(input: ProfileInput): BellSummary | 'no_start' | null;
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
  hPtr(): number;
  gPtr(): number;
  yPtr(): number;
  swPtr(): number;
  wPtr(): number;
  vPtr(): number;
  logFactPtr(): number;
  outPtr(): number;
  fitProfile(n: number, hasWeights: boolean): number;
}

function decode(base64: string): Uint8Array<ArrayBuffer> {
  const text = atob(base64);
  const bytes = new Uint8Array(text.length);
  for (let i = 0; i < text.length; i++) bytes[i] = text.charCodeAt(i);
  return bytes;
}

function instantiate(): BellKernel {
  const module = new WebAssembly.Module(decode(BELL_WASM_BASE64));
  const instance = new WebAssembly.Instance(module, {
    env: {
      abort() {
        throw new Error('the bell kernel stopped on an internal check');
      },
      t975: (dof: number) => t975(dof) ?? NaN,
    },
  });
  const x = instance.exports as unknown as Exports;
  const maxPoints = x.maxPoints();
  // the kernel allocates nothing after start-up, so these views stay valid
  const f64 = (ptr: number, length: number) => new Float64Array(x.memory.buffer, ptr, length);
  const pH = f64(x.pHPtr(), maxPoints);
  const v = f64(x.vPtr(), maxPoints);
  const w = f64(x.wPtr(), maxPoints);
  const out = f64(x.outPtr(), 20);
  // log k! as runs-test.ts computes it, filled as far as the longest profile so far
  const logFact = f64(x.logFactPtr(), maxPoints + 1);
  let logFactUpTo = 0;

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
      while (logFactUpTo < n) {
        logFactUpTo++;
        logFact[logFactUpTo] = gammaln(logFactUpTo + 1);
      }
      const code = x.fitProfile(n, weighted);
      if (code === 2) return null;
      if (code === 1) return 'no_start';
      // status 0: fitted; a parameter held far away or not determined is reported as null
      const V = out[3] === 0 ? finiteOrNull(out[0]) : null;
      const pKa1 = out[4] === 0 ? finiteOrNull(out[1]) : null;
      const pKa2 = out[5] === 0 ? finiteOrNull(out[2]) : null;
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
        V,
        pKa1,
        pKa2,
        se,
        pHopt: finiteOrNull(out[9]),
        pHoptSe: finiteOrNull(out[10]),
        ssr: finiteOrNull(out[11]),
        converged: out[12] === 1,
        flags,
        starts: out[15],
        iterations: out[16],
      };
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
