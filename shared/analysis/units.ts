/**
 * Which units the study's numbers are in, decided once for the whole study so that every profile is
 * comparable:
 *  - signal: what each well gives — a rate of signal change per minute (kinetic) or a value (end point);
 *    absorbance 'A' (with the wavelength when known, 'A405'), fluorescence 'RFU'.
 *  - rate: product formed, µM/min (kinetic; end point ÷ reaction time) or µM (end point without a
 *    time) — by Beer–Lambert (ε and path length) or by a standard curve. Without either: signal units.
 *  - activity: specific activity, µmol min⁻¹ mg⁻¹ (shared/plate specificActivity), when there is a
 *    rate in µM/min, the enzyme volume is set and EVERY variant has a protein concentration; otherwise
 *    the rate itself (volumetric, µM/min), or product (µM), or the blank-corrected signal — and the
 *    note says which and why.
 */
import type { AnalysisInput, Units } from './types';

export interface UnitPlan {
  units: Units;
  /** How signals become product; null when they cannot. */
  conversion: 'extinction' | 'standard-curve' | null;
  /** true when rates are per minute (kinetic, or end point with a reaction time). */
  perTime: boolean;
  specific: boolean;
}

function extinctionProblem(input: AnalysisInput): string | null {
  const a = input.assay;
  if (a.detection !== 'absorbance')
    return 'an extinction coefficient applies to absorbance only; use a standard curve';
  if (!(typeof a.extinctionCoefficient === 'number' && a.extinctionCoefficient > 0))
    return 'the assay has no extinction coefficient';
  if (!(typeof a.pathLengthCm === 'number' && a.pathLengthCm > 0))
    return 'the assay has no path length (give it, or use a standard curve in the plate)';
  return null;
}

export function planUnits(input: AnalysisInput, hasStandardCurve: boolean): UnitPlan {
  const a = input.assay;
  const s = input.settings;
  const base =
    a.detection === 'absorbance' ? (typeof a.wavelengthNm === 'number' ? `A${a.wavelengthNm}` : 'A') : 'RFU';
  const signal = a.readMode === 'kinetic' ? `${base}/min` : base;
  const problem =
    a.quantitation === 'extinction'
      ? extinctionProblem(input)
      : hasStandardCurve
        ? null
        : 'no plate has a usable standard curve (at least 3 standards at 2 or more concentrations)';
  const conversion = problem ? null : a.quantitation;
  const perTime =
    a.readMode === 'kinetic' || (typeof s.reactionTimeMin === 'number' && s.reactionTimeMin > 0);
  const rate = conversion ? (perTime ? 'µM/min' : 'µM') : signal;
  const noProtein = input.variants
    .filter((v) => !(typeof v.proteinMgPerMl === 'number' && v.proteinMgPerMl > 0))
    .map((v) => v.name);
  const hasVolume = typeof s.enzymeVolumeUl === 'number' && s.enzymeVolumeUl > 0;
  const specific = conversion !== null && perTime && hasVolume && noProtein.length === 0;
  const whyNotSpecific = !hasVolume
    ? 'the enzyme volume per well is not set'
    : `${noProtein.length} variant(s) have no protein concentration (${noProtein.slice(0, 5).join(', ')}${noProtein.length > 5 ? ', …' : ''})`;
  if (!conversion) {
    return {
      conversion,
      perTime,
      specific: false,
      units: {
        signal,
        rate,
        activity: signal,
        activityKind: 'signal',
        activityLabel: 'Blank-corrected signal',
        note: `Activities are blank-corrected signals (${signal}), not converted to product: ${problem}.`,
      },
    };
  }
  const how = conversion === 'extinction' ? 'Beer–Lambert (ε, path length)' : 'the standard curve';
  if (specific) {
    return {
      conversion,
      perTime,
      specific,
      units: {
        signal,
        rate,
        activity: 'µmol min⁻¹ mg⁻¹',
        activityKind: 'specific',
        activityLabel: 'Specific activity',
        note: `Specific activity: µmol product per minute per mg of enzyme protein, converted by ${how}, with the well volume, the enzyme volume and each variant's protein concentration.`,
      },
    };
  }
  if (!perTime) {
    return {
      conversion,
      perTime,
      specific,
      units: {
        signal,
        rate,
        activity: 'µM',
        activityKind: 'product',
        activityLabel: 'Product formed',
        note: `Product formed at the end point (µM, by ${how}); give the reaction time to get a rate.`,
      },
    };
  }
  return {
    conversion,
    perTime,
    specific,
    units: {
      signal,
      rate,
      activity: 'µM/min',
      activityKind: 'volumetric',
      activityLabel: 'Volumetric rate',
      note: `Volumetric rate: µM product per minute in the well (by ${how}), not per mg of protein because ${whyNotSpecific}.`,
    },
  };
}
