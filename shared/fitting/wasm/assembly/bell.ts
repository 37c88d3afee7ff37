// The bell model's summary fit compiled to WebAssembly (AssemblyScript), for bulk runs such as
// `bellwether fit`. It is the same computation as the TypeScript engine, step for step:
//   starts      ../../starts.ts        (grid over pKa1 < pKa2, V solved linearly; best four)
//   solver      ../../lm.ts, linalg.ts (Levenberg–Marquardt with bounds, same rules and tolerances)
//   fit         ../../fit-core.ts      (natural fit, ordered refit, runaway pKa held far away,
//                                       parameters without influence left undetermined)
//   summary     ../../describe.ts, uncertainty.ts, stats/runs-test.ts, flags.ts (flag codes only)
// and tests/unit/fitting/bell-wasm.test.ts checks that both give the same results on the
// reference files. Compiled code needs no warm-up, which is what a one-shot command line needs.
// Build: `npm run build:wasm` (writes ../bell-wasm.ts); a test checks the committed build is current.
//
// Memory: the caller writes one profile's pH values, activities and (optionally) weights into the
// input arrays, calls fitProfile and reads `out`; or it hands over a whole datasets file (see the
// end of this file). The table of log k! is filled by the caller when asked (needLogFactorials);
// Student's t quantiles come from the caller through t975, asked only when a flag needs one. A
// profile that prepareProfile (ph-data.ts) would refuse is not fitted: the caller lets the engine
// say why.

import { T975_MAX, T975_TABLE } from './t975';

const MAXN: i32 = 4096;
const P: i32 = 3;
const LN10: f64 = 2.302585092994046;
const DETERMINED_MARGIN: f64 = 2;
const FAR: f64 = 40;
const BOX_MARGIN: f64 = 3;
const GRID_STEPS: i32 = 6;
const KEEP: i32 = 4;
const MAX_ITERATIONS: i32 = 200;
const FTOL: f64 = 1e-15;
const XTOL: f64 = 1e-11;
const GTOL: f64 = 1e-12;
const NARROW_DELTA: f64 = 2;
const POINTS_PER_PARAMETER: i32 = 3;
const RUNS_ALPHA: f64 = 0.05;

// status of a parameter
const FREE: i32 = 0;
const FIXED: i32 = 1;
const UNDETERMINED: i32 = 2;

// stop reasons, in the order of lm.ts's StopReason
const CONVERGED_GRADIENT: i32 = 0;
const CONVERGED_STEP: i32 = 1;
const CONVERGED_SSR: i32 = 2;
const MAX_ITER: i32 = 3;
const SINGULAR: i32 = 4;
const NON_FINITE: i32 = 5;

// flag bits, in the order flags.ts lists them for the bell
const F_NOT_CONVERGED: i32 = 1;
const F_V_UNDETERMINED: i32 = 2;
const F_PKA1_UNDETERMINED: i32 = 4;
const F_PKA2_UNDETERMINED: i32 = 8;
const F_PKA1_OUTSIDE: i32 = 16;
const F_PKA2_OUTSIDE: i32 = 32;
const F_TOO_CLOSE: i32 = 64;
const F_NARROW: i32 = 128;
const F_TOO_FEW: i32 = 256;
const F_RUNS: i32 = 512;

// ---- inputs, tables and output -------------------------------------------------------------
// Student's t 97.5 % quantile for ν degrees of freedom (NaN when there is none), from the caller
@external("env", "t975")
declare function t975(dof: i32): f64;
// asks the caller to fill logFact up to k (log k! as runs-test.ts computes it)
@external("env", "needLogFactorials")
declare function needLogFactorials(k: i32): void;

const inPH = new StaticArray<f64>(MAXN);
const inV = new StaticArray<f64>(MAXN);
const inH = new StaticArray<f64>(MAXN);
const inG = new StaticArray<f64>(MAXN);
const inY = new StaticArray<f64>(MAXN);
const inSW = new StaticArray<f64>(MAXN);
const inW = new StaticArray<f64>(MAXN);
const logFact = new StaticArray<f64>(MAXN + 1);
const out = new StaticArray<f64>(32);

export function maxPoints(): i32 {
  return MAXN;
}
export function pHPtr(): usize {
  return changetype<usize>(inPH);
}
export function wPtr(): usize {
  return changetype<usize>(inW);
}
export function vPtr(): usize {
  return changetype<usize>(inV);
}
export function logFactPtr(): usize {
  return changetype<usize>(logFact);
}
export function outPtr(): usize {
  return changetype<usize>(out);
}

// ---- the profile being fitted ----------------------------------------------------------------
let n: i32 = 0;
let dataLo: f64 = 0;
let dataHi: f64 = 0;

@inline function pow10(x: f64): f64 {
  return Math.exp(x * LN10);
}

// ---- the affine map θ = c + M·u of the current spec (param-map.ts) ----------------------------
const specFixed = new StaticArray<f64>(P); // NaN: fitted
let specOrdered: bool = false;
let q: i32 = 0;
let identity: bool = true;
const freeIdx = new StaticArray<i32>(P);
const mapC = new StaticArray<f64>(P);
const mapM = new StaticArray<f64>(P * P); // p×q row-major
const lower = new StaticArray<f64>(P);
const upper = new StaticArray<f64>(P);

function isFixed(j: i32): bool {
  return !isNaN(unchecked(specFixed[j]));
}

function buildMap(): void {
  const lowPKa = dataLo - BOX_MARGIN;
  const highPKa = dataHi + BOX_MARGIN;
  q = 0;
  for (let j = 0; j < P; j++) if (!isFixed(j)) unchecked((freeIdx[q++] = j));
  let chained = false;
  for (let k = 0; k < q; k++) {
    const j = unchecked(freeIdx[k]);
    if (j < 1) {
      unchecked((lower[k] = -Infinity));
      unchecked((upper[k] = Infinity));
    } else if (specOrdered && chained) {
      unchecked((lower[k] = 0));
      unchecked((upper[k] = highPKa - lowPKa));
    } else {
      unchecked((lower[k] = lowPKa));
      unchecked((upper[k] = highPKa));
      chained = true;
    }
  }
  identity = q == P && !specOrdered;
  if (identity) return;
  for (let j = 0; j < P; j++) {
    unchecked((mapC[j] = isFixed(j) ? specFixed[j] : 0));
    for (let k = 0; k < q; k++) unchecked((mapM[j * q + k] = 0));
  }
  // the pKa chain: each free pKa is the first one plus the increments up to it
  let chainLen = 0;
  for (let k = 0; k < q; k++) {
    const j = unchecked(freeIdx[k]);
    if (j >= 1 && specOrdered) {
      unchecked((chain[chainLen++] = k));
      for (let l = 0; l < chainLen; l++) unchecked((mapM[j * q + chain[l]] = 1));
    } else {
      unchecked((mapM[j * q + k] = 1));
    }
  }
}

const chain = new StaticArray<i32>(P);

function toTheta(u: StaticArray<f64>, theta: StaticArray<f64>): void {
  if (identity) {
    for (let j = 0; j < P; j++) unchecked((theta[j] = u[j]));
    return;
  }
  for (let j = 0; j < P; j++) {
    let s = unchecked(mapC[j]);
    for (let k = 0; k < q; k++) s += unchecked(mapM[j * q + k]) * unchecked(u[k]);
    unchecked((theta[j] = s));
  }
}

/** The free vector of model parameters θ (increments for an ordered chain), clamped into the box. */
function toFreeClamped(theta: StaticArray<f64>, u: StaticArray<f64>): void {
  let prev: f64 = NaN;
  let hasPrev = false;
  for (let k = 0; k < q; k++) {
    const j = unchecked(freeIdx[k]);
    let v: f64;
    if (j >= 1 && specOrdered) {
      v = hasPrev ? Math.max(0, unchecked(theta[j]) - prev) : unchecked(theta[j]);
      prev = unchecked(theta[j]);
      hasPrev = true;
    } else {
      v = unchecked(theta[j]);
    }
    unchecked((u[k] = Math.min(unchecked(upper[k]), Math.max(unchecked(lower[k]), v))));
  }
}

