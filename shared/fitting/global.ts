// Global fit: several profiles (variants) fitted at once with chosen parameters shared, e.g. one
// pKa common to all variants. Minimises the summed weighted SSR over all profiles; the shared
// model is compared with separate fits by the extra-sum-of-squares F-test and AICc (the shared
// model is nested in the separate one). Activities of all profiles are divided by one common
// scale, so a shared activity level means the same number in every profile.

import { aicc } from './describe';
import { DETERMINED_MARGIN, fitModel } from './fit-core';
import { levenbergMarquardt, type LsqProblem, type StopReason } from './lm';
import { MODEL_IDS, MODELS, type ModelId } from './models';
import { prepareProfile, type PhData, type ProfileInput } from './ph-data';
import { fail, finiteOrNull, ok, type Result } from './result';
import { fUpperTail } from './stats/distributions';
import type { Estimate, Flag } from './types';
import { estimate, inverseNormalMatrix } from './uncertainty';
import { curveShape } from './window';

export interface GlobalInput extends ProfileInput {
  id?: string;
}

export interface GlobalDataset {
  id: string;
  n: number;
  ssr: number | null;
  parameters: Record<string, Estimate & { shared: boolean }>;
  pHopt: Estimate;
  flags: Flag[];
}

export interface GlobalFit {
  model: ModelId;
  shared: string[];
  sharedParameters: Record<string, Estimate>;
  datasets: GlobalDataset[];
  n: number;
  nFitted: number;
  dof: number;
  ssr: number | null;
  aicc: number | null;
  converged: boolean;
  stop: StopReason;
  comparison: {
    separate: { ssr: number | null; nFitted: number; aicc: number | null };
    F: number | null;
    df1: number;
    df2: number;
    pValue: number | null;
    /** the simpler adequate description: shared unless sharing makes the fit significantly worse */
    preferred: 'shared' | 'separate';
  };
}

const BOX_MARGIN = 3;

