// Levenberg–Marquardt nonlinear least squares (Levenberg 1944; Marquardt 1963) with Marquardt's
// scaling by the largest diagonal of JᵀJ seen so far (Moré 1978), Nielsen's damping update
// (Nielsen 1999, IMM-REP-1999-05), MINPACK-style stopping rules and simple box bounds
// (projected steps; a parameter pinned at a bound by its gradient is held fixed for the step).
//
// Minimises SSR(θ) = Σ rᵢ², rᵢ = √wᵢ (yᵢ − f(xᵢ; θ)). Each step solves
//   (JᵀJ + λ·D) δ = Jᵀr,   J = √w ∂f/∂θ,   D = diag(max over iterations of diag JᵀJ)
// and is accepted when the gain ratio ρ = (SSR − SSR(θ+δ)) / (2δᵀJᵀr − δᵀJᵀJδ) is positive.

import { dampedCholeskySolve, normalEquations } from './linalg';

export type StopReason =
  'converged-gradient' | 'converged-step' | 'converged-ssr' | 'max-iterations' | 'singular' | 'non-finite';

export interface LsqProblem {
  readonly n: number;
  readonly p: number;
  /**
   * Fills the weighted residuals r = √w (y − f) and, when J is given, J = √w ∂f/∂θ (row-major n×p).
   * Returns false when anything is not finite.
   */
  evaluate(theta: ArrayLike<number>, r: Float64Array, J: Float64Array | null): boolean;
}

export interface LmOptions {
  maxIterations?: number;
  /** relative reduction of SSR, actual and predicted, below which the fit has converged */
  ftol?: number;
  /** relative step size below which the fit has converged */
  xtol?: number;
  /** cosine between the residual vector and any Jacobian column below which it has converged */
  gtol?: number;
  lower?: ArrayLike<number>;
  upper?: ArrayLike<number>;
}

export interface LmResult {
  theta: number[];
  ssr: number;
  iterations: number;
  evaluations: number;
  stop: StopReason;
  converged: boolean;
  /** per parameter: -1 held at its lower bound, +1 at its upper bound, 0 free */
  atBound: (-1 | 0 | 1)[];
}

// Tight defaults: the reference minima are matched to 1e-6 relative only with tight rules
// (reference README: scipy's default tolerances missed 608 of 4,341).
const DEFAULTS = { maxIterations: 200, ftol: 1e-15, xtol: 1e-11, gtol: 1e-12 };

function clampInto(
  theta: number[] | Float64Array,
  lower?: ArrayLike<number>,
  upper?: ArrayLike<number>,
): void {
  for (let j = 0; j < theta.length; j++) {
    if (lower && theta[j] < lower[j]) theta[j] = lower[j];
    if (upper && theta[j] > upper[j]) theta[j] = upper[j];
  }
}

interface Workspace {
  r: Float64Array;
  J: Float64Array;
  rT: Float64Array;
  JT: Float64Array;
  A: Float64Array;
  As: Float64Array;
  L: Float64Array;
  s: Float64Array;
  g: Float64Array;
  gs: Float64Array;
  D: Float64Array;
  delta: Float64Array;
  trial: Float64Array;
  held: Float64Array;
}

// One workspace per number of parameters, grown for more points when needed: creating typed
// arrays costs more than the arithmetic of a small fit. The solver never calls itself, so a
// workspace is never in use twice at once.
const workspaces = new Map<number, Workspace>();

function workspace(n: number, p: number): Workspace {
  let ws = workspaces.get(p);
  if (!ws) {
    const small = () => new Float64Array(p);
    const square = () => new Float64Array(p * p);
    ws = {
      r: new Float64Array(0),
      J: new Float64Array(0),
      rT: new Float64Array(0),
      JT: new Float64Array(0),
      A: square(),
      As: square(),
      L: square(),
      s: small(),
      g: small(),
      gs: small(),
      D: small(),
      delta: small(),
      trial: small(),
      held: small(),
    };
    workspaces.set(p, ws);
  }
  if (ws.r.length < n) {
    const size = Math.max(n, 64, 2 * ws.r.length);
    ws.r = new Float64Array(size);
    ws.rT = new Float64Array(size);
    ws.J = new Float64Array(size * p);
    ws.JT = new Float64Array(size * p);
  }
  return ws;
}

