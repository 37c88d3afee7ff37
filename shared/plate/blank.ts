/**
 * Blank correction (SCIENCE.md §3.1): subtract, from each sample, the mean of the blank wells (no enzyme)
 * of the same pH point; works for end-point values and for rates alike.
 *
 * Error propagation: the corrected value x − b̄ carries the blank's uncertainty as the standard error of
 * the blank mean, SE(b̄) = s_b/√n_b (one mean is subtracted, not one well), added in quadrature to the
 * sample's own SD when it is given:  u(x − b̄) = √(u(x)² + s_b²/n_b).
 */
import { mean, sampleStandardDeviation } from 'simple-statistics';
import type { PlateFlag } from './flags';
import { finiteValues, isArray, isFiniteNumber } from './input';
import { fail, finiteOrNull, ok, type PlateResult } from './result';

export interface BlankStats {
  n: number;
  mean: number;
  /** Sample SD of the blank wells; null with one blank. */
  sd: number | null;
  /** Standard error of the blank mean, sd/√n; null with one blank. */
  se: number | null;
  flags: PlateFlag[];
}

export interface Sample {
  id: string;
  /** The pH point (or any grouping key) whose blanks apply. */
  group: string;
  value: number | null;
  /** The sample's own SD, if known (e.g. a rate's standard error). */
  sd?: number | null;
}

export interface CorrectedSample {
  id: string;
  group: string;
  value: number | null;
  /** √(sd² + SE(blank)²); null when neither is known. */
  sd: number | null;
  flags: PlateFlag[];
}

/** Mean, SD and SE of a group of blank wells (missing values skipped). */
export function blankStats(values: readonly unknown[]): PlateResult<BlankStats> {
  if (!isArray(values)) return fail('invalid_input', 'Blank values must be a list.');
  const { values: v, skipped } = finiteValues(values);
  if (v.length === 0) return fail('no_blank', 'There is no usable blank value.');
  const flags: PlateFlag[] = skipped > 0 ? ['missing_values'] : [];
  const m = mean(v);
  if (!Number.isFinite(m)) return fail('degenerate', 'The blank values are too large to average.');
  if (v.length === 1) return ok({ n: 1, mean: m, sd: null, se: null, flags: [...flags, 'single_blank'] });
  const sd = finiteOrNull(sampleStandardDeviation(v));
  return ok({ n: v.length, mean: m, sd, se: sd === null ? null : sd / Math.sqrt(v.length), flags });
}

/** Subtracts from each sample the blank mean of its group. A group without blanks is an error. */
export function correctForBlanks(
  samples: readonly Sample[],
  blanks: readonly { group: string; value: number | null }[],
): PlateResult<{ samples: CorrectedSample[]; blanks: Record<string, BlankStats> }> {
  if (!isArray(samples) || !isArray(blanks))
    return fail('invalid_input', 'Samples and blanks must be lists.');
  const byGroup = new Map<string, unknown[]>();
  for (const b of blanks) {
    if (typeof b !== 'object' || b === null)
      return fail('invalid_input', 'Each blank needs a group and a value.');
    const list = byGroup.get(String(b.group)) ?? [];
    list.push(b.value);
    byGroup.set(String(b.group), list);
  }
  const stats: Record<string, BlankStats> = {};
  for (const [group, values] of byGroup) {
    const s = blankStats(values);
    if (s.ok) stats[group] = s.value;
  }
  const out: CorrectedSample[] = [];
  for (const s of samples) {
    if (typeof s !== 'object' || s === null)
      return fail('invalid_input', 'Each sample needs an id, a group and a value.');
    const blank = stats[String(s.group)];
    if (!blank)
      return fail('no_blank', `No usable blank for pH point '${String(s.group)}' (sample ${String(s.id)}).`);
    const flags: PlateFlag[] = [...blank.flags.filter((f) => f === 'single_blank')];
    if (!isFiniteNumber(s.value)) {
      out.push({ id: s.id, group: s.group, value: null, sd: null, flags: [...flags, 'missing_values'] });
      continue;
    }
    const own = isFiniteNumber(s.sd) ? s.sd : null;
    const sd = own === null && blank.se === null ? null : Math.hypot(own ?? 0, blank.se ?? 0);
    const value = finiteOrNull(s.value - blank.mean);
    out.push({
      id: s.id,
      group: s.group,
      value,
      sd: finiteOrNull(sd),
      flags: value === null ? [...flags, 'not_computable'] : flags,
    });
  }
  return ok({ samples: out, blanks: stats });
}
