// What the profile charts draw for one variant, taken from the analysis result: replicate points,
// single wells (excluded ones with their reason), the fitted curve and band, the apparent pKa values
// and the optimum with the intervals the tables use, the half-activity window and the log-plot lines.
import type { VariantProfile, WellRow } from '@shared/analysis';
import type { AsymptoteMeeting, Asymptote } from '@/components/charts/log-activity-chart';
import type { ProfileChartPoint, ProfileChartWell } from '@/components/charts/profile-chart';
import type { ChartCurve, XMarker } from '@/components/charts/types';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { pickInterval } from './intervals';
import { logAsymptotes } from './log-asymptotes';
import { pkaNames } from './models';

export type ProfileView = {
  points: ProfileChartPoint[];
  wells: ProfileChartWell[];
  curve: ChartCurve | null;
  pKas: XMarker[];
  optimum: XMarker | null;
  halfWindow: { lo: number | null; hi: number | null; level: number } | null;
  residuals: { x: number; residual: number; label: string }[];
  /** Residual standard deviation s = √(SSR/(n − p)). */
  s: number | null;
  asymptotes: Asymptote[];
  meetings: AsymptoteMeeting[];
};

const wellKey = (plateId: string, well: string) => `${plateId}:${well}`;

export function profileView(
  profile: VariantProfile,
  wells: WellRow[],
  plateNames: Record<string, string>,
  bootstrapCurrent: boolean,
): ProfileView {
  const fit = profile.fit;
  const byKey = new Map(wells.map((w) => [wellKey(w.plateId, w.well), w]));
  const points = profile.points.flatMap((p) =>
    p.mean === null ? [] : [{ pH: p.pH, mean: p.mean, sd: p.sd, n: p.n }],
  );
  const chartWells: ProfileChartWell[] = profile.points.flatMap((p) =>
    [...p.wells, ...p.excluded].flatMap((ref) => {
      const row = byKey.get(wellKey(ref.plateId, ref.well));
      if (!row || row.activity === null) return [];
      const plate = plateNames[ref.plateId] ?? 'plate';
      return [
        {
          pH: p.pH,
          value: row.activity,
          excluded: row.excluded,
          label: `${ref.well} (${plate})`,
          note: row.exclusion?.reason ?? null,
        },
      ];
    }),
  );
  const marker = (name: string, label: string): XMarker | null => {
    const e = fit?.parameters[name];
    if (!e || e.value === null) return null;
    const chosen = pickInterval(e, bootstrapCurrent);
    return {
      label: `${label} ${formatFixed(e.value, 2)}`,
      value: e.value,
      interval: chosen?.interval ?? null,
    };
  };
  const names = fit ? pkaNames[fit.model] : [];
  const pKas = names.flatMap((n) => {
    const m = marker(n, names.length === 1 ? 'pKa' : n);
    return m ? [m] : [];
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
  const residuals = fit
    ? profile.fitData.pH.flatMap((pH, i) => {
        const r = fit.residuals[i];
        const ref = profile.fitData.wells[i];
        return r === null || r === undefined
          ? []
          : [{ x: pH, residual: r, label: `${ref?.well ?? ''} at pH ${pH}: ${formatSig(r, 3)}` }];
      })
    : [];
  const values = fit ? Object.fromEntries(Object.entries(fit.parameters).map(([k, e]) => [k, e.value])) : {};
  const log = fit ? logAsymptotes(fit.model, values) : { lines: [], meetings: [] };
  return {
    points,
    wells: chartWells,
    curve: profile.curve
      ? { x: profile.curve.pH, y: profile.curve.v, lower: profile.curve.lower, upper: profile.curve.upper }
      : null,
    pKas,
    optimum,
    halfWindow,
    residuals,
    s: fit?.s2 != null ? Math.sqrt(fit.s2) : null,
    asymptotes: log.lines,
    meetings: log.meetings.map((m) => ({ pH: m.pH, log: m.log, label: `${m.name} ${formatFixed(m.pH, 2)}` })),
  };
}
