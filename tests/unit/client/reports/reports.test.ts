import { describe, expect, it } from 'vitest';
import { formatEstimate, formatIntervalText } from '@/features/reports/utils/estimates';
import { profileChartData } from '@/components/charts/profile-chart-data';
import { relativeCurves } from '@/features/reports/utils/profile-chart-data';
import { isEditable, lockReason } from '@/features/studies/utils/study-status';
import { profileView } from '@/features/analysis/utils/profile-view';
import { derived, estimate, fitOf, point, profileOf } from '../analysis/fixtures';

describe('report estimates', () => {
  it('when values are written, then pH-like ones keep two decimals and others three figures; open ends say so', () => {
    expect(formatEstimate(6.456, true)).toBe('6.46');
    expect(formatEstimate(0.012345, false)).toBe('0.0123');
    expect(formatIntervalText([null, 8.1], true)).toBe('open to 8.10');
    expect(formatIntervalText(undefined, true)).toBe('');
  });
});

describe('report profile chart', () => {
  const fit = fitOf(
    'bell',
    {
      V: estimate(100),
      pKa1: estimate(5, { profile95: [4.9, 5.1] }),
      pKa2: estimate(8, { ci95: [7.9, 8.1] }),
    },
    {
      pHopt: derived(6.5, { ci95: [6.3, 6.7] }),
      window: { lo: derived(4.95), hi: derived(null), width: derived(null) },
    },
  );
  const profile = profileOf({
    points: [point(5, { mean: 50, sd: 3, n: 3 }), point(9, {})],
    fit,
    relative: {
      maximum: 90,
      points: [{ pH: 5, buffer: null, mean: 0.55, sd: 0.03 }],
      curve: { pH: [5], v: [0.55], lower: [0.5], upper: [0.6] },
    },
  });

  it('when a report draws a profile, then means, pKa marks, optimum and half window match the analysis screen', () => {
    const report = profileChartData(profile, false);
    const screen = profileView(profile, [], {}, false);
    expect(report.points).toEqual(screen.points);
    expect(report.pKas).toEqual(screen.pKas);
    expect(report.optimum).toEqual(screen.optimum);
    expect(report.halfWindow).toEqual({ lo: 4.95, hi: null, level: 45 });
    expect(report.points).toEqual([{ pH: 5, mean: 50, sd: 3, n: 3 }]);
  });

  it('when a study’s variants are overlaid, then each gives its relative curve, keyed by variant', () => {
    const curves = relativeCurves([profile, profileOf({ variantId: 'v2', name: 'D92N' })], true);
    expect(curves).toEqual([
      {
        key: 'v-wt',
        label: 'FR1-WT',
        approved: true,
        points: [{ pH: 5, mean: 0.55, sd: 0.03 }],
        curve: { pH: [5], v: [0.55], lower: [0.5], upper: [0.6] },
      },
      { key: 'v2', label: 'D92N', approved: true, points: [], curve: null },
    ]);
  });
});

describe('study status and editing', () => {
  it('when a study is a draft or was returned, then it can be edited; in review or approved it is locked with a reason', () => {
    expect(isEditable('draft')).toBe(true);
    expect(isEditable('returned')).toBe(true);
    expect(lockReason('draft')).toBeNull();
    for (const status of ['in_review', 'approved'] as const) {
      expect(isEditable(status)).toBe(false);
      expect(lockReason(status)).toMatch(/cannot be changed|locked/);
    }
  });
});