function sumOfSquares(r: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += r[i] * r[i];
  return Number.isFinite(s) ? s : Infinity;
}

/**
 * Projected gradient: a parameter at a bound whose descent direction points outward is held
 * (its row and column of the damped system become the identity). Returns the largest cosine
 * between the residual vector and a free Jacobian column (the gradient test).
 */
function projectGradient(ws: Workspace, theta: number[], p: number, ssr: number, options: LmOptions): number {
  const { A, As, g, gs, held } = ws;
  const { lower, upper } = options;
  let gmax = 0;
  for (let j = 0; j < p; j++) {
    held[j] =
      (lower && theta[j] <= lower[j] && g[j] < 0) || (upper && theta[j] >= upper[j] && g[j] > 0) ? 1 : 0;
    gs[j] = held[j] ? 0 : g[j];
    const colNorm = Math.sqrt(A[j * p + j]);
    if (!held[j] && colNorm > 0) gmax = Math.max(gmax, Math.abs(g[j]) / (colNorm * Math.sqrt(ssr)));
  }
  for (let j = 0; j < p; j++) {
    for (let k = 0; k < p; k++) {
      As[j * p + k] = held[j] || held[k] ? (j === k ? A[j * p + j] || 1 : 0) : A[j * p + k];
    }
  }
  return gmax;
}

/**
 * Trial point θ + δ clipped into the bounds (δ becomes the clipped step); returns the predicted
 * reduction of SSR for it, 2δᵀg − δᵀAδ, and whether every component is below xtol.
 */
function trialStep(
  ws: Workspace,
  theta: number[],
  p: number,
  options: LmOptions,
  xtol: number,
): { pred: number; small: boolean } {
  const { A, g, delta, trial } = ws;
  for (let j = 0; j < p; j++) trial[j] = theta[j] + delta[j];
  clampInto(trial, options.lower, options.upper);
  let small = true;
  for (let j = 0; j < p; j++) {
    delta[j] = trial[j] - theta[j];
    if (Math.abs(delta[j]) > xtol * (Math.abs(theta[j]) + xtol)) small = false;
  }
  let pred = 0;
  for (let j = 0; j < p; j++) {
    let ad = 0;
    for (let k = 0; k < p; k++) ad += A[j * p + k] * delta[k];
    pred += delta[j] * (2 * g[j] - ad);
  }
  return { pred, small };
}

function finish(
  reason: StopReason,
  theta: number[],
  ssr: number,
  iterations: number,
  evaluations: number,
  ws: Workspace,
  p: number,
  options: LmOptions,
): LmResult {
  const { A } = ws;
  const { lower, upper } = options;
  let stop = reason;
  if (stop.startsWith('converged') && ssr > 0) {
    // a parameter without any influence on the model (a zero Jacobian column) cannot be
    // estimated: the problem is singular even though the damped steps converged
    let maxA = 0;
    for (let j = 0; j < p; j++) maxA = Math.max(maxA, A[j * p + j]);
    for (let j = 0; j < p; j++) if (!(A[j * p + j] > 1e-28 * maxA)) stop = 'singular';
  }
  const atBound: (-1 | 0 | 1)[] = [];
  for (let j = 0; j < p; j++) {
    atBound.push(lower && theta[j] <= lower[j] ? -1 : upper && theta[j] >= upper[j] ? 1 : 0);
  }
  const converged = stop === 'converged-gradient' || stop === 'converged-step' || stop === 'converged-ssr';
  return { theta, ssr, iterations, evaluations, stop, converged, atBound };
}