// ---- residuals and Jacobian (ph-problem.ts) ---------------------------------------------------
let rCur = new StaticArray<f64>(MAXN);
let rTrial = new StaticArray<f64>(MAXN);
let jCur = new StaticArray<f64>(MAXN * P);
let jTrial = new StaticArray<f64>(MAXN * P);
const evalTheta = new StaticArray<f64>(P);

/** Weighted residuals √w(y − f) and, when asked, J = √w ∂f/∂u. False when anything is not finite. */
function evaluate(u: StaticArray<f64>, r: StaticArray<f64>, J: StaticArray<f64>, withJ: bool): bool {
  toTheta(u, evalTheta);
  const V = unchecked(evalTheta[0]);
  const K1 = pow10(unchecked(evalTheta[1]));
  const K2 = pow10(-unchecked(evalTheta[2]));
  for (let i = 0; i < n; i++) {
    const a = K1 * unchecked(inH[i]);
    const b = K2 * unchecked(inG[i]);
    const D = 1 + a + b;
    const f = V / D;
    const sw = unchecked(inSW[i]);
    const ri = sw * (unchecked(inY[i]) - f);
    if (!isFinite(ri)) return false;
    unchecked((r[i] = ri));
    if (!withJ) continue;
    const qq = (f * LN10) / D;
    const g0 = 1 / D;
    const g1 = -qq * a;
    const g2 = qq * b;
    const row = i * q;
    if (identity) {
      unchecked((J[row] = sw * g0));
      unchecked((J[row + 1] = sw * g1));
      unchecked((J[row + 2] = sw * g2));
    } else {
      for (let c = 0; c < q; c++) {
        const s = g0 * unchecked(mapM[c]) + g1 * unchecked(mapM[q + c]) + g2 * unchecked(mapM[2 * q + c]);
        unchecked((J[row + c] = sw * s));
      }
    }
  }
  return true;
}

// ---- Levenberg–Marquardt (lm.ts) --------------------------------------------------------------
const A = new StaticArray<f64>(P * P);
const As = new StaticArray<f64>(P * P);
const L = new StaticArray<f64>(P * P);
const sc = new StaticArray<f64>(P);
const gv = new StaticArray<f64>(P);
const gs = new StaticArray<f64>(P);
const Dg = new StaticArray<f64>(P);
const delta = new StaticArray<f64>(P);
const trial = new StaticArray<f64>(P);
const held = new StaticArray<bool>(P);
const lmTheta = new StaticArray<f64>(P);
let lmSsr: f64 = 0;
let lmIterations: i32 = 0;
let lmStop: i32 = 0;

function sumOfSquares(r: StaticArray<f64>): f64 {
  let s: f64 = 0;
  for (let i = 0; i < n; i++) s += unchecked(r[i]) * unchecked(r[i]);
  return isFinite(s) ? s : Infinity;
}

function normalEquations(): void {
  if (q == 3) {
    normalEquations3();
    return;
  }
  for (let k = 0; k < q * q; k++) unchecked((A[k] = 0));
  for (let k = 0; k < q; k++) unchecked((gv[k] = 0));
  for (let i = 0; i < n; i++) {
    const row = i * q;
    const ri = unchecked(rCur[i]);
    for (let a = 0; a < q; a++) {
      const ja = unchecked(jCur[row + a]);
      unchecked((gv[a] += ja * ri));
      for (let b = 0; b <= a; b++) unchecked((A[a * q + b] += ja * unchecked(jCur[row + b])));
    }
  }
  for (let a = 0; a < q; a++) for (let b = 0; b < a; b++) unchecked((A[b * q + a] = A[a * q + b]));
}

/** The same sums for three parameters (the plain bell), in the same order, written out. */
function normalEquations3(): void {
  let a00: f64 = 0;
  let a10: f64 = 0;
  let a11: f64 = 0;
  let a20: f64 = 0;
  let a21: f64 = 0;
  let a22: f64 = 0;
  let g0: f64 = 0;
  let g1: f64 = 0;
  let g2: f64 = 0;
  for (let i = 0; i < n; i++) {
    const row = i * 3;
    const ri = unchecked(rCur[i]);
    const j0 = unchecked(jCur[row]);
    const j1 = unchecked(jCur[row + 1]);
    const j2 = unchecked(jCur[row + 2]);
    g0 += j0 * ri;
    a00 += j0 * j0;
    g1 += j1 * ri;
    a10 += j1 * j0;
    a11 += j1 * j1;
    g2 += j2 * ri;
    a20 += j2 * j0;
    a21 += j2 * j1;
    a22 += j2 * j2;
  }
  unchecked((A[0] = a00));
  unchecked((A[1] = a10));
  unchecked((A[2] = a20));
  unchecked((A[3] = a10));
  unchecked((A[4] = a11));
  unchecked((A[5] = a21));
  unchecked((A[6] = a20));
  unchecked((A[7] = a21));
  unchecked((A[8] = a22));
  unchecked((gv[0] = g0));
  unchecked((gv[1] = g1));
  unchecked((gv[2] = g2));
}

function dampedCholeskySolve(lambda: f64): bool {
  const p = q;
  for (let i = 0; i < p; i++) {
    const di = unchecked(As[i * p + i]) + lambda * unchecked(Dg[i]);
    if (!(di > 0) || !isFinite(di)) return false;
    unchecked((sc[i] = 1 / Math.sqrt(di)));
  }
  for (let i = 0; i < p; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = (unchecked(As[i * p + j]) + (i == j ? lambda * unchecked(Dg[i]) : 0)) * unchecked(sc[i]) * unchecked(sc[j]);
      for (let k = 0; k < j; k++) sum -= unchecked(L[i * p + k]) * unchecked(L[j * p + k]);
      if (i == j) {
        if (!(sum > 1e-15)) return false;
        unchecked((L[i * p + i] = Math.sqrt(sum)));
      } else {
        unchecked((L[i * p + j] = sum / unchecked(L[j * p + j])));
      }
    }
  }
  for (let i = 0; i < p; i++) {
    let sum = unchecked(gs[i]) * unchecked(sc[i]);
    for (let k = 0; k < i; k++) sum -= unchecked(L[i * p + k]) * unchecked(delta[k]);
    unchecked((delta[i] = sum / unchecked(L[i * p + i])));
  }
  for (let i = p - 1; i >= 0; i--) {
    let sum = unchecked(delta[i]);
    for (let k = i + 1; k < p; k++) sum -= unchecked(L[k * p + i]) * unchecked(delta[k]);
    unchecked((delta[i] = sum / unchecked(L[i * p + i])));
  }
  for (let i = 0; i < p; i++) unchecked((delta[i] *= sc[i]));
  return true;
}

function projectGradient(theta: StaticArray<f64>, ssr: f64): f64 {
  const p = q;
  let gmax: f64 = 0;
  for (let j = 0; j < p; j++) {
    const t = unchecked(theta[j]);
    const g = unchecked(gv[j]);
    const h = (t <= unchecked(lower[j]) && g < 0) || (t >= unchecked(upper[j]) && g > 0);
    unchecked((held[j] = h));
    unchecked((gs[j] = h ? 0 : g));
    const colNorm = Math.sqrt(unchecked(A[j * p + j]));
    if (!h && colNorm > 0) gmax = Math.max(gmax, Math.abs(g) / (colNorm * Math.sqrt(ssr)));
  }
  for (let j = 0; j < p; j++) {
    for (let k = 0; k < p; k++) {
      let v: f64;
      if (unchecked(held[j]) || unchecked(held[k])) {
        const d = unchecked(A[j * p + j]);
        v = j == k ? (d != 0 && !isNaN(d) ? d : 1) : 0;
      } else v = unchecked(A[j * p + k]);
      unchecked((As[j * p + k] = v));
    }
  }
  return gmax;
}

