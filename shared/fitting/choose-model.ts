// Model choice: the simplest adequate model. Candidates are compared by the extra-sum-of-squares
// F-test for nested models, F = [(S_s − S_c)/(p_c − p_s)] / [S_c/(n − p_c)] (Bates & Watts 1988,
// §3.10 [memory]), climbing from one limb to the bell and from the bell to its extensions only
// when the improvement is significant; AICc (Hurvich & Tsai 1989) and Akaike weights are
// reported beside it. A candidate whose pKa ran out of the data is its simpler model in disguise
// and is not counted as a separate, more complex model.

import { fitPrepared, type FitOptions } from './fit-profile';
import { MODELS, type ModelId } from './models';
import { prepareProfile, type ProfileInput } from './ph-data';
import { fail, finiteOrNull, ok, type Result } from './result';
import { fUpperTail } from './stats/distributions';
import type { CandidateSummary, NestedTest, ProfileFit } from './types';

export type { CandidateSummary, NestedTest } from './types';

export interface ModelChoice {
  proposed: ModelId;
  reason: string;
  candidates: CandidateSummary[];
  tests: NestedTest[];
  /** the fit of the proposed model */
  fit: ProfileFit;
}

/** simpler → models that contain it as a special or limiting case */
const NESTS: Record<ModelId, ModelId[]> = {
  acid: ['bell', 'three'],
  base: ['bell', 'three'],
  bell: ['bell-plateau', 'three'],
  'bell-plateau': [],
  three: [],
};

export const DEFAULT_CANDIDATES: readonly ModelId[] = ['acid', 'base', 'bell', 'bell-plateau', 'three'];

export function nestedFTest(simple: ProfileFit, complex: ProfileFit): NestedTest {
  const df1 = complex.nFitted - simple.nFitted;
  const df2 = complex.n - complex.nFitted;
  const base = { simpler: simple.model, complex: complex.model, df1, df2 };
  if (df1 <= 0 || df2 <= 0 || simple.ssr === null || complex.ssr === null || !(complex.ssr > 0)) {
    return { ...base, F: null, pValue: null };
  }
  const F = Math.max(0, (simple.ssr - complex.ssr) / df1) / (complex.ssr / df2);
  return { ...base, F: finiteOrNull(F), pValue: finiteOrNull(fUpperTail(F, df1, df2)) };
}

export function chooseModel(
  input: ProfileInput,
  options: { candidates?: readonly ModelId[]; alpha?: number } & Omit<FitOptions, 'model'> = {},
): Result<ModelChoice> {
  const candidates = options.candidates ?? DEFAULT_CANDIDATES;
  const alpha = options.alpha ?? 0.05;
  if (!(alpha > 0 && alpha < 1))
    return fail('bad_option', 'The significance level must lie between 0 and 1.');
  if (candidates.length === 0 || candidates.some((c) => !(c in MODELS))) {
    return fail('unknown_model', `Candidates must be among ${DEFAULT_CANDIDATES.join(', ')}.`);
  }
  const minP = Math.min(...candidates.map((c) => MODELS[c].names.length));
  const prepared = prepareProfile(input, minP);
  if (!prepared.ok) return prepared;
  const data = prepared.value;
  const fits = new Map<ModelId, ProfileFit>();
  for (const c of candidates) {
    if (MODELS[c].names.length > data.nUsed) continue;
    const fit = fitPrepared(data, {
      model: c,
      profile: false,
      bootstrap: 0,
      seed: options.seed ?? 1,
      alternative: false,
      maxIterations: options.maxIterations ?? 200,
      detail: 'summary', // the comparison needs only sums of squares and parameter status
    });
    if (fit) fits.set(c, fit);
  }
  const usable = (f: ProfileFit): boolean =>
    f.converged && f.ssr !== null && f.parameterNames.every((n) => f.parameters[n].status === 'fitted');
  const pool = [...fits.values()].filter(usable);
  if (pool.length === 0)
    return fail('bad_start', 'None of the candidate models could be fitted to these data.');

  // climb: start from the best of the simplest usable models
  pool.sort((a, b) => a.nFitted - b.nFitted || (a.ssr as number) - (b.ssr as number));
  let current = pool[0];
  const tests: NestedTest[] = [];
  let reason = `${current.model} is the simplest model that fits.`;
  for (;;) {
    const bigger = NESTS[current.model]
      .map((m) => fits.get(m))
      .filter((f): f is ProfileFit => !!f && usable(f));
    const significant: { fit: ProfileFit; test: NestedTest }[] = [];
    for (const fit of bigger) {
      const test = nestedFTest(current, fit);
      tests.push(test);
      if (test.pValue !== null && test.pValue < alpha) significant.push({ fit, test });
    }
    if (significant.length === 0) break;
    // one step at a time: the smallest significant extension first, AICc between equals
    significant.sort(
      (a, b) => a.fit.nFitted - b.fit.nFitted || (a.fit.aicc ?? Infinity) - (b.fit.aicc ?? Infinity),
    );
    const next = significant[0];
    reason = `${next.fit.model} improves significantly on ${current.model} (F = ${next.test.F?.toPrecision(3)}, p = ${next.test.pValue?.toPrecision(2)}).`;
    current = next.fit;
  }

  const aiccs = pool.map((f) => f.aicc).filter((a): a is number => a !== null);
  const best = aiccs.length ? Math.min(...aiccs) : null;
  const totalWeight = pool.reduce(
    (s, f) => s + (f.aicc !== null && best !== null ? Math.exp(-(f.aicc - best) / 2) : 0),
    0,
  );
  const summaries: CandidateSummary[] = candidates.map((c) => {
    const f = fits.get(c);
    const use = !!f && usable(f);
    const d = f && f.aicc !== null && best !== null && use ? f.aicc - best : null;
    return {
      model: c,
      nFitted: f?.nFitted ?? 0,
      ssr: f?.ssr ?? null,
      aicc: f?.aicc ?? null,
      deltaAicc: d,
      weight: d !== null && totalWeight > 0 ? Math.exp(-d / 2) / totalWeight : null,
      converged: f?.converged ?? false,
      usable: use,
    };
  });
  const byAicc = summaries.find((s) => s.deltaAicc === 0);
  if (byAicc && byAicc.model !== current.model) reason += ` (AICc alone would favour ${byAicc.model}.)`;
  // the proposed model's full report, with the caller's interval options
  const full = fitPrepared(data, {
    model: current.model,
    profile: options.profile ?? true,
    bootstrap: options.bootstrap ?? 0,
    seed: options.seed ?? 1,
    alternative: options.alternative ?? true,
    maxIterations: options.maxIterations ?? 200,
    detail: options.detail ?? 'full',
  });
  const fit = full ?? current;
  fit.selection = { proposed: current.model, reason, candidates: summaries, tests };
  return ok({ proposed: current.model, reason, candidates: summaries, tests, fit });
}