export function levenbergMarquardt(
  problem: LsqProblem,
  start: ArrayLike<number>,
  options: LmOptions = {},
): LmResult {
  const { n, p } = problem;
  const maxIterations = options.maxIterations ?? DEFAULTS.maxIterations;
  const ftol = options.ftol ?? DEFAULTS.ftol;
  const xtol = options.xtol ?? DEFAULTS.xtol;
  const gtol = options.gtol ?? DEFAULTS.gtol;

  const theta = Array.from(start); // small plain arrays are cheaper to create than typed ones
  clampInto(theta, options.lower, options.upper);
  // Buffers are reused from call to call and used only up to n and p.
  const ws = workspace(n, p);
  const { A, D, g, gs, delta, L, s: scale, As } = ws;
  let evaluations = 1;

  if (!problem.evaluate(theta, ws.r, ws.J))
    return finish('non-finite', theta, NaN, 0, evaluations, ws, p, options);
  let ssr = sumOfSquares(ws.r, n);
  if (!Number.isFinite(ssr)) return finish('non-finite', theta, NaN, 0, evaluations, ws, p, options);
  normalEquations(ws.J, ws.r, n, p, A, g);
  let maxDiag = 0;
  for (let j = 0; j < p; j++) {
    D[j] = Math.max(A[j * p + j], 1e-300);
    maxDiag = Math.max(maxDiag, A[j * p + j]);
  }
  if (!(maxDiag > 0))
    return finish(ssr === 0 ? 'converged-gradient' : 'singular', theta, ssr, 0, evaluations, ws, p, options);
  let lambda = 1e-3;
  let nu = 2;

  for (let it = 1; it <= maxIterations; it++) {
    if (ssr === 0) return finish('converged-gradient', theta, ssr, it - 1, evaluations, ws, p, options);
    if (projectGradient(ws, theta, p, ssr, options) <= gtol)
      return finish('converged-gradient', theta, ssr, it - 1, evaluations, ws, p, options);
    // Inner loop: raise λ until a step lowers SSR.
    for (;;) {
      if (!dampedCholeskySolve(As, D, lambda, gs, delta, p, L, scale)) {
        lambda *= nu;
        nu *= 2;
        if (!Number.isFinite(lambda) || lambda > 1e30)
          return finish('singular', theta, ssr, it, evaluations, ws, p, options);
        continue;
      }
      const { pred, small } = trialStep(ws, theta, p, options, xtol);
      evaluations++;
      const ssrT = problem.evaluate(ws.trial, ws.rT, ws.JT) ? sumOfSquares(ws.rT, n) : Infinity;
      const actual = ssr - ssrT;
      const rho = pred > 0 ? actual / pred : -1;
      if (actual > 0 && rho > 0) {
        for (let j = 0; j < p; j++) theta[j] = ws.trial[j];
        ssr = ssrT;
        swapTrial(ws);
        normalEquations(ws.J, ws.r, n, p, A, g);
        for (let j = 0; j < p; j++) D[j] = Math.max(D[j], A[j * p + j]);
        lambda *= Math.max(1 / 3, 1 - Math.pow(2 * rho - 1, 3));
        nu = 2;
        if (actual <= ftol * ssrT && pred <= ftol * ssrT && rho <= 2)
          return finish('converged-ssr', theta, ssr, it, evaluations, ws, p, options);
        if (small) return finish('converged-step', theta, ssr, it, evaluations, ws, p, options);
        break;
      }
      // Rejected: at the precision limit the predicted gain itself is negligible.
      if (Math.abs(actual) <= ftol * ssr && pred <= ftol * ssr)
        return finish('converged-ssr', theta, ssr, it, evaluations, ws, p, options);
      if (small && pred <= 1e-12 * ssr)
        return finish('converged-step', theta, ssr, it, evaluations, ws, p, options);
      lambda *= nu;
      nu *= 2;
      if (!Number.isFinite(lambda) || lambda > 1e30)
        return finish('singular', theta, ssr, it, evaluations, ws, p, options);
    }
  }
  return finish('max-iterations', theta, ssr, maxIterations, evaluations, ws, p, options);
}

/** The accepted trial's residuals and Jacobian become the current ones (buffers trade places). */
function swapTrial(ws: Workspace): void {
  const r = ws.r;
  ws.r = ws.rT;
  ws.rT = r;
  const J = ws.J;
  ws.J = ws.JT;
  ws.JT = J;
}
