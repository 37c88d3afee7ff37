/**
 * pH-dependent extinction of an ionising chromophore (SCIENCE.md §3.2). When only the deprotonated
 * form absorbs (4-nitrophenolate at 400–405 nm, 4-methylumbelliferone's anion), the product seen is
 * the fraction α of it in that form (Henderson–Hasselbalch):
 *   α(pH) = 1/(1 + 10^(pKa − pH)),    ε_eff(pH) = ε_base·α(pH)
 * (for an absorbing acid form, α_acid = 1 − α). Give the pKa that holds in the well (temperature and ionic
 * strength corrected, e.g. by shared/chemistry); 4-nitrophenol pKa ≈ 7.15 at 25 °C [pub, STEEP ref "c"]
 * gives α(6.0) = 0.0661: only ~6.6 % of the product is seen at pH 6 [derived].
 */
import type { Extinction } from './beer-lambert';
import { epsilonPerMolarCm } from './beer-lambert';
import { isFiniteNumber } from './input';
import { fail, ok, type PlateResult } from './result';

export type AbsorbingForm = 'base' | 'acid';

/** Fraction of the chromophore in its absorbing form at this pH. */
export function absorbingFraction(
  pH: number,
  pKa: number,
  form: AbsorbingForm = 'base',
): PlateResult<number> {
  if (!isFiniteNumber(pH) || !isFiniteNumber(pKa))
    return fail('invalid_input', 'pH and pKa must be numbers.');
  if (form !== 'base' && form !== 'acid')
    return fail('invalid_option', "The absorbing form must be 'base' or 'acid'.");
  const base = 1 / (1 + 10 ** (pKa - pH));
  return ok(form === 'base' ? base : 1 / (1 + 10 ** (pH - pKa)));
}

/** ε_eff(pH) = ε·α(pH), in the unit ε was given in. */
export function effectiveExtinction(
  epsilon: Extinction,
  pH: number,
  pKa: number,
  form: AbsorbingForm = 'base',
): PlateResult<Extinction & { fraction: number }> {
  if (epsilonPerMolarCm(epsilon) === null) {
    return fail(
      'invalid_option',
      "The extinction coefficient must be a positive number in 'M-1cm-1' or 'mM-1cm-1'.",
    );
  }
  const fraction = absorbingFraction(pH, pKa, form);
  if (!fraction.ok) return fraction;
  const value = epsilon.value * fraction.value;
  if (!Number.isFinite(value))
    return fail('degenerate', 'The effective extinction cannot be computed from these numbers.');
  return ok({ value, unit: epsilon.unit, fraction: fraction.value });
}
