import { describe, expect, it } from 'vitest';
import type { GlobalFit } from '@shared/fitting';
import { curveLabels, profileStyle, profileStyles } from '@/features/comparisons/utils/colors';
import {
  formatDifference,
  formatDifferenceInterval,
  formatMetric,
  formatMetricInterval,
  formatP,
  isPhLike,
  sigFromInterval,
} from '@/features/comparisons/utils/format';
import { globalFitWords, pIs } from '@/features/comparisons/utils/global-fit-words';

describe('comparison table numbers', () => {
  it('when a metric is pH-like, then it keeps two decimals; the maximum activity keeps the figures its interval supports', () => {
    expect(isPhLike('pKa1')).toBe(true);
    expect(isPhLike('maxActivity')).toBe(false);
    expect(formatMetric('pHopt', 6.4567, [6.4, 6.5])).toBe('6.46');
    expect(formatMetric('maxActivity', 12.3456, [12.2, 12.5])).toBe('12.35');
    expect(formatMetric('maxActivity', 12.3456, [10, 15])).toBe('12.3');
    expect(formatMetric('maxActivity', 12.3456, [0, 25])).toBe('12');
    expect(formatMetricInterval('pKa2', 8, [7.94, 8.061])).toBe('7.94 to 8.06');
    expect(formatMetricInterval('pKa2', 8, null)).toBe('');
  });

  it('when figures come from an interval, then they are two of the half-width, between 2 and 6', () => {
    expect(sigFromInterval(12.3456, [12.2, 12.5])).toBe(4);
    expect(sigFromInterval(5, [-1e4, 1e4])).toBe(2);
    expect(sigFromInterval(5, null)).toBe(3);
    expect(sigFromInterval(0, [1, 2])).toBe(3);
  });

  it('when a difference is written, then pH-like ones are signed and activities are ratios', () => {
    expect(formatDifference('pHopt', 0.25)).toBe('+0.25');
    expect(formatDifference('pKa1', -0.1)).toBe('−0.10');
    expect(formatDifference('pKa1', 0.001)).toBe('0.00');
    expect(formatDifference('maxActivity', 1.5)).toBe('1.50 ×');
    expect(formatDifferenceInterval('pHopt', [-0.05, 0.2])).toBe('−0.05 to +0.20');
    expect(formatDifferenceInterval('maxActivity', [0.8, 1.25])).toBe('0.80 to 1.25');
    expect(formatDifferenceInterval('pHopt', null)).toBe('');
  });

  it('when a p value is written, then it reads as a scientist writes it', () => {
    expect(formatP(0.43)).toBe('0.43');
    expect(formatP(0.012)).toBe('0.012');
    expect(formatP(3e-4)).toBe('3.0 × 10⁻⁴');
    expect(formatP(1.234e-7)).toBe('1.2 × 10⁻⁷');
    expect(formatP(1e-11)).toBe('< 10⁻¹⁰');
    expect(formatP(null)).toBe('—');
    expect(formatP(Number.NaN)).toBe('—');
  });

  it('when the mantissa rounds up to ten, then the exponent goes up instead (9.96e-5 is 1.0 × 10⁻⁴)', () => {
    expect(formatP(9.96e-5)).toBe('1.0 × 10⁻⁴');
  });
});

