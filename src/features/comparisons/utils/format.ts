// Numbers of the comparison table: a value over its 95 % interval ("3.69" over "3.64 to 3.75"), a
// signed difference, and a ratio. pH-like quantities keep two decimals (their intervals are a few
// hundredths wide); activities keep the figures their interval supports.
import type { ComparisonMetric } from '@shared/comparison/compare';
import { formatFixed, formatSig, formatSigned } from '@/components/ui/numbers';

export const isPhLike = (metric: ComparisonMetric) => metric !== 'maxActivity';

/** Significant figures from the interval: two figures of its half-width (at least 2, at most 6). */
export function sigFromInterval(value: number | null, interval: [number, number] | null, fallback = 3) {
  if (value === null || !interval) return fallback;
  const half = Math.abs(interval[1] - interval[0]) / 2;
  if (!(half > 0) || value === 0) return fallback;
  const figures = Math.floor(Math.log10(Math.abs(value))) - Math.floor(Math.log10(half)) + 2;
  return Math.min(6, Math.max(2, figures));
}

export function formatMetric(
  metric: ComparisonMetric,
  value: number | null,
  interval: [number, number] | null,
) {
  if (isPhLike(metric)) return formatFixed(value, 2);
  return formatSig(value, sigFromInterval(value, interval));
}

export function formatMetricInterval(
  metric: ComparisonMetric,
  value: number | null,
  interval: [number, number] | null,
) {
  if (!interval) return '';
  return `${formatMetric(metric, interval[0], interval)} to ${formatMetric(metric, interval[1], interval)}`;
}

/** A difference to the reference (pH units, signed) or a ratio of maximum activities. */
export function formatDifference(metric: ComparisonMetric, value: number | null) {
  return isPhLike(metric) ? formatSigned(value, 2) : `${formatFixed(value, 2)} ×`;
}

export function formatDifferenceInterval(metric: ComparisonMetric, interval: [number, number] | null) {
  if (!interval) return '';
  const end = (v: number) => (isPhLike(metric) ? formatSigned(v, 2) : formatFixed(v, 2));
  return `${end(interval[0])} to ${end(interval[1])}`;
}

/** p values as a scientist writes them: 0.43, 0.012, 3 × 10⁻⁴, < 10⁻¹⁰. */
export function formatP(p: number | null): string {
  if (p === null || !Number.isFinite(p)) return '—';
  if (p < 1e-10) return '< 10⁻¹⁰';
  if (p >= 0.001) return formatSig(p, 2);
  let exponent = Math.floor(Math.log10(p));
  let mantissa = Number((p / 10 ** exponent).toFixed(1));
  if (mantissa >= 10) [mantissa, exponent] = [1, exponent + 1];
  return `${mantissa.toFixed(1)} × 10${superscript(exponent)}`;
}

const superDigits: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};
const superscript = (n: number) => [...String(n)].map((c) => superDigits[c] ?? c).join('');

/** The fitted models in short words (SCIENCE.md §1). */
export const modelWords: Record<string, string> = {
  acid: 'acid limb only',
  base: 'alkaline limb only',
  bell: 'bell, two ionizations',
  'bell-plateau': 'bell with plateaus',
  three: 'three ionizations',
};