let trialSmall: bool = false;

/** θ + δ clipped into the bounds (δ becomes the clipped step); returns 2δᵀg − δᵀAδ. */
function trialStep(theta: StaticArray<f64>): f64 {
  const p = q;
  for (let j = 0; j < p; j++) {
    let t = unchecked(theta[j]) + unchecked(delta[j]);
    if (t < unchecked(lower[j])) t = unchecked(lower[j]);
    if (t > unchecked(upper[j])) t = unchecked(upper[j]);
    unchecked((trial[j] = t));
  }
  let small = true;
  for (let j = 0; j < p; j++) {
    const d = unchecked(trial[j]) - unchecked(theta[j]);
    unchecked((delta[j] = d));
    if (Math.abs(d) > XTOL * (Math.abs(unchecked(theta[j])) + XTOL)) small = false;
  }
  trialSmall = small;
  let pred: f64 = 0;
  for (let j = 0; j < p; j++) {
    let ad: f64 = 0;
    for (let k = 0; k < p; k++) ad += unchecked(A[j * p + k]) * unchecked(delta[k]);
    pred += unchecked(delta[j]) * (2 * unchecked(gv[j]) - ad);
  }
  return pred;
}

function finish(reason: i32, ssr: f64, iterations: i32): void {
  let stop = reason;
  if (stop <= CONVERGED_SSR && ssr > 0) {
    // a parameter without influence (a zero Jacobian column) makes the problem singular
    let maxA: f64 = 0;
    for (let j = 0; j < q; j++) maxA = Math.max(maxA, unchecked(A[j * q + j]));
    for (let j = 0; j < q; j++) if (!(unchecked(A[j * q + j]) > 1e-28 * maxA)) stop = SINGULAR;
  }
  lmSsr = ssr;
  lmIterations = iterations;
  lmStop = stop;
}

function swapTrial(): void {
  const r = rCur;
  rCur = rTrial;
  rTrial = r;
  const J = jCur;
  jCur = jTrial;
  jTrial = J;
}

/** Runs from u (length q, already inside the box); the result is in lmTheta, lmSsr, lmStop. */
function levenbergMarquardt(u: StaticArray<f64>): void {
  const p = q;
  const theta = lmTheta;
  for (let j = 0; j < p; j++) {
    let t = unchecked(u[j]);
    if (t < unchecked(lower[j])) t = unchecked(lower[j]);
    if (t > unchecked(upper[j])) t = unchecked(upper[j]);
    unchecked((theta[j] = t));
  }
  if (!evaluate(theta, rCur, jCur, true)) {
    finish(NON_FINITE, NaN, 0);
    return;
  }
  let ssr = sumOfSquares(rCur);
  if (!isFinite(ssr)) {
    finish(NON_FINITE, NaN, 0);
    return;
  }
  normalEquations();
  let maxDiag: f64 = 0;
  for (let j = 0; j < p; j++) {
    unchecked((Dg[j] = Math.max(unchecked(A[j * p + j]), 1e-300)));
    maxDiag = Math.max(maxDiag, unchecked(A[j * p + j]));
  }
  if (!(maxDiag > 0)) {
    finish(ssr == 0 ? CONVERGED_GRADIENT : SINGULAR, ssr, 0);
    return;
  }
  let lambda: f64 = 1e-3;
  let nu: f64 = 2;
  for (let it = 1; it <= MAX_ITERATIONS; it++) {
    if (ssr == 0) {
      finish(CONVERGED_GRADIENT, ssr, it - 1);
      return;
    }
    if (projectGradient(theta, ssr) <= GTOL) {
      finish(CONVERGED_GRADIENT, ssr, it - 1);
      return;
    }
    for (;;) {
      if (!dampedCholeskySolve(lambda)) {
        lambda *= nu;
        nu *= 2;
        if (!isFinite(lambda) || lambda > 1e30) {
          finish(SINGULAR, ssr, it);
          return;
        }
        continue;
      }
      const pred = trialStep(theta);
      const small = trialSmall;
      const ssrT = evaluate(trial, rTrial, jTrial, true) ? sumOfSquares(rTrial) : Infinity;
      const actual = ssr - ssrT;
      const rho = pred > 0 ? actual / pred : -1;
      if (actual > 0 && rho > 0) {
        for (let j = 0; j < p; j++) unchecked((theta[j] = trial[j]));
        ssr = ssrT;
        swapTrial();
        normalEquations();
        for (let j = 0; j < p; j++) unchecked((Dg[j] = Math.max(unchecked(Dg[j]), unchecked(A[j * p + j]))));
        lambda *= Math.max(1.0 / 3, 1 - Math.pow(2 * rho - 1, 3));
        nu = 2;
        if (actual <= FTOL * ssrT && pred <= FTOL * ssrT && rho <= 2) {
          finish(CONVERGED_SSR, ssr, it);
          return;
        }
        if (small) {
          finish(CONVERGED_STEP, ssr, it);
          return;
        }
        break;
      }
      if (Math.abs(actual) <= FTOL * ssr && pred <= FTOL * ssr) {
        finish(CONVERGED_SSR, ssr, it);
        return;
      }
      if (small && pred <= 1e-12 * ssr) {
        finish(CONVERGED_STEP, ssr, it);
        return;
      }
      lambda *= nu;
      nu *= 2;
      if (!isFinite(lambda) || lambda > 1e30) {
        finish(SINGULAR, ssr, it);
        return;
      }
    }
  }
  finish(MAX_ITER, ssr, MAX_ITERATIONS);
}

// ---- grid starts (starts.ts) ------------------------------------------------------------------
const candTheta = new StaticArray<f64>(KEEP * P);
const candSsr = new StaticArray<f64>(KEEP);
let candCount: i32 = 0;
const grid = new StaticArray<f64>(GRID_STEPS + 1);
const gridUp = new StaticArray<f64>(GRID_STEPS + 1);
const gridDown = new StaticArray<f64>(GRID_STEPS + 1);
const leafTheta = new StaticArray<f64>(P);

/** BestStarts.offer: a short list sorted by SSR, ties keep the earlier point. */
function offer(t0: f64, t1: f64, t2: f64, ssr: f64): void {
  if (candCount >= KEEP && !(ssr < unchecked(candSsr[candCount - 1]))) return;
  let at = candCount;
  while (at > 0 && unchecked(candSsr[at - 1]) > ssr) at--;
  const last = candCount < KEEP ? candCount : KEEP - 1;
  for (let k = last; k > at; k--) {
    unchecked((candSsr[k] = candSsr[k - 1]));
    for (let j = 0; j < P; j++) unchecked((candTheta[k * P + j] = candTheta[(k - 1) * P + j]));
  }
  unchecked((candSsr[at] = ssr));
  unchecked((candTheta[at * P] = t0));
  unchecked((candTheta[at * P + 1] = t1));
  unchecked((candTheta[at * P + 2] = t2));
  if (candCount < KEEP) candCount++;
}

function gridLeaf(syy: f64): void {
  const k0 = pow10(unchecked(leafTheta[1]));
  const k1 = pow10(-unchecked(leafTheta[2]));
  let sxy: f64 = 0;
  let sxx: f64 = 0;
  for (let i = 0; i < n; i++) {
    const phi = 1 / (1 + k0 * unchecked(inH[i]) + k1 * unchecked(inG[i]));
    const wf = unchecked(inW[i]) * phi;
    sxy += wf * unchecked(inY[i]);
    sxx += wf * phi;
  }
  const V = sxy / sxx;
  const ssr = sxx > 1e-300 ? Math.max(0, syy - (sxy * sxy) / sxx) : Infinity;
  if (isFinite(ssr)) offer(V, unchecked(leafTheta[1]), unchecked(leafTheta[2]), ssr);
}

