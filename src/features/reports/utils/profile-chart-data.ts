// What a report's profile chart draws for one variant: replicate means ± SD, the fitted curve with
// its 95 % band, the apparent pKa values and the optimum with the intervals the tables show, and
// the half-activity window at half the fitted maximum. Single wells are left out on paper.
import type { VariantProfile } from '@shared/analysis';
import type { ComparisonCurve } from '@shared/schemas/comparisons';
import type { ProfileChartPoint } from '@/components/charts/profile-chart';
import type { ChartCurve, XMarker } from '@/components/charts/types';
import { formatFixed } from '@/components/ui/numbers';
import { chooseInterval } from './estimates';

export type ProfileChartData = {
  points: ProfileChartPoint[];
  curve: ChartCurve | null;
  pKas: XMarker[];
  optimum: XMarker | null;
  halfWindow: { lo: number | null; hi: number | null; level: number } | null;
};

const pkaNames: Record<string, string[]> = {
  acid: ['pKa'],
  base: ['pKa'],
  bell: ['pKa1', 'pKa2'],
  'bell-plateau': ['pKa1', 'pKa2'],
  three: ['pKa', 'pKb', 'pKc'],
};

export function profileChartData(profile: VariantProfile, bootstrapCurrent: boolean): ProfileChartData {
  const fit = profile.fit;
  const points = profile.points.flatMap((p) =>
    p.mean === null ? [] : [{ pH: p.pH, mean: p.mean, sd: p.sd, n: p.n }],
  );
  const names = fit ? (pkaNames[fit.model] ?? []) : [];
  const pKas = names.flatMap((name) => {
    const e = fit?.parameters[name];
    if (!e || e.value === null) return [];
    return [
      {
        label: `${name} ${formatFixed(e.value, 2)}`,
        value: e.value,
        interval: chooseInterval(e, bootstrapCurrent)?.interval ?? null,
      },
    ];
  });
  const opt = fit?.pHopt;
  const optimum =
    opt && opt.value !== null
      ? {
          label: `optimum ${formatFixed(opt.value, 2)}`,
          value: opt.value,
          interval: chooseInterval(opt, bootstrapCurrent)?.interval ?? null,
        }
      : null;
  const maximum = profile.relative?.maximum ?? null;
  const halfWindow =
    fit && maximum !== null && (fit.window.lo.value !== null || fit.window.hi.value !== null)
      ? { lo: fit.window.lo.value, hi: fit.window.hi.value, level: maximum / 2 }
      : null;
  const curve = profile.curve
    ? { x: profile.curve.pH, y: profile.curve.v, lower: profile.curve.lower, upper: profile.curve.upper }
    : null;
  return { points, curve, pKas, optimum, halfWindow };
}

/** The study's variants as relative curves, for one overlaid chart (the comparison chart's shape). */
export function relativeCurves(profiles: VariantProfile[], approved: boolean): ComparisonCurve[] {
  return profiles.map((p) => ({
    key: p.variantId,
    label: p.name,
    approved,
    points: p.relative?.points.map(({ pH, mean, sd }) => ({ pH, mean, sd })) ?? [],
    curve: p.relative?.curve ?? null,
  }));
}
