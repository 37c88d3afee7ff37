/**
 * Z′-factor of a plate from its positive and negative controls (Zhang, Chung & Oldenburg 1999,
 * J Biomol Screen 4:67 [pub]; SCIENCE.md §3.3):
 *   Z′ = 1 − 3·(σ₊ + σ₋)/|μ₊ − μ₋|        (sample SDs, n − 1)
 * and its robust form with medians and scaled MADs (σ̂ = MAD/0.6745, the normal-consistent scale):
 *   Z′_robust = 1 − 3·(σ̂₊ + σ̂₋)/|x̃₊ − x̃₋|
 * Bands: Z′ = 1 ideal; 1 > Z′ ≥ 0.5 excellent; 0 < Z′ < 0.5 marginal; Z′ ≤ 0 unusable
 * (excellent and unusable: IUPAC Gold Book [pub]; the middle band after Zhang et al. 1999, Table 1 [memory]).
 * For rate assays pass per-well rates, not raw signals.
 */
import { mean, median, medianAbsoluteDeviation, sampleStandardDeviation } from 'simple-statistics';
import { NORMAL_QUARTILE } from '../stats/t-distribution';
import type { PlateFlag } from './flags';
import { finiteValues, isArray } from './input';
import { fail, finiteOrNull, ok, type PlateResult } from './result';

export type ZPrimeBand = 'ideal' | 'excellent' | 'marginal' | 'unusable';

export interface ControlSummary {
  n: number;
  mean: number | null;
  sd: number | null;
  median: number | null;
  /** Unscaled median absolute deviation. */
  mad: number | null;
}

export interface ZPrime {
  zPrime: number | null;
  band: ZPrimeBand | null;
  robustZPrime: number | null;
  robustBand: ZPrimeBand | null;
  positive: ControlSummary;
  negative: ControlSummary;
  flags: PlateFlag[];
}

export function zPrimeBand(z: number): ZPrimeBand {
  if (z >= 1) return 'ideal';
  if (z >= 0.5) return 'excellent';
  if (z > 0) return 'marginal';
  return 'unusable';
}

function summarise(v: number[]): ControlSummary {
  if (v.length === 0) return { n: 0, mean: null, sd: null, median: null, mad: null };
  return {
    n: v.length,
    mean: finiteOrNull(mean(v)),
    sd: v.length > 1 ? finiteOrNull(sampleStandardDeviation(v)) : null,
    median: finiteOrNull(median(v)),
    mad: finiteOrNull(medianAbsoluteDeviation(v)),
  };
}

/** 1 − 3(s₊ + s₋)/|c₊ − c₋|, or null when the centres coincide or a number is missing. */
function zFrom(
  sPos: number | null,
  sNeg: number | null,
  cPos: number | null,
  cNeg: number | null,
): number | null {
  if (sPos === null || sNeg === null || cPos === null || cNeg === null || cPos === cNeg) return null;
  return finiteOrNull(1 - (3 * (sPos + sNeg)) / Math.abs(cPos - cNeg));
}

export function zPrimeFactor(
  positive: readonly unknown[],
  negative: readonly unknown[],
): PlateResult<ZPrime> {
  if (!isArray(positive) || !isArray(negative))
    return fail('invalid_input', 'Positive and negative controls must be lists.');
  const pos = finiteValues(positive);
  const neg = finiteValues(negative);
  const flags: PlateFlag[] = pos.skipped + neg.skipped > 0 ? ['missing_values'] : [];
  const p = summarise(pos.values);
  const n = summarise(neg.values);
  if (p.n < 2 || n.n < 2) {
    return ok({
      zPrime: null,
      band: null,
      robustZPrime: null,
      robustBand: null,
      positive: p,
      negative: n,
      flags: [...flags, 'too_few_controls'],
    });
  }
  const zPrime = zFrom(p.sd, n.sd, p.mean, n.mean);
  const scale = (mad: number | null) => (mad === null ? null : mad / NORMAL_QUARTILE);
  const robustZPrime = zFrom(scale(p.mad), scale(n.mad), p.median, n.median);
  if (zPrime === null || robustZPrime === null) flags.push('controls_not_separated');
  return ok({
    zPrime,
    band: zPrime === null ? null : zPrimeBand(zPrime),
    robustZPrime,
    robustBand: robustZPrime === null ? null : zPrimeBand(robustZPrime),
    positive: p,
    negative: n,
    flags,
  });
}