function gridStarts(): void {
  candCount = 0;
  const lo = dataLo - 1;
  const step = (dataHi + 1 - lo) / GRID_STEPS;
  for (let i = 0; i <= GRID_STEPS; i++) unchecked((grid[i] = lo + i * step));
  let syy: f64 = 0;
  for (let i = 0; i < n; i++) syy += unchecked(inW[i]) * unchecked(inY[i]) * unchecked(inY[i]);
  const free1 = !isFixed(1);
  const free2 = !isFixed(2);
  if (free1 && free2) {
    for (let i = 0; i <= GRID_STEPS; i++) {
      unchecked((gridUp[i] = pow10(grid[i])));
      unchecked((gridDown[i] = pow10(-grid[i])));
    }
    for (let a = 0; a <= GRID_STEPS; a++) {
      for (let b = a + 1; b <= GRID_STEPS; b++) {
        const up = unchecked(gridUp[a]);
        const down = unchecked(gridDown[b]);
        let sxy: f64 = 0;
        let sxx: f64 = 0;
        for (let i = 0; i < n; i++) {
          const phi = 1 / (1 + up * unchecked(inH[i]) + down * unchecked(inG[i]));
          const wf = unchecked(inW[i]) * phi;
          sxy += wf * unchecked(inY[i]);
          sxx += wf * phi;
        }
        if (!(sxx > 1e-300)) continue;
        const ssr = Math.max(0, syy - (sxy * sxy) / sxx);
        if (!isFinite(ssr)) continue;
        offer(sxy / sxx, unchecked(grid[a]), unchecked(grid[b]), ssr);
      }
    }
    return;
  }
  unchecked((leafTheta[0] = 0));
  unchecked((leafTheta[1] = free1 ? 0 : specFixed[1]));
  unchecked((leafTheta[2] = free2 ? 0 : specFixed[2]));
  if (free1 || free2) {
    const j = free1 ? 1 : 2;
    for (let k = 0; k <= GRID_STEPS; k++) {
      unchecked((leafTheta[j] = grid[k]));
      gridLeaf(syy);
    }
  } else {
    gridLeaf(syy);
  }
}

// ---- one spec from grid starts (fit-core.ts fitSpec) -------------------------------------------
const runTheta = new StaticArray<f64>(P);
let runSsr: f64 = 0;
let runStop: i32 = 0;
let runIterations: i32 = 0;
let runStarts: i32 = 0;
const startU = new StaticArray<f64>(P);
const candidate = new StaticArray<f64>(P);

@inline function isConverged(stop: i32): bool {
  return stop <= CONVERGED_SSR;
}

/** Fits the current spec; false when no start could be evaluated. */
function fitSpec(): bool {
  buildMap();
  gridStarts();
  let have = false;
  runStarts = 0;
  for (let c = 0; c < candCount; c++) {
    runStarts++;
    for (let j = 0; j < P; j++) unchecked((candidate[j] = candTheta[c * P + j]));
    toFreeClamped(candidate, startU);
    levenbergMarquardt(startU);
    const conv = isConverged(lmStop);
    const bestConv = have && isConverged(runStop);
    const better =
      !have || (conv && !bestConv) || (conv == bestConv && isFinite(lmSsr) && !(lmSsr >= runSsr));
    if (better) {
      toTheta(lmTheta, runTheta);
      runSsr = lmSsr;
      runStop = lmStop;
      runIterations = lmIterations;
      have = true;
    }
    if (have && isConverged(runStop)) break;
  }
  return have;
}

// ---- the full fit (fit-core.ts fitModel) -------------------------------------------------------
const status = new StaticArray<i32>(P);
let totalStarts: i32 = 0;

function pKaOrderViolated(): bool {
  let prev: f64 = -Infinity;
  for (let j = 1; j < P; j++) {
    if (isFixed(j)) continue;
    if (unchecked(runTheta[j]) < prev - 1e-12) return true;
    prev = unchecked(runTheta[j]);
  }
  return false;
}

function fitModel(): bool {
  for (let j = 0; j < P; j++) {
    unchecked((specFixed[j] = NaN));
    unchecked((status[j] = FREE));
  }
  specOrdered = false;
  let wrongSide = false;
  if (!fitSpec()) return false;
  totalStarts = runStarts;
  for (let round = 0; round <= P; round++) {
    if (!specOrdered && pKaOrderViolated()) {
      specOrdered = true;
      if (!fitSpec()) return false;
      totalStarts += runStarts;
    }
    let changed = false;
    for (let j = 1; j < P; j++) {
      if (isFixed(j)) continue;
      const t = unchecked(runTheta[j]);
      const below = t < dataLo - DETERMINED_MARGIN;
      const above = t > dataHi + DETERMINED_MARGIN;
      if (!below && !above) continue;
      // pKa1 may run away towards low pH, pKa2 towards high pH (models/bell.ts runaway)
      if ((j == 1 && below) || (j == 2 && above)) {
        unchecked((specFixed[j] = j == 1 ? dataLo - FAR : dataHi + FAR));
        unchecked((status[j] = FIXED));
        changed = true;
      } else {
        unchecked((status[j] = UNDETERMINED));
        wrongSide = true;
      }
    }
    if (!changed) break;
    if (!fitSpec()) return false;
    totalStarts += runStarts;
  }
  if (wrongSide) unchecked((status[0] = UNDETERMINED));
  markWithoutInfluence();
  return true;
}

// model Jacobian ∂f/∂θ (unweighted) and fitted values at runTheta
const mj = new StaticArray<f64>(MAXN * P);
const fitted = new StaticArray<f64>(MAXN);

function modelJacobian(): void {
  const V = unchecked(runTheta[0]);
  const K1 = pow10(unchecked(runTheta[1]));
  const K2 = pow10(-unchecked(runTheta[2]));
  for (let i = 0; i < n; i++) {
    const a = K1 * unchecked(inH[i]);
    const b = K2 * unchecked(inG[i]);
    const D = 1 + a + b;
    const f = V / D;
    const qq = (f * LN10) / D;
    unchecked((fitted[i] = f));
    unchecked((mj[i * P] = 1 / D));
    unchecked((mj[i * P + 1] = -qq * a));
    unchecked((mj[i * P + 2] = qq * b));
  }
}

const norms = new StaticArray<f64>(P);

function markWithoutInfluence(): void {
  modelJacobian();
  for (let j = 0; j < P; j++) unchecked((norms[j] = 0));
  for (let i = 0; i < n; i++) {
    const w = unchecked(inW[i]);
    if (!(w > 0)) continue;
    for (let j = 0; j < P; j++) unchecked((norms[j] += w * unchecked(mj[i * P + j]) * unchecked(mj[i * P + j])));
  }
  let largest: f64 = -Infinity;
  for (let j = 0; j < P; j++) if (!isFixed(j)) largest = Math.max(largest, unchecked(norms[j]));
  for (let j = 0; j < P; j++) {
    if (!isFixed(j) && unchecked(status[j]) == FREE && !(unchecked(norms[j]) > 1e-24 * largest))
      unchecked((status[j] = UNDETERMINED));
  }
}

// ---- covariance (uncertainty.ts, linalg.ts invertSymmetric) -------------------------------------
const cov = new StaticArray<f64>(P * P);
const gj = new StaticArray<f64>(P * 2 * P);
const isc = new StaticArray<f64>(P);

