// Starting values that need no guess from the user and survive noise and one-limb data: a grid
// over the free pKa values (kept in increasing order) from one unit below to one unit above the
// measured pH range; at each grid point the activity levels, which enter linearly, are solved
// exactly by weighted linear least squares (the idea of variable projection: Golub & Pereyra
// 1973). The best grid points, in order of their sum of squares, are the starts.

import type { PhModel } from './models';
import type { PhData } from './ph-data';
import { pow10 } from './models/types';

export interface GridPoint {
  theta: number[];
  ssr: number;
}

const GRID_STEPS = 6;

/**
 * Weighted least squares for the m ≤ 3 linear levels given the basis values φ (n×m), solved by
 * Gaussian elimination on the normal equations of the free levels (fixed levels move to the
 * right-hand side). Writes the levels into theta and returns the SSR.
 */
function solveLevels(
  data: PhData,
  phi: Float64Array,
  m: number,
  free: readonly boolean[],
  theta: Float64Array,
  M: Float64Array,
): number {
  const { n, y, w } = data;
  {
    const W = m + 1; // augmented rows [A | b]
    M.fill(0);
    for (let i = 0; i < n; i++) {
      let yi = y[i];
      for (let a = 0; a < m; a++) if (!free[a]) yi -= theta[a] * phi[i * m + a];
      for (let a = 0; a < m; a++) {
        if (!free[a]) continue;
        M[a * W + m] += w[i] * phi[i * m + a] * yi;
        for (let c = 0; c < m; c++) if (free[c]) M[a * W + c] += w[i] * phi[i * m + a] * phi[i * m + c];
      }
    }
    for (let a = 0; a < m; a++) if (!free[a]) M[a * W + a] = 1; // identity rows keep fixed levels out
    for (let c = 0; c < m; c++) {
      if (!free[c]) continue;
      if (!(Math.abs(M[c * W + c]) > 1e-300)) return Infinity;
      for (let r = 0; r < m; r++) {
        if (r === c || !free[r]) continue;
        const f = M[r * W + c] / M[c * W + c];
        for (let k = c; k <= m; k++) M[r * W + k] -= f * M[c * W + k];
      }
    }
    for (let c = 0; c < m; c++) if (free[c]) theta[c] = M[c * W + m] / M[c * W + c];
  }
  let ssr = 0;
  for (let i = 0; i < n; i++) {
    let f = 0;
    for (let k = 0; k < m; k++) f += theta[k] * phi[i * m + k];
    const r = y[i] - f;
    ssr += w[i] * r * r;
  }
  return Number.isFinite(ssr) ? ssr : Infinity;
}

/** The few best grid points, best first (a class: one shared method, optimized once). */
class BestStarts {
  readonly list: GridPoint[] = [];
  constructor(private readonly keep: number) {}
  offer(candidate: ArrayLike<number>, ssr: number): void {
    const { list, keep } = this;
    if (list.length >= keep && !(ssr < list[list.length - 1].ssr)) return;
    // insertion into the short sorted list; the array copy happens only for a new best few
    let at = list.length;
    while (at > 0 && list[at - 1].ssr > ssr) at--;
    list.splice(at, 0, { theta: Array.from(candidate), ssr });
    if (list.length > keep) list.pop();
  }
}

interface GridWalk {
  model: PhModel;
  data: PhData;
  grid: number[];
  freePKa: number[];
  freeLevel: boolean[];
  syy: number;
  theta: Float64Array;
  phi: Float64Array;
  row: Float64Array;
  k: Float64Array;
  work: Float64Array;
  best: BestStarts;
}

