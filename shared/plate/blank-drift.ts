/**
 * Blanks that drift across pH: non-enzymatic hydrolysis of the substrate, or a buffer that absorbs,
 * changes the blank with pH. Test (stated): OLS of blank value on pH over all blank wells of the series;
 * flagged 'blank_drift' when the slope's two-sided t test (n − 2 degrees of freedom) gives p < α,
 * α = 0.05 by default. Needs at least three blanks at two or more pH values.
 */
import { fitLine } from '../stats/linear-regression';
import { studentTTwoSidedP } from '../stats/t-distribution';
import type { PlateFlag } from './flags';
import { isArray, isFiniteNumber } from './input';
import { fail, finiteOrNull, ok, type PlateResult } from './result';

export interface BlankDrift {
  n: number;
  /** Change of the blank per pH unit. */
  slope: number | null;
  slopeSe: number | null;
  p: number | null;
  /** Predicted change from the lowest to the highest pH. */
  changeAcrossRange: number | null;
  flags: PlateFlag[];
}

export function blankDrift(
  points: readonly { pH: number; value: number | null }[],
  alpha = 0.05,
): PlateResult<BlankDrift> {
  if (!isArray(points)) return fail('invalid_input', 'Blanks must be a list of { pH, value }.');
  if (!isFiniteNumber(alpha) || !(alpha > 0 && alpha < 1))
    return fail('invalid_option', 'The significance level must lie between 0 and 1.');
  const pH: number[] = [];
  const v: number[] = [];
  let skipped = 0;
  for (const p of points) {
    if (typeof p !== 'object' || p === null || !isFiniteNumber(p.pH))
      return fail('invalid_input', 'Every blank needs a numeric pH.');
    if (!isFiniteNumber(p.value)) {
      skipped++;
      continue;
    }
    pH.push(p.pH);
    v.push(p.value);
  }
  const flags: PlateFlag[] = skipped > 0 ? ['missing_values'] : [];
  const fit = v.length >= 3 ? fitLine(pH, v) : null;
  if (!fit || fit.slopeSe === null) {
    return ok({
      n: v.length,
      slope: null,
      slopeSe: null,
      p: null,
      changeAcrossRange: null,
      flags: [...flags, 'too_few_points'],
    });
  }
  const p = fit.slopeSe > 0 ? studentTTwoSidedP(fit.slope / fit.slopeSe, fit.dof) : fit.slope === 0 ? 1 : 0;
  if (p !== null && p < alpha) flags.push('blank_drift');
  const range = Math.max(...pH) - Math.min(...pH);
  return ok({
    n: fit.n,
    slope: finiteOrNull(fit.slope),
    slopeSe: finiteOrNull(fit.slopeSe),
    p: finiteOrNull(p),
    changeAcrossRange: finiteOrNull(fit.slope * range),
    flags,
  });
}