/** (JᵀWJ)⁻¹ over the free columns into cov; false when numerically singular. */
function inverseNormalMatrix(): bool {
  const m = q;
  for (let k = 0; k < m * m; k++) unchecked((cov[k] = 0));
  for (let i = 0; i < n; i++) {
    const w = unchecked(inW[i]);
    if (!(w > 0)) continue;
    for (let a = 0; a < m; a++) {
      const ja = unchecked(mj[i * P + freeIdx[a]]) * w;
      for (let b = 0; b <= a; b++) unchecked((cov[a * m + b] += ja * unchecked(mj[i * P + freeIdx[b]])));
    }
  }
  for (let a = 0; a < m; a++) for (let b = 0; b < a; b++) unchecked((cov[b * m + a] = cov[a * m + b]));
  // Gauss–Jordan with partial pivoting on the Jacobi-scaled matrix, tolerance 1e-13
  for (let i = 0; i < m; i++) {
    const di = unchecked(cov[i * m + i]);
    if (!(di > 0) || !isFinite(di)) return false;
    unchecked((isc[i] = 1 / Math.sqrt(di)));
  }
  const w2 = 2 * m;
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < w2; j++) unchecked((gj[i * w2 + j] = 0));
    for (let j = 0; j < m; j++) unchecked((gj[i * w2 + j] = cov[i * m + j] * isc[i] * isc[j]));
    unchecked((gj[i * w2 + m + i] = 1));
  }
  for (let c = 0; c < m; c++) {
    let piv = c;
    for (let r = c + 1; r < m; r++)
      if (Math.abs(unchecked(gj[r * w2 + c])) > Math.abs(unchecked(gj[piv * w2 + c]))) piv = r;
    if (!(Math.abs(unchecked(gj[piv * w2 + c])) > 1e-13)) return false;
    if (piv != c) {
      for (let k = 0; k < w2; k++) {
        const t = unchecked(gj[c * w2 + k]);
        unchecked((gj[c * w2 + k] = gj[piv * w2 + k]));
        unchecked((gj[piv * w2 + k] = t));
      }
    }
    const inv = 1 / unchecked(gj[c * w2 + c]);
    for (let k = 0; k < w2; k++) unchecked((gj[c * w2 + k] *= inv));
    for (let r = 0; r < m; r++) {
      if (r == c) continue;
      const f = unchecked(gj[r * w2 + c]);
      if (f == 0) continue;
      for (let k = 0; k < w2; k++) unchecked((gj[r * w2 + k] -= f * gj[c * w2 + k]));
    }
  }
  for (let i = 0; i < m; i++)
    for (let j = 0; j < m; j++) unchecked((cov[i * m + j] = gj[i * w2 + m + j] * isc[i] * isc[j]));
  for (let i = 0; i < m; i++) {
    const d = unchecked(cov[i * m + i]);
    if (!isFinite(d) || d < 0) return false;
  }
  return true;
}

// ---- runs test (stats/runs-test.ts) ------------------------------------------------------------
const order = new StaticArray<i32>(MAXN);
let runsCount: i32 = 0;

function logChoose(nn: i32, k: i32): f64 {
  if (k < 0 || k > nn) return -Infinity;
  return unchecked(logFact[nn]) - unchecked(logFact[k]) - unchecked(logFact[nn - k]);
}

function probRuns(r: i32, n1: i32, n2: i32): f64 {
  const total = logChoose(n1 + n2, n1);
  if (r % 2 == 0) {
    const k = r / 2;
    return 2 * Math.exp(logChoose(n1 - 1, k - 1) + logChoose(n2 - 1, k - 1) - total);
  }
  const k = (r - 1) / 2;
  return (
    Math.exp(logChoose(n1 - 1, k - 1) + logChoose(n2 - 1, k) - total) +
    Math.exp(logChoose(n1 - 1, k) + logChoose(n2 - 1, k - 1) - total)
  );
}

/** P(R ≤ observed runs) of the residuals y − f in order of pH; NaN when the test does not apply. */
function runsPValue(): f64 {
  needLogFactorials(n);
  let count = 0;
  let sorted = true;
  for (let i = 0; i < n; i++) {
    const r = unchecked(inY[i]) - unchecked(fitted[i]);
    if (r == 0 || !isFinite(r) || !(unchecked(inW[i]) > 0)) continue;
    if (count > 0 && unchecked(inPH[i]) < unchecked(inPH[order[count - 1]])) sorted = false;
    unchecked((order[count++] = i));
  }
  if (!sorted) {
    // insertion sort by pH, ties in input order (stable)
    for (let a = 1; a < count; a++) {
      const idx = unchecked(order[a]);
      const x = unchecked(inPH[idx]);
      let b = a - 1;
      while (b >= 0 && unchecked(inPH[order[b]]) > x) {
        unchecked((order[b + 1] = order[b]));
        b--;
      }
      unchecked((order[b + 1] = idx));
    }
  }
  let positive = 0;
  let negative = 0;
  let runs = 0;
  let last = 0;
  for (let k = 0; k < count; k++) {
    const i = unchecked(order[k]);
    const s = unchecked(inY[i]) - unchecked(fitted[i]) > 0 ? 1 : -1;
    if (s > 0) positive++;
    else negative++;
    if (s != last) runs++;
    last = s;
  }
  runsCount = runs;
  if (positive < 2 || negative < 2) return NaN;
  let p: f64 = 0;
  for (let r = 2; r <= runs; r++) p += probRuns(r, positive, negative);
  return Math.min(1, p);
}

// ---- the whole fit and its summary (describe.ts, detail 'summary') ------------------------------

// pH values outside this span are not pH values an assay can have (ph-data.ts PH_LIMITS)
const PH_MIN: f64 = -2;
const PH_MAX: f64 = 16;
const sortedPH = new StaticArray<f64>(MAXN);

/**
 * prepareProfile (ph-data.ts) on the input arrays: h = 10^−pH, g = 10^pH, weights and their roots,
 * activities divided by their largest magnitude. False for a profile it would refuse.
 */
function prepare(count: i32, hasWeights: bool): bool {
  n = count;
  nUsed = 0;
  dataLo = Infinity;
  dataHi = -Infinity;
  let scale: f64 = 0;
  let sorted = true;
  let last: f64 = NaN;
  for (let i = 0; i < n; i++) {
    const x = unchecked(inPH[i]);
    const v = unchecked(inV[i]);
    const wi = hasWeights ? unchecked(inW[i]) : 1;
    if (!isFinite(x) || !isFinite(v) || !isFinite(wi) || wi < 0 || x < PH_MIN || x > PH_MAX) return false;
    unchecked((inH[i] = pow10(-x)));
    unchecked((inG[i] = pow10(x)));
    unchecked((inW[i] = wi));
    unchecked((inSW[i] = Math.sqrt(wi)));
    if (wi > 0) {
      if (x < last) sorted = false;
      last = x;
      unchecked((sortedPH[nUsed] = x));
      nUsed++;
      dataLo = Math.min(dataLo, x);
      dataHi = Math.max(dataHi, x);
      scale = Math.max(scale, Math.abs(v));
    }
  }
  if (nUsed == 0) return false;
  if (!sorted) {
    for (let a = 1; a < nUsed; a++) {
      const x = unchecked(sortedPH[a]);
      let b = a - 1;
      while (b >= 0 && unchecked(sortedPH[b]) > x) {
        unchecked((sortedPH[b + 1] = sortedPH[b]));
        b--;
      }
      unchecked((sortedPH[b + 1] = x));
    }
  }
  distinctPH = 1;
  for (let k = 1; k < nUsed; k++) if (unchecked(sortedPH[k]) != unchecked(sortedPH[k - 1])) distinctPH++;
  if (distinctPH < 2 || nUsed < P) return false;
  dataScale = scale > 0 && isFinite(scale) ? scale : 1;
  for (let i = 0; i < n; i++) unchecked((inY[i] = inV[i] / dataScale));
  return true;
}

