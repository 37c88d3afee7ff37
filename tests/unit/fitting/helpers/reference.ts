// Loads the generated reference data sets and the reference fits copied from shared/reference
// (tests/fixtures/reference/README.md names their sources: numpy-generated data; fits by scipy
// 1.10.1 curve_fit, R 4.2.2 nls, and the exact minima polished in 80-bit arithmetic).
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export function readReference<T = unknown>(file: string): T {
  const path = fileURLToPath(new URL(`../../../fixtures/reference/${file}`, import.meta.url));
  return JSON.parse(readFileSync(path, 'utf8')) as T;
}

export interface RefDataset {
  id: string;
  pH: number[];
  v: number[];
  design: { lo: number; hi: number; limbs_in_range: string };
}

export interface RefFit {
  id: string;
  converged: boolean;
  V: number | null;
  pKa1?: number | null;
  pKa2?: number | null;
  pKa?: number | null;
  se?: Record<string, number | null>;
  pHopt?: number | null;
  pHopt_se?: number | null;
  ssr: number | null;
}

export const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** A fit as the bell-5000 agreement check reads it. */
export interface BellValues {
  V: number | null;
  pKa1: number | null;
  pKa2: number | null;
  flags: string[];
}

/**
 * Agreement with the exact minima of bell-5000 (bell-5000.exact.json): how many a fitter meets
 * within 1e-6 relative in V, pKa1 and pKa2, how many of the others it flags pKa_too_close, and how
 * many exact minima there are. `fit` returns null for a profile it did not fit.
 */
export function exactAgreement5000(fit: (d: RefDataset) => BellValues | null) {
  const data = readReference<{ datasets: RefDataset[] }>('bell-5000.json').datasets;
  const exact = new Map(
    readReference<{ results: RefFit[] }>('bell-5000.exact.json').results.map((r) => [r.id, r]),
  );
  let agree = 0;
  let flaggedPKa = 0;
  for (const d of data) {
    const ref = exact.get(d.id);
    if (!ref) continue;
    const f = fit(d);
    if (!f) continue;
    const worst = Math.max(
      rel(f.V as number, ref.V as number),
      rel(f.pKa1 as number, ref.pKa1 as number),
      rel(f.pKa2 as number, ref.pKa2 as number),
    );
    if (worst <= 1e-6) agree++;
    else if (f.flags.includes('pKa_too_close')) flaggedPKa++;
  }
  return { agree, flaggedPKa, total: exact.size };
}
