/**
 * Bootstrap intervals for every fitted profile of a finished analysis: shared/fitting's residual
 * bootstrap (fitProfile with `bootstrap`, percentile 95 % intervals of the optimum, the half-activity
 * window and the parameters), refitting exactly the data and model the analysis fitted
 * (profile.fitData, fit.model). Profile i uses seed + i, so a run is reproducible.
 * Meant for a background job: progress is reported after each profile as (resamples done, in all).
 * The input must be the one the result came from; a result made before exclusions or models changed
 * is refused (stale_result), so intervals never describe data the study no longer has.
 */
import { ENGINE_VERSION, fitProfile, type ProfileFit } from '../fitting';
import { ANALYSIS_VERSION } from './analyse';
import { fail, guarded, ok, type Result } from './result';
import type { AnalysisInput, AnalysisResult, BootstrapOptions, VariantProfile } from './types';
import { checkInput } from './validate';

function staleness(result: AnalysisResult, input: AnalysisInput): string | null {
  if (result.engineVersion !== ENGINE_VERSION || result.analysisVersion !== ANALYSIS_VERSION)
    return 'it was computed by another version of the engine';
  const checked = checkInput(input);
  if (!checked.ok) return `the study cannot be analysed as it stands (${checked.error.message})`;
  const now = [...checked.value.exclusions.keys()].sort().join(',');
  const then = result.wells
    .filter((w) => w.excluded)
    .map((w) => `${w.plateId}:${w.well}`)
    .sort()
    .join(',');
  if (now !== then) return 'wells were excluded or included since';
  const ids = input.variants.map((v) => v.id).join(',');
  if (ids !== result.profiles.map((p) => p.variantId).join(',')) return 'the variants changed since';
  for (const p of result.profiles) {
    const wanted = input.settings?.models?.[p.variantId] ?? 'auto';
    if (p.selection && p.selection.requested !== wanted) return `the model of ${p.name} changed since`;
  }
  return null;
}

function graft(target: ProfileFit, boot: ProfileFit): void {
  target.pHopt.boot95 = boot.pHopt.boot95;
  target.window.lo.boot95 = boot.window.lo.boot95;
  target.window.hi.boot95 = boot.window.hi.boot95;
  target.window.width.boot95 = boot.window.width.boot95;
  for (const name of target.parameterNames) {
    if (target.parameters[name] && boot.parameters[name])
      target.parameters[name].boot95 = boot.parameters[name].boot95;
  }
  target.bootstrap = boot.bootstrap;
}

function checkOptions(options: {
  resamples?: number;
  seed?: number;
}): Result<{ resamples: number; seed: number }> {
  const resamples = options.resamples ?? 1000;
  const seed = options.seed ?? 1;
  if (!Number.isInteger(resamples) || resamples < 1 || resamples > 1_000_000)
    return fail(
      'invalid_setting',
      'The number of bootstrap resamples must be a whole number from 1 to 1,000,000.',
    );
  if (!Number.isInteger(seed)) return fail('invalid_setting', 'The bootstrap seed must be a whole number.');
  return ok({ resamples, seed });
}

/** One profile's bootstrap (its fitData and model), grafted onto a copy of it. */
function bootOne(profile: VariantProfile, resamples: number, seed: number): Result<VariantProfile> {
  if (!profile.fit) return fail('invalid_input', `${profile.name} has no fit to bootstrap.`);
  const boot = fitProfile(
    { pH: profile.fitData.pH, v: profile.fitData.v },
    { model: profile.fit.model, bootstrap: resamples, seed, profile: false, alternative: false },
  );
  if (!boot.ok) return fail('invalid_input', `${profile.name}: ${boot.error.message}`);
  const out = structuredClone(profile);
  graft(out.fit!, boot.value);
  out.bootstrap = boot.value.bootstrap;
  return ok(out);
}

function run(
  result: AnalysisResult,
  input: AnalysisInput,
  options: BootstrapOptions,
): Result<AnalysisResult> {
  const checked = checkOptions(options);
  if (!checked.ok) return checked;
  const { resamples, seed } = checked.value;
  const stale = staleness(result, input);
  if (stale)
    return fail(
      'stale_result',
      `The analysis is out of date: ${stale}. Run the analysis again, then the bootstrap.`,
    );
  const total = result.profiles.filter((p) => p.fit).length * resamples;
  let done = 0;
  options.onProgress?.(0, total);
  const profiles = result.profiles.map((profile, i) => {
    if (!profile.fit) return profile;
    const booted = bootOne(profile, resamples, seed + i);
    done += resamples;
    options.onProgress?.(done, total);
    return booted.ok ? booted.value : profile;
  });
  return ok({ ...result, profiles });
}

/**
 * Bootstrap of one profile, for a job that wants to yield or report between profiles. Use seed + i
 * for the i-th profile to get what bootstrapProfiles gives. The profile itself is not changed.
 */
export function bootstrapProfile(
  profile: VariantProfile,
  options: { resamples?: number; seed?: number } = {},
): Result<VariantProfile> {
  return guarded(() => {
    const checked = checkOptions(options);
    return checked.ok ? bootOne(profile, checked.value.resamples, checked.value.seed) : checked;
  });
}

/** Adds bootstrap intervals (optimum, window, parameters) to every fitted profile of `result`. */
export function bootstrapProfiles(
  result: AnalysisResult,
  input: AnalysisInput,
  options: BootstrapOptions = {},
): Result<AnalysisResult> {
  return guarded(() => run(result, input, options));
}