let nUsed: i32 = 0;
let distinctPH: i32 = 0;
let dataScale: f64 = 1;
const at = new StaticArray<i32>(P);

/** Student's t 97.5 % quantile for dof > 0: from the table, or from the caller beyond it. */
function tQuantile(dof: i32): f64 {
  return dof <= T975_MAX ? unchecked(T975_TABLE[dof]) : t975(dof);
}

/**
 * Prepares and fits the profile in the input arrays (count points; weights read only when
 * hasWeights). Returns 2 for a profile the engine would refuse (the caller asks the engine why),
 * 1 when no start could be evaluated, else 0 with `out` holding, in the caller's units:
 *   0–2 V, pKa1, pKa2; 3–5 their status (0 fitted, 1 held far away, 2 not determined);
 *   6–8 standard errors (NaN: none); 9 pHopt; 10 its standard error; 11 SSR; 12 converged;
 *   13 degrees of freedom; 14 flag bits; 15 starts; 16 iterations; 17 stop reason;
 *   18 points used.
 */
export function fitProfile(count: i32, hasWeights: bool): i32 {
  if (count < 1 || count > MAXN || !prepare(count, hasWeights)) return 2;
  const lo = dataLo;
  const hi = dataHi;
  const S = dataScale;
  if (!fitModel()) return 1;
  // free parameters and their positions: the spec's, as the describe step sees them
  q = 0;
  for (let j = 0; j < P; j++) if (!isFixed(j)) unchecked((freeIdx[q++] = j));
  for (let j = 0, k = 0; j < P; j++) unchecked((at[j] = isFixed(j) ? -1 : k++));
  const dof = nUsed - q;
  // mj and fitted still hold the model Jacobian at runTheta from markWithoutInfluence
  let ssr: f64 = 0;
  for (let i = 0; i < n; i++) {
    const w = unchecked(inW[i]);
    const r = unchecked(inY[i]) - unchecked(fitted[i]);
    if (w > 0) ssr += w * r * r;
  }
  const s2 = dof > 0 ? ssr / dof : NaN;
  const haveCov = q > 0 && dof > 0 && inverseNormalMatrix();
  if (haveCov) for (let k = 0; k < q * q; k++) unchecked((cov[k] *= s2));
  for (let j = 0; j < P; j++) {
    const unit = j == 0 ? S : 1;
    unchecked((out[j] = unchecked(runTheta[j]) * unit));
    unchecked((out[3 + j] = <f64>status[j]));
    const aj = unchecked(at[j]);
    unchecked((out[6 + j] = haveCov && aj >= 0 ? Math.sqrt(unchecked(cov[aj * q + aj])) * unit : NaN));
  }
  const d1 = unchecked(status[1]) == FREE;
  const d2 = unchecked(status[2]) == FREE;
  let pHopt: f64 = NaN;
  let pHoptSe: f64 = NaN;
  let gapSe: f64 = NaN;
  const gap = unchecked(runTheta[2]) - unchecked(runTheta[1]);
  if (d1 && d2) {
    pHopt = (unchecked(runTheta[1]) + unchecked(runTheta[2])) / 2;
    const i1 = unchecked(at[1]);
    const i2 = unchecked(at[2]);
    if (haveCov) {
      // delta method with ∇pHopt = (0, ½, ½) over the free parameters
      let v: f64 = 0;
      for (let a = 0; a < q; a++) {
        const ga: f64 = unchecked(freeIdx[a]) == 0 ? 0 : 0.5;
        for (let b = 0; b < q; b++) {
          const gb: f64 = unchecked(freeIdx[b]) == 0 ? 0 : 0.5;
          v += ga * unchecked(cov[a * q + b]) * gb;
        }
      }
      pHoptSe = v >= 0 ? Math.sqrt(v) : NaN;
      if (i1 >= 0 && i2 >= 0)
        gapSe = Math.sqrt(unchecked(cov[i1 * q + i1]) + unchecked(cov[i2 * q + i2]) - 2 * unchecked(cov[i1 * q + i2]));
    }
  }
  const runsP = runsPValue();

  let flags: i32 = 0;
  const converged = isConverged(runStop);
  if (!converged) flags |= F_NOT_CONVERGED;
  if (unchecked(status[0]) != FREE) flags |= F_V_UNDETERMINED;
  if (!d1) flags |= F_PKA1_UNDETERMINED;
  if (!d2) flags |= F_PKA2_UNDETERMINED;
  if (d1 && (unchecked(runTheta[1]) < lo || unchecked(runTheta[1]) > hi)) flags |= F_PKA1_OUTSIDE;
  if (d2 && (unchecked(runTheta[2]) < lo || unchecked(runTheta[2]) > hi)) flags |= F_PKA2_OUTSIDE;
  if (d1 && d2) {
    const seKnown = isFinite(gapSe);
    if (gap <= 1e-9 || (seKnown && dof > 0 && gap - tQuantile(dof) * gapSe <= 0)) flags |= F_TOO_CLOSE;
    if (gap < NARROW_DELTA) flags |= F_NARROW;
  }
  if (nUsed < POINTS_PER_PARAMETER * q || distinctPH <= q) flags |= F_TOO_FEW;
  if (!isNaN(runsP) && runsP < RUNS_ALPHA) flags |= F_RUNS;

  unchecked((out[9] = pHopt));
  unchecked((out[10] = pHoptSe));
  unchecked((out[11] = ssr * S * S));
  unchecked((out[12] = converged ? 1 : 0));
  unchecked((out[13] = <f64>dof));
  unchecked((out[14] = <f64>flags));
  unchecked((out[15] = <f64>totalStarts));
  unchecked((out[16] = <f64>runIterations));
  unchecked((out[17] = <f64>runStop));
  unchecked((out[18] = <f64>nUsed));
  return 0;
}

// ---- datasets files read without JSON.parse ------------------------------------------------------
// The command line's input (the reference README's datasets format) is read here from its bytes:
// parsing it in JavaScript builds every value of the file, most of which a fit never looks at. The
// reader takes only what it can take exactly; everything else goes back to the caller, which uses
// JSON.parse as before:
//   - the whole file is checked against the JSON grammar first (RFC 8259); any doubt (not ASCII,
//     nesting deeper than MAX_DEPTH, a key written with escapes, "datasets" twice, a dataset that is
//     not an object) and scanDatasets returns −1;
//   - a dataset whose pH, v or w is not a plain array of numbers, whose id is written with escapes,
//     which repeats a key, or holds a number that cannot be converted exactly here, is handed back
//     whole (code 2) for JSON.parse and the engine;
//   - numbers are converted exactly (correctly rounded, as JSON.parse does) when they have at most
//     15 significant digits and a decimal exponent within ±22 (Clinger 1990: one exact integer, one
//     exact power of ten, one rounding); others are handed back.

const MAX_DEPTH: i32 = 512;
let text: usize = 0;
let textLen: i32 = 0;
let textCapacity: i32 = 0;
let pos: i32 = 0;
let escaped: bool = false;
let datasetsArray: i32 = -1;
let datasetIndex: i32 = 0;
const depthStack = new StaticArray<u8>(MAX_DEPTH);

// spans of the current dataset (fitNext reports them)
let objStart: i32 = 0;
let objEnd: i32 = 0;
let idKind: i32 = 0; // 0 none (the caller names it by position), 1 string, 2 number
let idStart: i32 = 0;
let idEnd: i32 = 0;
let pHStart: i32 = -1;
let vStart: i32 = -1;
let wStart: i32 = -1;
let pointCount: i32 = 0;

