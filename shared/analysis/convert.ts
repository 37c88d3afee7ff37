/**
 * Step 3: blank-corrected signal → product → activity, in the units planned by units.ts.
 *  - Beer–Lambert (SCIENCE.md §3.2, shared/plate): c = A/(ε·l); rate = (dA/dt)/(ε·l).
 *    When the product is an indicator (chromophore pKa set) and it is read at the assay pH — every
 *    kinetic read, and end points without a stop solution — only the fraction α(pH) =
 *    1/(1 + 10^(pKa − pH)) absorbs: ε_eff = ε·α at the well's nominal pH (shared/plate
 *    effectiveExtinction). A stopped end point (strong base) is read with the full ε.
 *  - Standard curve: product = (x − b̄)/b, the blank-corrected signal over the curve's slope, the
 *    intercept cancelling (shared/plate rateFromSignalSlope, with the slope's error by the delta method).
 *  - End points ÷ reaction time give µM/min. Specific activity per mg: shared/plate specificActivity.
 */
import {
  absorbingFraction,
  concentrationFromAbsorbance,
  rateFromAbsorbanceSlope,
  rateFromSignalSlope,
  specificActivity,
} from '../plate';
import { num } from './result';
import type { StandardBook } from './standards';
import type { AnalysisInput, VariantInput, WellRow } from './types';
import type { UnitPlan } from './units';

/** Below this absorbing fraction the conversion multiplies noise by more than 10 (flagged). */
const LOW_FRACTION = 0.1;

function byExtinction(row: WellRow, input: AnalysisInput): { value: number; se: number | null } | null {
  const a = input.assay;
  let epsilon = a.extinctionCoefficient! * (a.extinctionUnit === 'mM-1cm-1' ? 1000 : 1);
  const readAtAssayPh = a.readMode === 'kinetic' || a.stopSolution.trim() === '';
  if (a.chromophorePka !== null && readAtAssayPh && row.pH !== null) {
    const fraction = absorbingFraction(row.pH, a.chromophorePka, 'base');
    if (!fraction.ok || !(fraction.value > 0)) return null;
    if (fraction.value < LOW_FRACTION) row.flags.push('low_absorbing_fraction');
    epsilon *= fraction.value;
  }
  const optics = { epsilon: { value: epsilon, unit: 'M-1cm-1' as const }, pathLengthCm: a.pathLengthCm! };
  if (a.readMode === 'kinetic') {
    const r = rateFromAbsorbanceSlope(row.corrected!, {
      ...optics,
      timeUnit: 'min',
      slopeSe: row.correctedSe,
    });
    return r.ok ? { value: r.value.micromolarPerMinute, se: r.value.seMicromolarPerMinute } : null;
  }
  const c = concentrationFromAbsorbance(row.corrected!, optics);
  if (!c.ok) return null;
  // c = A/(ε·l) is linear in A, so u(c) = u(A)/(ε·l)
  const se = row.correctedSe === null ? null : num((row.correctedSe / (epsilon * a.pathLengthCm!)) * 1e6);
  return { value: c.value.micromolar, se };
}

function byStandardCurve(
  row: WellRow,
  input: AnalysisInput,
  book: StandardBook,
): { value: number; se: number | null } | null {
  const pick = book.pick(row);
  if (!pick) return null;
  if (pick.flag) row.flags.push(pick.flag);
  const a = input.assay;
  const pHDependent = a.chromophorePka !== null && (a.readMode === 'kinetic' || a.stopSolution.trim() === '');
  if (pHDependent && !pick.atPh) row.flags.push('standard_not_at_ph');
  const curve = pick.choice.curve;
  if (
    a.readMode === 'endpoint' &&
    row.signal !== null &&
    (row.signal < curve.signalRange[0] || row.signal > curve.signalRange[1])
  )
    row.flags.push('extrapolated');
  const r = rateFromSignalSlope(curve, row.corrected!, row.correctedSe);
  // no error of its own (an end point): no error after conversion either (blanks.ts says why)
  return r.ok ? { value: r.value.rate, se: row.correctedSe === null ? null : r.value.se } : null;
}

export function convertRow(
  row: WellRow,
  input: AnalysisInput,
  plan: UnitPlan,
  book: StandardBook,
  variant: VariantInput | undefined,
): void {
  if (row.role !== 'sample' || row.corrected === null) return;
  if (plan.conversion === null) {
    // no way to product: every column stays in signal units (units.rate = units.activity = units.signal)
    row.rate = row.activity = row.corrected;
    row.rateSe = row.activitySe = row.correctedSe;
    return;
  }
  const product =
    plan.conversion === 'extinction' ? byExtinction(row, input) : byStandardCurve(row, input, book);
  if (!product) {
    row.flags.push('no_conversion');
    return;
  }
  const time = input.assay.readMode === 'endpoint' ? input.settings.reactionTimeMin : null;
  const divide = typeof time === 'number' && time > 0 ? time : 1;
  row.rate = num(product.value / divide);
  row.rateSe = product.se === null ? null : num(product.se / divide);
  if (row.rate === null) {
    row.flags.push('no_conversion');
    return;
  }
  if (!plan.specific) {
    row.activity = row.rate;
    row.activitySe = row.rateSe;
    return;
  }
  const sa = specificActivity({
    rateMolarPerSecond: row.rate / 60e6,
    rateSe: row.rateSe === null ? null : row.rateSe / 60e6,
    wellVolumeUl: input.assay.wellVolumeUl,
    enzymeVolumeUl: input.settings.enzymeVolumeUl!,
    proteinMgPerMl: variant?.proteinMgPerMl ?? NaN,
  });
  if (!sa.ok) {
    row.flags.push('no_conversion');
    return;
  }
  row.activity = num(sa.value.unitsPerMg);
  row.activitySe = num(sa.value.se);
}
