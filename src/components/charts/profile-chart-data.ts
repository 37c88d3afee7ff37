// What a profile chart draws for one variant, on the analysis screen and in the printed report:
// replicate means ± SD, the fitted curve with its 95 % band, the apparent pKa values and the
// optimum with the intervals the tables show, and the half-activity window at half the fitted
// maximum.
import type { VariantProfile } from '@shared/analysis';
import { pKaNamesOf } from '@shared/fitting/models';
import { formatFixed } from '@/components/ui/numbers';
import { pickInterval } from '@/lib/intervals';
import type { ProfileChartPoint } from './profile-chart';
import type { ChartCurve, XMarker } from './types';

export type ProfileChartData = {
  points: ProfileChartPoint[];
  curve: ChartCurve | null;
  pKas: XMarker[];
  optimum: XMarker | null;
  halfWindow: { lo: number | null; hi: number | null; level: number } | null;
};

export function profileChartData(profile: VariantProfile, bootstrapCurrent: boolean): ProfileChartData {
  const fit = profile.fit;
  const points = profile.points.flatMap((p) =>
    p.mean === null ? [] : [{ pH: p.pH, mean: p.mean, sd: p.sd, n: p.n }],
  );
  const names = fit ? pKaNamesOf(fit.model) : [];
  const pKas = names.flatMap((name) => {
    const e = fit?.parameters[name];
    if (!e || e.value === null) return [];
    return [
      {
        label: `${name} ${formatFixed(e.value, 2)}`,
        value: e.value,
        interval: pickInterval(e, bootstrapCurrent)?.interval ?? null,
      },
    ];
  });
  const opt = fit?.pHopt;
  const optimum =
    opt && opt.value !== null
      ? {
          label: `optimum ${formatFixed(opt.value, 2)}`,
          value: opt.value,
          interval: pickInterval(opt, bootstrapCurrent)?.interval ?? null,
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
