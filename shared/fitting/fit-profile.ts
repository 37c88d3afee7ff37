// fitProfile: one activity-against-pH profile, one model (or 'auto'), the full report.

import { describeFit } from './describe';
import { fitModel } from './fit-core';
import { MODEL_IDS, MODELS, type ModelId } from './models';
import { prepareProfile, type PhData, type ProfileInput } from './ph-data';
import { fail, ok, type Result } from './result';
import type { ProfileFit } from './types';

export interface FitOptions {
  /** default 'bell'; 'auto' proposes the simplest adequate model (see chooseModel) */
  model?: ModelId | 'auto';
  /** profile-likelihood intervals for every fitted parameter and Δ (default true) */
  profile?: boolean;
  /** residual-bootstrap resamples for the optimum and the window (default 0 = none) */
  bootstrap?: number;
  /** seed of the bootstrap (default 1) */
  seed?: number;
  /** when a pKa is not determined, also fit and attach the simpler model (default true) */
  alternative?: boolean;
  /** iteration limit of the solver (default 200) */
  maxIterations?: number;
  /**
   * 'full' (default) or 'summary' for bulk runs: the same parameters, SEs, optimum and flags,
   * without residual, fitted and covariance tables or the uncertainty of the peak and window
   */
  detail?: 'full' | 'summary';
}

export const NO_START_MESSAGE = 'No starting point could be evaluated for this model and data.';

/** The simpler model a fit tends to when one of its pKa values runs out of the data. */
function simplerModel(model: ModelId, notDetermined: readonly string[]): ModelId | null {
  if (model === 'bell') {
    if (notDetermined.includes('pKa1') && notDetermined.includes('pKa2')) return null;
    if (notDetermined.includes('pKa2')) return 'acid';
    if (notDetermined.includes('pKa1')) return 'base';
  }
  if (model === 'three' && notDetermined.includes('pKa') && !notDetermined.includes('pKb')) {
    return notDetermined.includes('pKc') ? 'acid' : 'bell';
  }
  return null;
}

export function checkOptions(options: FitOptions): Result<Required<FitOptions> & { model: ModelId }> {
  options = options ?? {}; // a null from a careless caller means the defaults
  const model = options.model ?? 'bell';
  if (model === 'auto' || !MODEL_IDS.includes(model)) {
    return fail(
      'unknown_model',
      `Unknown model '${String(model)}'; expected one of ${MODEL_IDS.join(', ')}.`,
    );
  }
  const bootstrap = options.bootstrap ?? 0;
  if (!Number.isInteger(bootstrap) || bootstrap < 0 || bootstrap > 1_000_000) {
    return fail(
      'bad_option',
      'The number of bootstrap resamples must be a whole number from 0 to 1,000,000.',
    );
  }
  const seed = options.seed ?? 1;
  if (!Number.isInteger(seed)) return fail('bad_option', 'The bootstrap seed must be a whole number.');
  const maxIterations = options.maxIterations ?? 200;
  if (!Number.isInteger(maxIterations) || maxIterations < 1) {
    return fail('bad_option', 'The iteration limit must be a positive whole number.');
  }
  const detail = options.detail ?? 'full';
  if (detail !== 'full' && detail !== 'summary')
    return fail('bad_option', "detail must be 'full' or 'summary'.");
  return ok({
    detail,
    model,
    profile: options.profile ?? true,
    bootstrap,
    seed,
    alternative: options.alternative ?? true,
    maxIterations,
  });
}

/** Fits prepared data (used by fitProfile, chooseModel and the global fit's separate fits). */
export function fitPrepared(
  data: PhData,
  opts: Required<FitOptions> & { model: ModelId },
): ProfileFit | null {
  const model = MODELS[opts.model];
  const core = fitModel(model, data, { maxIterations: opts.maxIterations });
  if (!core) return null;
  const fit = describeFit(model, data, core, opts);
  if (opts.alternative) {
    const missing = model.names.filter((name) => fit.parameters[name].status === 'not_determined');
    const simpler = missing.length > 0 ? simplerModel(model.id, missing) : null;
    if (simpler) fit.alternative = fitPrepared(data, { ...opts, model: simpler, alternative: false });
  }
  return fit;
}

/**
 * Fits one model to one profile. Bad input (NaN, empty, length mismatch, fewer points than
 * parameters, a single pH value, negative weights, unknown model) returns { ok: false, error }.
 */
export function fitProfile(input: ProfileInput, options: FitOptions = {}): Result<ProfileFit> {
  const checked = checkOptions(options);
  if (!checked.ok) return checked;
  const opts = checked.value;
  const prepared = prepareProfile(input, MODELS[opts.model].names.length);
  if (!prepared.ok) return prepared;
  const fit = fitPrepared(prepared.value, opts);
  if (!fit) return fail('bad_start', NO_START_MESSAGE);
  return ok(fit);
}