/** A buffer for the file's bytes, reused while large enough. */
export function textBuffer(length: i32): usize {
  if (length > textCapacity) {
    text = heap.alloc(<usize>length);
    textCapacity = length;
  }
  textLen = length;
  return text;
}

@inline function byteAt(i: i32): i32 {
  return <i32>load<u8>(text + <usize>i);
}

@inline function isDigit(c: i32): bool {
  return c >= 0x30 && c <= 0x39;
}

function skipWhitespace(): void {
  while (pos < textLen) {
    const c = byteAt(pos);
    if (c == 0x20 || c == 0x0a || c == 0x0d || c == 0x09) pos++;
    else break;
  }
}

/** A string at pos (on its opening quote); sets `escaped` when it holds an escape. */
function skipString(): bool {
  pos++;
  escaped = false;
  while (pos < textLen) {
    const c = byteAt(pos);
    if (c == 0x22) {
      pos++;
      return true;
    }
    if (c < 0x20 || c >= 0x80) return false;
    if (c == 0x5c) {
      escaped = true;
      if (pos + 1 >= textLen) return false;
      const e = byteAt(pos + 1);
      if (e == 0x75) {
        if (pos + 5 >= textLen) return false;
        for (let k = 2; k <= 5; k++) {
          const h = byteAt(pos + k);
          if (!(isDigit(h) || (h >= 0x61 && h <= 0x66) || (h >= 0x41 && h <= 0x46))) return false;
        }
        pos += 6;
        continue;
      }
      if (e == 0x22 || e == 0x5c || e == 0x2f || e == 0x62 || e == 0x66 || e == 0x6e || e == 0x72 || e == 0x74) {
        pos += 2;
        continue;
      }
      return false;
    }
    pos++;
  }
  return false;
}

/** A number at pos, by the JSON grammar: -?(0|[1-9][0-9]*)(.[0-9]+)?([eE][+-]?[0-9]+)? */
function skipNumber(): bool {
  if (pos < textLen && byteAt(pos) == 0x2d) pos++;
  if (pos >= textLen) return false;
  const c = byteAt(pos);
  if (c == 0x30) pos++;
  else if (c >= 0x31 && c <= 0x39) {
    while (pos < textLen && isDigit(byteAt(pos))) pos++;
  } else return false;
  if (pos < textLen && byteAt(pos) == 0x2e) {
    pos++;
    if (!(pos < textLen && isDigit(byteAt(pos)))) return false;
    while (pos < textLen && isDigit(byteAt(pos))) pos++;
  }
  if (pos < textLen && (byteAt(pos) == 0x65 || byteAt(pos) == 0x45)) {
    pos++;
    if (pos < textLen && (byteAt(pos) == 0x2b || byteAt(pos) == 0x2d)) pos++;
    if (!(pos < textLen && isDigit(byteAt(pos)))) return false;
    while (pos < textLen && isDigit(byteAt(pos))) pos++;
  }
  return true;
}

function skipLiteral(word: string): bool {
  const n = word.length;
  if (pos + n > textLen) return false;
  for (let k = 0; k < n; k++) if (byteAt(pos + k) != word.charCodeAt(k)) return false;
  pos += n;
  return true;
}

/** `"key"` then `:` (whitespace allowed around the colon). */
function skipKey(): bool {
  skipWhitespace();
  if (pos >= textLen || byteAt(pos) != 0x22 || !skipString()) return false;
  skipWhitespace();
  if (pos >= textLen || byteAt(pos) != 0x3a) return false;
  pos++;
  return true;
}

/** Any JSON value at pos, checked against the grammar without recursion. */
function skipValue(): bool {
  let depth = 0;
  for (;;) {
    skipWhitespace();
    if (pos >= textLen) return false;
    const c = byteAt(pos);
    let opened = false;
    if (c == 0x7b || c == 0x5b) {
      pos++;
      skipWhitespace();
      if (pos < textLen && byteAt(pos) == (c == 0x7b ? 0x7d : 0x5d)) {
        pos++;
      } else {
        if (depth >= MAX_DEPTH) return false;
        unchecked((depthStack[depth++] = <u8>c));
        if (c == 0x7b && !skipKey()) return false;
        opened = true;
      }
    } else if (c == 0x22) {
      if (!skipString()) return false;
    } else if (c == 0x2d || isDigit(c)) {
      if (!skipNumber()) return false;
    } else if (c == 0x74) {
      if (!skipLiteral('true')) return false;
    } else if (c == 0x66) {
      if (!skipLiteral('false')) return false;
    } else if (c == 0x6e) {
      if (!skipLiteral('null')) return false;
    } else return false;
    if (opened) continue;
    // after a value: close containers, or a comma and the next member
    for (;;) {
      if (depth == 0) return true;
      skipWhitespace();
      if (pos >= textLen) return false;
      const d = byteAt(pos);
      const top = <i32>unchecked(depthStack[depth - 1]);
      if (d == 0x2c) {
        pos++;
        if (top == 0x7b && !skipKey()) return false;
        break;
      }
      if ((top == 0x7b && d == 0x7d) || (top == 0x5b && d == 0x5d)) {
        pos++;
        depth--;
        continue;
      }
      return false;
    }
  }
  return false; // not reached: every path above returns
}

/**
 * Any value at pos of a text scanDatasets has already checked: only its end is looked for (strings
 * skipped to their closing quote, brackets counted), which is all the second pass needs. Sets
 * `escaped` when a string in it holds an escape.
 */
function skipChecked(): void {
  escaped = false;
  let depth = 0;
  do {
    const c = byteAt(pos);
    if (c == 0x22) {
      pos++;
      for (;;) {
        const d = byteAt(pos);
        if (d == 0x22) break;
        if (d == 0x5c) {
          escaped = true;
          pos++;
        }
        pos++;
      }
      pos++;
    } else if (c == 0x7b || c == 0x5b) {
      depth++;
      pos++;
    } else if (c == 0x7d || c == 0x5d) {
      depth--;
      pos++;
    } else if (depth == 0) {
      // a number or a literal: up to the next delimiter
      while (pos < textLen) {
        const d = byteAt(pos);
        if (d == 0x2c || d == 0x7d || d == 0x5d || d == 0x20 || d == 0x0a || d == 0x0d || d == 0x09) break;
        pos++;
      }
    } else pos++;
  } while (depth > 0);
}

/** Whether the string just skipped (from start, on its quote) spells `word` exactly. */
function spells(start: i32, word: string): bool {
  const n = word.length;
  if (pos - start != n + 2) return false;
  for (let k = 0; k < n; k++) if (byteAt(start + 1 + k) != word.charCodeAt(k)) return false;
  return true;
}

/**
 * Checks the whole file in the text buffer; returns the number of datasets, or −1 when the
 * caller should read the file with JSON.parse (not valid JSON, or not a file read here).
 */
export function scanDatasets(): i32 {
  pos = 0;
  datasetsArray = -1;
  skipWhitespace();
  if (pos >= textLen || byteAt(pos) != 0x7b) return -1;
  pos++;
  skipWhitespace();
  let count = 0;
  if (pos < textLen && byteAt(pos) == 0x7d) {
    pos++;
  } else {
    for (;;) {
      skipWhitespace();
      const keyStart = pos;
      if (pos >= textLen || byteAt(pos) != 0x22 || !skipString() || escaped) return -1;
      const isDatasets = spells(keyStart, 'datasets');
      skipWhitespace();
      if (pos >= textLen || byteAt(pos) != 0x3a) return -1;
      pos++;
      skipWhitespace();
      if (isDatasets) {
        if (datasetsArray >= 0 || pos >= textLen || byteAt(pos) != 0x5b) return -1;
        datasetsArray = pos;
        pos++;
        skipWhitespace();
        if (pos < textLen && byteAt(pos) == 0x5d) {
          pos++;
        } else {
          for (;;) {
            skipWhitespace();
            if (pos >= textLen || byteAt(pos) != 0x7b || !skipValue()) return -1;
            count++;
            skipWhitespace();
            if (pos >= textLen) return -1;
            if (byteAt(pos) == 0x2c) {
              pos++;
              continue;
            }
            if (byteAt(pos) != 0x5d) return -1;
            pos++;
            break;
          }
        }
      } else if (!skipValue()) return -1;
      skipWhitespace();
      if (pos >= textLen) return -1;
      if (byteAt(pos) == 0x2c) {
        pos++;
        continue;
      }
      if (byteAt(pos) != 0x7d) return -1;
      pos++;
      break;
    }
  }
  skipWhitespace();
  if (pos != textLen || datasetsArray < 0) return -1;
  pos = datasetsArray + 1;
  datasetIndex = 0;
  return count;
}

