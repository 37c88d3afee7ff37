/**
 * Step 5b: the fit of one variant's profile, through the public index of shared/fitting only.
 *
 * Data: every non-excluded replicate well with an activity, unweighted — replicates enter as repeated
 * pH values (the datasets convention of the reference README), so the fit sees the scatter between
 * wells and its degrees of freedom count wells, not pH points.
 * Model: 'auto' (default) takes chooseModel's simplest adequate model (nested F-tests at α = 0.05,
 * with the AICc table beside them); a model set by the user is fitted as asked, and the automatic
 * comparison is still reported so that a reviewer can see whether the data support it.
 */
import {
  chooseModel,
  curveWithBand,
  fitProfile,
  type CurveBand,
  type ModelChoice,
  type ModelId,
  type ProfileFit,
} from '../fitting';
import { num } from './result';
import type { ModelSelection, ProfileError, RelativeActivity, VariantProfile } from './types';

export interface VariantFit {
  selection: ModelSelection | null;
  fit: ProfileFit | null;
  curve: CurveBand | null;
  error: ProfileError | null;
}

const failed = (code: string, message: string): VariantFit => ({
  selection: null,
  fit: null,
  curve: null,
  error: { code, message },
});

export function fitVariant(
  name: string,
  data: { pH: number[]; v: number[] },
  requested: ModelId | 'auto',
  profileIntervals: boolean,
): VariantFit {
  const n = data.pH.length;
  if (n === 0)
    return failed(
      'no_data',
      `${name}: no usable wells to fit (none measured, all excluded, or none with a value).`,
    );
  const distinct = new Set(data.pH.map((p) => p.toFixed(2)));
  if (distinct.size < 2) {
    return failed(
      'too_few_points',
      `${name}: only one pH point (pH ${data.pH[0]}) has data; a pH profile needs at least two pH values, and a bell at least three.`,
    );
  }
  const auto = requested === 'auto';
  const choice = chooseModel(
    data,
    auto ? { profile: profileIntervals } : { profile: false, alternative: false },
  );
  const table = (c: ModelChoice) => ({ candidates: c.candidates, tests: c.tests });
  let fit: ProfileFit;
  let selection: ModelSelection;
  if (auto) {
    if (!choice.ok) return failed(choice.error.code, `${name}: ${choice.error.message}`);
    fit = choice.value.fit;
    selection = {
      requested,
      model: choice.value.proposed,
      reason: choice.value.reason,
      ...table(choice.value),
    };
  } else {
    const own = fitProfile(data, { model: requested, profile: profileIntervals });
    if (!own.ok) return failed(own.error.code, `${name} (${requested} model): ${own.error.message}`);
    fit = own.value;
    const differs = choice.ok && choice.value.proposed !== requested;
    selection = {
      requested,
      model: requested,
      reason: `Chosen by the user.${differs ? ` The automatic choice would be ${choice.value.proposed}: ${choice.value.reason}` : ''}`,
      ...(choice.ok ? table(choice.value) : { candidates: [], tests: [] }),
    };
  }
  const band = curveWithBand(fit);
  return { selection, fit, curve: band.ok ? band.value : null, error: null };
}

/** The fitted maximum: the peak; for one limb (or a pKa not determined) the plateau V; else the curve's top. */
export function fittedMaximum(fit: ProfileFit, curve: CurveBand | null): number | null {
  const peak = fit.peak.value ?? fit.parameters.V?.value ?? null;
  if (peak !== null) return peak;
  const tops = (curve?.v ?? []).filter((v): v is number => v !== null);
  return tops.length ? Math.max(...tops) : null;
}

/** Points and curve divided by the fitted maximum, for comparing variants. */
export function relativeActivity(
  profile: Pick<VariantProfile, 'points' | 'fit' | 'curve'>,
): RelativeActivity | null {
  if (!profile.fit || !profile.curve) return null;
  const maximum = fittedMaximum(profile.fit, profile.curve);
  if (maximum === null || !(maximum > 0)) return null;
  const scale = (v: number | null) => (v === null ? null : num(v / maximum));
  return {
    maximum,
    points: profile.points.map((p) => ({ pH: p.pH, buffer: p.buffer, mean: scale(p.mean), sd: scale(p.sd) })),
    curve: {
      pH: profile.curve.pH,
      v: profile.curve.v.map(scale),
      lower: profile.curve.lower.map(scale),
      upper: profile.curve.upper.map(scale),
    },
  };
}