/** Visits every increasing tuple of grid values for the free pKa values. */
function walk(w: GridWalk, depth: number, from: number): void {
  if (depth < w.freePKa.length) {
    for (let g = from; g < w.grid.length; g++) {
      w.theta[w.freePKa[depth]] = w.grid[g];
      walk(w, depth + 1, g + 1);
    }
    return;
  }
  const { model, data, theta, phi, row, k } = w;
  const m = model.nLinear;
  model.constants(theta, k);
  let ssr: number;
  if (m === 1 && w.freeLevel[0]) {
    // one level in one pass: V = Sφy/Sφφ and SSR = Syy − Sφy²/Sφφ
    let sxy = 0;
    let sxx = 0;
    for (let i = 0; i < data.n; i++) {
      model.basis(k, data.h[i], data.g[i], row);
      const wf = data.w[i] * row[0];
      sxy += wf * data.y[i];
      sxx += wf * row[0];
    }
    theta[0] = sxy / sxx;
    ssr = sxx > 1e-300 ? Math.max(0, w.syy - (sxy * sxy) / sxx) : Infinity;
  } else {
    for (let i = 0; i < data.n; i++) {
      model.basis(k, data.h[i], data.g[i], row);
      for (let c = 0; c < m; c++) phi[i * m + c] = row[c];
    }
    ssr = solveLevels(data, phi, m, w.freeLevel, theta, w.work);
  }
  if (Number.isFinite(ssr)) w.best.offer(theta, ssr);
}

/**
 * Grid starts, best first. `fixed[j]` holds a parameter's value when it is not free.
 * Returns at most `keep` points.
 */
export function gridStarts(
  model: PhModel,
  data: PhData,
  fixed: readonly (number | null)[],
  keep = 3,
): GridPoint[] {
  const p = model.names.length;
  const m = model.nLinear;
  const freePKa: number[] = [];
  for (let j = m; j < p; j++) if (fixed[j] === null) freePKa.push(j);
  const freeLevel: boolean[] = [];
  for (let j = 0; j < m; j++) freeLevel.push(fixed[j] === null);
  const lo = data.lo - 1;
  const step = (data.hi + 1 - lo) / GRID_STEPS;
  const grid: number[] = [];
  for (let i = 0; i <= GRID_STEPS; i++) grid.push(lo + i * step);
  const best = new BestStarts(keep);
  let syy = 0;
  for (let i = 0; i < data.n; i++) syy += data.w[i] * data.y[i] * data.y[i];
  if (model.id === 'bell' && freePKa.length === 2 && freeLevel[0]) {
    bellGrid(data, grid, syy, best);
    return best.list;
  }
  const size = data.n * m;
  const buf = new Float64Array(p + size + m + 4 + m * (m + 1));
  const theta = buf.subarray(0, p);
  for (let j = 0; j < p; j++) theta[j] = fixed[j] ?? 0;
  walk(
    {
      model,
      data,
      grid,
      freePKa,
      freeLevel,
      syy,
      theta,
      phi: buf.subarray(p, p + size),
      row: buf.subarray(p + size, p + size + m),
      k: buf.subarray(p + size + m, p + size + m + 4),
      work: buf.subarray(p + size + m + 4, p + size + m + 4 + m * (m + 1)),
      best,
    },
    0,
    0,
  );
  return best.list;
}

/**
 * The bell's grid written out by hand (the command line's hot path): the powers of ten of every
 * grid value are computed once, so a grid point costs a multiply-add and a division per point.
 */
function bellGrid(data: PhData, grid: readonly number[], syy: number, best: BestStarts): void {
  const { n, h, g, w, y } = data;
  const up = grid.map((x) => pow10(x));
  const down = grid.map((x) => pow10(-x));
  const theta = [0, 0, 0];
  for (let a = 0; a < grid.length; a++) {
    for (let b = a + 1; b < grid.length; b++) {
      let sxy = 0;
      let sxx = 0;
      for (let i = 0; i < n; i++) {
        const phi = 1 / (1 + up[a] * h[i] + down[b] * g[i]);
        const wf = w[i] * phi;
        sxy += wf * y[i];
        sxx += wf * phi;
      }
      if (!(sxx > 1e-300)) continue;
      const ssr = Math.max(0, syy - (sxy * sxy) / sxx);
      if (!Number.isFinite(ssr)) continue;
      theta[0] = sxy / sxx;
      theta[1] = grid[a];
      theta[2] = grid[b];
      best.offer(theta, ssr);
    }
  }
}