/**
 * Moves to the next dataset (the file has been checked by scanDatasets) and notes its spans.
 * Returns 0 when it can be fitted here, 2 when it goes to JSON.parse and the engine.
 */
function nextDataset(): i32 {
  skipWhitespace();
  if (datasetIndex > 0) {
    pos++; // the comma
    skipWhitespace();
  }
  datasetIndex++;
  objStart = pos;
  idKind = 0;
  pHStart = -1;
  vStart = -1;
  wStart = -1;
  let plain = true;
  let seen = 0; // bits: id, pH, v, w
  pos++;
  skipWhitespace();
  if (byteAt(pos) == 0x7d) {
    pos++;
    objEnd = pos;
    return 2;
  }
  for (;;) {
    skipWhitespace();
    const keyStart = pos;
    skipChecked();
    let key = 0;
    if (escaped) plain = false;
    else if (spells(keyStart, 'id')) key = 1;
    else if (spells(keyStart, 'pH')) key = 2;
    else if (spells(keyStart, 'v')) key = 4;
    else if (spells(keyStart, 'w')) key = 8;
    if (key != 0 && (seen & key) != 0) plain = false; // JSON.parse keeps the last: left to it
    seen |= key;
    skipWhitespace();
    pos++; // the colon
    skipWhitespace();
    const valueStart = pos;
    const c = byteAt(pos);
    skipChecked();
    if (key == 1) {
      if (c == 0x22) {
        if (escaped) plain = false;
        idKind = 1;
        idStart = valueStart + 1;
        idEnd = pos - 1;
      } else if (c == 0x2d || isDigit(c)) {
        idKind = 2;
        idStart = valueStart;
        idEnd = pos;
      } else idKind = 0;
    } else if (key == 2) pHStart = valueStart;
    else if (key == 4) vStart = valueStart;
    else if (key == 8) wStart = c == 0x6e ? -1 : valueStart; // w: null means no weights
    skipWhitespace();
    // a comma and the next member, or the closing brace
    pos++;
    if (byteAt(pos - 1) != 0x2c) break;
  }
  objEnd = pos;
  if (!plain || pHStart < 0 || vStart < 0) return 2;
  return 0;
}

const POW10 = StaticArray.fromArray<f64>([
  1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17,
  1e18, 1e19, 1e20, 1e21, 1e22,
]);

/** The number at pos (already checked), converted exactly; NaN when that is not possible here. */
function readNumber(): f64 {
  let negative = false;
  if (byteAt(pos) == 0x2d) {
    negative = true;
    pos++;
  }
  let mantissa: u64 = 0;
  let digits = 0; // significant digits taken into the mantissa
  let exponent: i32 = 0;
  let exact = true;
  while (pos < textLen && isDigit(byteAt(pos))) {
    const d = <u64>(byteAt(pos) - 0x30);
    if (mantissa != 0 || d != 0) {
      if (digits < 15) {
        mantissa = mantissa * 10 + d;
        digits++;
      } else {
        exact = false;
      }
    }
    pos++;
  }
  if (pos < textLen && byteAt(pos) == 0x2e) {
    pos++;
    while (pos < textLen && isDigit(byteAt(pos))) {
      const d = <u64>(byteAt(pos) - 0x30);
      if (mantissa != 0 || d != 0) {
        if (digits < 15) {
          mantissa = mantissa * 10 + d;
          digits++;
          exponent--;
        } else if (d != 0) exact = false;
      } else exponent--;
      pos++;
    }
  }
  if (pos < textLen && (byteAt(pos) == 0x65 || byteAt(pos) == 0x45)) {
    pos++;
    let sign = 1;
    if (byteAt(pos) == 0x2b) pos++;
    else if (byteAt(pos) == 0x2d) {
      sign = -1;
      pos++;
    }
    let e = 0;
    while (pos < textLen && isDigit(byteAt(pos))) {
      if (e < 100000) e = e * 10 + (byteAt(pos) - 0x30);
      pos++;
    }
    exponent += sign * e;
  }
  if (!exact) return NaN;
  let value: f64;
  if (mantissa == 0) value = 0;
  else if (exponent >= 0 && exponent <= 22) value = <f64>mantissa * unchecked(POW10[exponent]);
  else if (exponent < 0 && exponent >= -22) value = <f64>mantissa / unchecked(POW10[-exponent]);
  else return NaN;
  return negative ? -value : value;
}

/**
 * The numbers of the array at `start` into `into`; the count, or −1 when the value is not an array
 * of numbers only, has more than MAXN of them, or holds a number not converted exactly here.
 */
function readArray(start: i32, into: StaticArray<f64>): i32 {
  pos = start;
  if (byteAt(pos) != 0x5b) return -1;
  pos++;
  skipWhitespace();
  if (byteAt(pos) == 0x5d) return 0;
  let count = 0;
  for (;;) {
    skipWhitespace();
    const c = byteAt(pos);
    if (!(c == 0x2d || isDigit(c)) || count >= MAXN) return -1;
    const x = readNumber();
    if (isNaN(x)) return -1;
    unchecked((into[count++] = x));
    skipWhitespace();
    if (byteAt(pos) == 0x2c) {
      pos++;
      continue;
    }
    return byteAt(pos) == 0x5d ? count : -1;
  }
}

/**
 * Fits the dataset nextDataset() has just noted: 0 fitted (read `out`), 1 no start could be
 * evaluated, 2 left to JSON.parse and the engine (arrays that are not plain numbers, lengths that
 * differ, more than MAXN points, or a profile the engine refuses).
 */
function fitCurrent(): i32 {
  const resume = pos;
  const n = readArray(pHStart, inPH);
  const nv = readArray(vStart, inV);
  const nw = wStart >= 0 ? readArray(wStart, inW) : n;
  pos = resume;
  pointCount = n;
  if (n < 1 || nv != n || nw != n) return 2;
  return fitProfile(n, wStart >= 0);
}

/**
 * The next dataset of the file scanDatasets has checked, fitted when it can be: the code of
 * fitCurrent (2 also for a dataset nextDataset leaves to JSON.parse), with `out` holding besides
 *   20 how the dataset names itself (0 not at all, 1 a string, 2 a number), 21–22 that name's
 *   span in the text, 23–24 the dataset's span, 25 its number of points.
 */
export function fitNext(): i32 {
  let code = nextDataset();
  if (code == 0) code = fitCurrent();
  unchecked((out[20] = <f64>idKind));
  unchecked((out[21] = <f64>idStart));
  unchecked((out[22] = <f64>idEnd));
  unchecked((out[23] = <f64>objStart));
  unchecked((out[24] = <f64>objEnd));
  unchecked((out[25] = <f64>pointCount));
  return code;
}

/** For tests: the number at the start of the text buffer as readNumber converts it (NaN: not here). */
export function convertNumber(): f64 {
  pos = 0;
  if (!skipNumber() || pos != textLen) return NaN;
  pos = 0;
  return readNumber();
}
