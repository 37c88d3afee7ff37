// What the analysis screen's charts draw for one variant: the profile chart's data (shared with the
// printed report), and on screen also the single wells (excluded ones with their reason), the
// residuals and the log-plot lines.
import type { VariantProfile, WellRow } from '@shared/analysis';
import type { AsymptoteMeeting, Asymptote } from '@/components/charts/log-activity-chart';
import type { ProfileChartWell } from '@/components/charts/profile-chart';
import { profileChartData, type ProfileChartData } from '@/components/charts/profile-chart-data';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { logAsymptotes } from './log-asymptotes';

export type ProfileView = ProfileChartData & {
  wells: ProfileChartWell[];
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
    ...profileChartData(profile, bootstrapCurrent),
    wells: chartWells,
    residuals,
    s: fit?.s2 != null ? Math.sqrt(fit.s2) : null,
    asymptotes: log.lines,
    meetings: log.meetings.map((m) => ({ pH: m.pH, log: m.log, label: `${m.name} ${formatFixed(m.pH, 2)}` })),
  };
}