describe('comparison colours and labels', () => {
  // Okabe & Ito, "Color Universal Design" (2002/2008), without the yellow: seven colours.
  it('when up to seven profiles are drawn, then each has its own colour and a solid line', () => {
    const styles = Array.from({ length: 7 }, (_, i) => profileStyle(i));
    expect(new Set(styles.map((s) => s.color)).size).toBe(7);
    expect(styles.every((s) => s.dash === undefined)).toBe(true);
    expect(styles[0].color).toBe('#0072B2');
  });

  it('when more than seven are drawn, then colours repeat with a dash pattern so no two lines look alike', () => {
    const styles = Array.from({ length: 28 }, (_, i) => profileStyle(i));
    expect(styles[7]).toEqual({ color: styles[0].color, dash: '6 3' });
    expect(new Set(styles.map((s) => `${s.color}|${s.dash}`)).size).toBe(28);
  });

  it('when styles are given per key, then they follow the order the profiles were chosen', () => {
    expect(profileStyles(['b', 'a'])).toEqual({ b: profileStyle(0), a: profileStyle(1) });
  });

  it('when all profiles come from one study, then labels name the variant only; otherwise variant and study', () => {
    expect(
      curveLabels([
        { key: 'k1', variantName: 'WT', studyName: 'S' },
        { key: 'k2', variantName: 'D92N', studyName: 'S' },
      ]),
    ).toEqual({ k1: 'WT', k2: 'D92N' });
    expect(
      curveLabels([
        { key: 'k1', variantName: 'WT', studyName: 'S1' },
        { key: 'k2', variantName: 'WT', studyName: 'S2' },
      ]),
    ).toEqual({ k1: 'WT — S1', k2: 'WT — S2' });
  });
});

const globalFit = (
  over: Partial<GlobalFit['comparison']>,
  aicc: number | null,
  shared = ['pKa1'],
): GlobalFit => ({
  model: 'bell',
  shared,
  sharedParameters: {},
  datasets: [],
  n: 36,
  nFitted: 7,
  dof: 29,
  ssr: 10,
  aicc,
  converged: true,
  stop: 'converged-gradient',
  comparison: {
    separate: { ssr: 9, nFitted: 9, aicc: 50 },
    F: 1.2,
    df1: 2,
    df2: 27,
    pValue: 0.31,
    preferred: 'shared',
    ...over,
  },
});

describe('global fit in words', () => {
  it('when sharing is preferred, then the verdict says it is supported and the F-test is not below 0.05', () => {
    const w = globalFitWords(globalFit({}, 49), 3);
    expect(w.supported).toBe(true);
    expect(w.verdict).toMatch(/^Sharing apparent pKa1 is supported: one value for all 3 profiles/);
    expect(w.test).toBe(
      'F-test of shared against separate: F = 1.20 on 2 and 27 degrees of freedom, p = 0.31 (not below 0.05).',
    );
    expect(w.aicc).toContain('hardly tells them apart');
  });

  it('when sharing is rejected, then the verdict says at least one profile has its own value', () => {
    const w = globalFitWords(
      globalFit({ preferred: 'separate', F: 25, pValue: 1e-12 }, 80, ['pKa1', 'pKa2']),
      2,
    );
    expect(w.supported).toBe(false);
    expect(w.verdict).toContain('Sharing apparent pKa1 and apparent pKa2 is not supported');
    expect(w.test).toContain('p < 10⁻¹⁰ (below 0.05)');
    expect(w.aicc).toBe(
      'AICc agrees: it prefers the separate values (shared 80.0, separate 50.0; lower is better, difference 30.0).',
    );
  });

  it('when AICc prefers the other description, then it is said to disagree', () => {
    expect(globalFitWords(globalFit({}, 60), 2).aicc).toMatch(
      /^AICc disagrees: it prefers the separate values/,
    );
  });

  it('when the F-test or AICc could not be computed, then the words say so', () => {
    const w = globalFitWords(globalFit({ F: null }, null), 2);
    expect(w.test).toBe('The F-test could not be computed (a fit did not give a sum of squares).');
    expect(w.aicc).toBe('AICc could not be computed for both descriptions.');
  });

  it('when three parameters are shared, then they are listed with commas and "and"', () => {
    const w = globalFitWords(globalFit({}, 49, ['pKa1', 'pKa2', 'pKa']), 4);
    expect(w.verdict).toContain('Sharing apparent pKa1, apparent pKa2 and apparent pKa is');
  });

  it('when a p value is said, then it is "p = …" or "p < …"', () => {
    expect(pIs(0.04)).toBe('p = 0.040');
    expect(pIs(1e-20)).toBe('p < 10⁻¹⁰');
  });
});