export function fitGlobal(
  inputs: readonly GlobalInput[],
  options: { model?: ModelId; shared: readonly string[]; alpha?: number },
): Result<GlobalFit> {
  const modelId = options.model ?? 'bell';
  if (!MODEL_IDS.includes(modelId)) return fail('unknown_model', `Unknown model '${String(modelId)}'.`);
  const model = MODELS[modelId];
  if (!Array.isArray(inputs) || inputs.length < 2)
    return fail('empty', 'A global fit needs at least two profiles.');
  const shared = [...new Set(options.shared)];
  const unknown = shared.filter((s) => !model.names.includes(s));
  if (unknown.length)
    return fail('bad_option', `The ${modelId} model has no parameter ${unknown.join(', ')}.`);
  if (shared.length === 0) return fail('bad_option', 'Name at least one parameter to share.');
  const alpha = options.alpha ?? 0.05;

  const data: PhData[] = [];
  for (const [i, input] of inputs.entries()) {
    const d = prepareProfile(input, 1);
    if (!d.ok) return fail(d.error.code, `Profile ${input.id ?? i + 1}: ${d.error.message}`);
    data.push(d.value);
  }
  // one common scale for all profiles
  const S = Math.max(...data.map((d) => d.scale));
  for (const d of data) {
    for (let i = 0; i < d.n; i++) d.y[i] *= d.scale / S;
    d.scale = S;
  }
  const p = model.names.length;
  const isShared = model.names.map((n) => shared.includes(n));
  const own = model.names.map((_, j) => j).filter((j) => !isShared[j]);
  const sharedIdx = model.names.map((_, j) => j).filter((j) => isShared[j]);
  const D = data.length;
  const q = sharedIdx.length + D * own.length;
  const N = data.reduce((s, d) => s + d.nUsed, 0);
  if (N <= q) return fail('too_few_points', `${N} points in all cannot determine ${q} parameters.`);
  const col = (d: number, j: number): number =>
    isShared[j] ? sharedIdx.indexOf(j) : sharedIdx.length + d * own.length + own.indexOf(j);

  // separate fits: starting values and the comparison
  const separate = data.map((d) => fitModel(model, d));
  const sepSSR = separate.reduce((s, f) => s + (f ? f.ssr : NaN), 0) * S * S;
  const sepP = separate.reduce((s, f) => s + (f ? f.spec.fixed.filter((x) => x === null).length : 0), 0);

  const start = new Float64Array(q);
  const lower = new Float64Array(q).fill(-Infinity);
  const upper = new Float64Array(q).fill(Infinity);
  const lo = Math.min(...data.map((d) => d.lo));
  const hi = Math.max(...data.map((d) => d.hi));
  for (const j of sharedIdx) {
    const vals = separate.flatMap((f) => (f && f.status[j] === 'free' ? [f.theta[j]] : []));
    vals.sort((a, b) => a - b);
    start[col(0, j)] = vals.length
      ? vals[Math.floor(vals.length / 2)]
      : j >= model.nLinear
        ? (lo + hi) / 2
        : 1;
    if (j >= model.nLinear) {
      lower[col(0, j)] = lo - BOX_MARGIN;
      upper[col(0, j)] = hi + BOX_MARGIN;
    }
  }
  data.forEach((d, k) => {
    for (const j of own) {
      const c = col(k, j);
      const f = separate[k];
      if (j >= model.nLinear) {
        lower[c] = d.lo - BOX_MARGIN;
        upper[c] = d.hi + BOX_MARGIN;
      }
      start[c] = f
        ? Math.min(upper[c], Math.max(lower[c], f.theta[j]))
        : j >= model.nLinear
          ? (d.lo + d.hi) / 2
          : 1;
    }
  });

  const thetaOf = (u: ArrayLike<number>, k: number): Float64Array => {
    const th = new Float64Array(p);
    for (let j = 0; j < p; j++) th[j] = u[col(k, j)];
    return th;
  };
  const kbuf = new Float64Array(4);
  const grad = new Float64Array(p);
  const problem: LsqProblem = {
    n: data.reduce((s, d) => s + d.n, 0),
    p: q,
    evaluate(u, r, J) {
      let row = 0;
      for (let k = 0; k < D; k++) {
        const d = data[k];
        const th = thetaOf(u, k);
        model.constants(th, kbuf);
        for (let i = 0; i < d.n; i++, row++) {
          const f = model.point(th, kbuf, d.h[i], d.g[i], J ? grad : null);
          r[row] = d.sw[i] * (d.y[i] - f);
          if (!Number.isFinite(r[row])) return false;
          if (!J) continue;
          J.fill(0, row * q, row * q + q);
          for (let j = 0; j < p; j++) J[row * q + col(k, j)] = d.sw[i] * grad[j];
        }
      }
      return true;
    },
  };
  const lm = levenbergMarquardt(problem, start, { lower, upper, maxIterations: 500 });

  // covariance over all parameters from the stacked Jacobian
  const rows = problem.n;
  const Jall = new Float64Array(rows * q);
  const wAll = new Float64Array(rows);
  const r = new Float64Array(rows);
  problem.evaluate(lm.theta, r, Jall);
  let row = 0;
  // Jall already carries √w; these weights only mark the points in use
  for (const d of data) for (let i = 0; i < d.n; i++, row++) wAll[row] = d.w[i] > 0 ? 1 : 0;
  const dof = N - q;
  const s2 = dof > 0 ? lm.ssr / dof : null;
  const inv = inverseNormalMatrix(
    Jall,
    wAll,
    rows,
    q,
    Array.from({ length: q }, (_, c) => c),
  );
  const se = (c: number): number | null =>
    inv && s2 !== null ? finiteOrNull(Math.sqrt(inv[c * q + c] * s2)) : null;
  const unit = (j: number): number => (j < model.nLinear ? S : 1);

  const sharedParameters: Record<string, Estimate> = {};
  for (const j of sharedIdx) {
    const c = col(0, j);
    sharedParameters[model.names[j]] = estimate(lm.theta[c] * unit(j), mulNull(se(c), unit(j)), dof);
  }
  const datasets: GlobalDataset[] = data.map((d, k) => {
    const th = thetaOf(lm.theta, k);
    const flags: Flag[] = [];
    const determined = model.names.map((name, j) => {
      if (j < model.nLinear) return true;
      const out = th[j] < d.lo - DETERMINED_MARGIN || th[j] > d.hi + DETERMINED_MARGIN;
      if (out) {
        flags.push({
          code: `${name}_not_determined`,
          message: `${name} of profile ${inputs[k].id ?? k + 1} is not determined: it runs beyond the measured pH range.`,
        });
      }
      return !out;
    });
    const parameters: GlobalDataset['parameters'] = {};
    model.names.forEach((name, j) => {
      const c = col(k, j);
      const e = determined[j]
        ? estimate(th[j] * unit(j), mulNull(se(c), unit(j)), dof)
        : estimate(null, null, dof);
      parameters[name] = { ...e, shared: isShared[j] };
    });
    // pHopt by the delta method over this profile's columns
    const shape = curveShape(model, th, determined);
    let optSE: number | null = null;
    if (shape.pHopt !== null && inv && s2 !== null) {
      const g = new Float64Array(q);
      const h = 1e-6;
      for (let j = model.nLinear; j < p; j++) {
        const up = th.slice();
        const down = th.slice();
        up[j] += h;
        down[j] -= h;
        const a = curveShape(model, up, determined).pHopt;
        const b = curveShape(model, down, determined).pHopt;
        if (a !== null && b !== null) g[col(k, j)] += (a - b) / (2 * h);
      }
      let v = 0;
      for (let a = 0; a < q; a++) for (let b = 0; b < q; b++) v += g[a] * inv[a * q + b] * g[b];
      optSE = finiteOrNull(Math.sqrt(Math.max(0, v * s2)));
    }
    let ssrK = 0;
    const tmp = new Float64Array(4);
    model.constants(th, tmp);
    for (let i = 0; i < d.n; i++) {
      const res = d.y[i] - model.point(th, tmp, d.h[i], d.g[i], null);
      if (d.w[i] > 0) ssrK += d.w[i] * res * res;
    }
    return {
      id: inputs[k].id ?? String(k + 1),
      n: d.nUsed,
      ssr: finiteOrNull(ssrK * S * S),
      parameters,
      pHopt: estimate(shape.pHopt, optSE, dof),
      flags,
    };
  });

  const ssr = lm.ssr * S * S;
  const df1 = sepP - q;
  const df2 = N - sepP;
  let F: number | null = null;
  let pValue: number | null = null;
  if (df1 > 0 && df2 > 0 && sepSSR > 0 && Number.isFinite(sepSSR)) {
    F = finiteOrNull(Math.max(0, (ssr - sepSSR) / df1) / (sepSSR / df2));
    pValue = F === null ? null : finiteOrNull(fUpperTail(F, df1, df2));
  }
  return ok({
    model: modelId,
    shared,
    sharedParameters,
    datasets,
    n: N,
    nFitted: q,
    dof,
    ssr: finiteOrNull(ssr),
    aicc: aicc(ssr, N, q),
    converged: lm.converged,
    stop: lm.stop,
    comparison: {
      separate: { ssr: finiteOrNull(sepSSR), nFitted: sepP, aicc: aicc(sepSSR, N, sepP) },
      F,
      df1,
      df2,
      pValue,
      preferred: pValue !== null && pValue < alpha ? 'separate' : 'shared',
    },
  });
}

function mulNull(x: number | null, k: number): number | null {
  return x === null ? null : x * k;
}
