// Reads NIST StRD nonlinear-regression files (tests/fixtures/nist, copied unchanged from NIST ITL
// Statistical Reference Datasets) and gives each problem's model as written on its "Model:" line.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export interface NistProblem {
  name: string;
  x: number[];
  y: number[];
  start1: number[];
  start2: number[];
  certified: number[];
  certifiedSD: number[];
  certifiedRSS: number;
  f: (x: number, b: ArrayLike<number>) => number;
}

const MODELS: Record<string, (x: number, b: ArrayLike<number>) => number> = {
  Misra1a: (x, b) => b[0] * (1 - Math.exp(-b[1] * x)),
  Misra1b: (x, b) => b[0] * (1 - Math.pow(1 + (b[1] * x) / 2, -2)),
  Misra1d: (x, b) => (b[0] * b[1] * x) / (1 + b[1] * x),
  Chwirut2: (x, b) => Math.exp(-b[0] * x) / (b[1] + b[2] * x),
  DanWood: (x, b) => b[0] * Math.pow(x, b[1]),
  Gauss1: (x, b) =>
    b[0] * Math.exp(-b[1] * x) +
    b[2] * Math.exp(-((x - b[3]) ** 2) / b[4] ** 2) +
    b[5] * Math.exp(-((x - b[6]) ** 2) / b[7] ** 2),
  Lanczos3: (x, b) => b[0] * Math.exp(-b[1] * x) + b[2] * Math.exp(-b[3] * x) + b[4] * Math.exp(-b[5] * x),
  Kirby2: (x, b) => (b[0] + b[1] * x + b[2] * x * x) / (1 + b[3] * x + b[4] * x * x),
  Rat42: (x, b) => b[0] / (1 + Math.exp(b[1] - b[2] * x)),
  MGH09: (x, b) => (b[0] * (x * x + x * b[1])) / (x * x + x * b[2] + b[3]),
};

export const NIST_NAMES = Object.keys(MODELS);

export function readNist(name: string): NistProblem {
  const path = fileURLToPath(new URL(`../../../fixtures/nist/${name}.dat`, import.meta.url));
  const text = readFileSync(path, 'utf8');
  const lines = text.split(/\r?\n/);
  // the file's own header says where its data are: "Data (lines 61 to 74)"
  const span = /Data\s+\(lines\s+(\d+)\s+to\s+(\d+)\)/.exec(text);
  if (!span) throw new Error(`${name}: no "Data (lines a to b)" line`);
  const x: number[] = [];
  const y: number[] = [];
  for (let i = Number(span[1]) - 1; i < Number(span[2]); i++) {
    const [yv, xv] = lines[i].trim().split(/\s+/).map(Number); // columns are "y x"
    x.push(xv);
    y.push(yv);
  }
  const start1: number[] = [];
  const start2: number[] = [];
  const certified: number[] = [];
  const certifiedSD: number[] = [];
  for (const line of lines.slice(40)) {
    const m = /^\s*b\d+\s*=\s*(\S+)\s+(\S+)\s+(\S+)\s+(\S+)/.exec(line);
    if (!m) break;
    start1.push(Number(m[1]));
    start2.push(Number(m[2]));
    certified.push(Number(m[3]));
    certifiedSD.push(Number(m[4]));
  }
  const rss = /Residual Sum of Squares:\s+(\S+)/.exec(text);
  if (!rss) throw new Error(`${name}: no certified residual sum of squares`);
  return {
    name,
    x,
    y,
    start1,
    start2,
    certified,
    certifiedSD,
    certifiedRSS: Number(rss[1]),
    f: MODELS[name],
  };
}

/** Log relative error, the StRD measure of agreement (McCullough 1998 [memory]); capped at 15. */
export function lre(certified: number, estimate: number): number {
  if (estimate === certified) return 15;
  return Math.min(15, -Math.log10(Math.abs(estimate - certified) / Math.abs(certified)));
}
