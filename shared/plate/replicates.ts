/**
 * Replicate statistics and robust outlier flags.
 *
 * Replicates: mean, sample SD (n − 1) and CV = SD/|mean|·100 %, missing values skipped.
 * Outliers (Iglewicz & Hoaglin 1993, How to Detect and Handle Outliers, ASQC [memory]): the modified
 * z-score  Mᵢ = 0.6745·(xᵢ − x̃)/MAD,  x̃ the median and MAD the median of |xᵢ − x̃|;
 * a value is flagged when |Mᵢ| > 3.5. 0.6745 = Φ⁻¹(¾) makes MAD/0.6745 estimate σ for normal data.
 * Flags only: whether to exclude a value stays a person's decision. With three replicates the rule
 * flags the far value only when its distance from the median exceeds 5.19 times the near one's.
 */
import { mean, median, medianAbsoluteDeviation, sampleStandardDeviation } from 'simple-statistics';
import { NORMAL_QUARTILE } from '../stats/t-distribution';
import type { PlateFlag } from './flags';
import { finiteValues, isArray, isFiniteNumber } from './input';
import { fail, finiteOrNull, ok, type PlateResult } from './result';

export interface ReplicateStats {
  n: number;
  mean: number;
  sd: number | null;
  cvPercent: number | null;
  flags: PlateFlag[];
}

export function replicateStats(values: readonly unknown[]): PlateResult<ReplicateStats> {
  if (!isArray(values)) return fail('invalid_input', 'Replicate values must be a list.');
  const { values: v, skipped } = finiteValues(values);
  if (v.length === 0) return fail('not_enough_data', 'There is no replicate value to summarise.');
  const flags: PlateFlag[] = skipped > 0 ? ['missing_values'] : [];
  const m = finiteOrNull(mean(v));
  if (m === null) return fail('degenerate', 'The replicate values are too large to average.');
  if (v.length === 1)
    return ok({ n: 1, mean: m, sd: null, cvPercent: null, flags: [...flags, 'single_replicate'] });
  const sd = finiteOrNull(sampleStandardDeviation(v));
  let cvPercent: number | null = null;
  if (sd !== null && m !== 0) cvPercent = finiteOrNull((sd / Math.abs(m)) * 100);
  if (m === 0) flags.push('cv_undefined');
  return ok({ n: v.length, mean: m, sd, cvPercent, flags });
}

export interface OutlierFlags {
  median: number | null;
  mad: number | null;
  /** Modified z-score of each input value (null where the value is missing or MAD = 0). */
  scores: (number | null)[];
  /** true where |M| exceeds the threshold. */
  outliers: boolean[];
  threshold: number;
  flags: PlateFlag[];
}

export const MODIFIED_Z_THRESHOLD = 3.5;

export function flagOutliers(
  values: readonly unknown[],
  threshold = MODIFIED_Z_THRESHOLD,
): PlateResult<OutlierFlags> {
  if (!isArray(values)) return fail('invalid_input', 'Values to screen for outliers must be a list.');
  if (!isFiniteNumber(threshold) || !(threshold > 0))
    return fail('invalid_option', 'The outlier threshold must be a positive number.');
  const { values: v, skipped } = finiteValues(values);
  const flags: PlateFlag[] = skipped > 0 ? ['missing_values'] : [];
  const none = values.map(() => false);
  const nulls = values.map(() => null);
  if (v.length < 3) {
    return ok({
      median: v.length ? finiteOrNull(median(v)) : null,
      mad: null,
      scores: nulls,
      outliers: none,
      threshold,
      flags: [...flags, 'too_few_for_outliers'],
    });
  }
  const med = median(v);
  const mad = medianAbsoluteDeviation(v);
  if (!Number.isFinite(med) || !Number.isFinite(mad)) {
    return ok({
      median: null,
      mad: null,
      scores: nulls,
      outliers: none,
      threshold,
      flags: [...flags, 'not_computable'],
    });
  }
  if (mad === 0)
    return ok({ median: med, mad, scores: nulls, outliers: none, threshold, flags: [...flags, 'mad_zero'] });
  const scores = values.map((x) =>
    isFiniteNumber(x) ? finiteOrNull((NORMAL_QUARTILE * (x - med)) / mad) : null,
  );
  return ok({
    median: med,
    mad,
    scores,
    outliers: scores.map((s) => s !== null && Math.abs(s) > threshold),
    threshold,
    flags,
  });
}
