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
