// One variant's profile: activity against pH with the fit, its residuals, the log plot with its
// asymptotes, how the model was chosen, the estimates and the flags in words.
import type { Units, VariantProfile, WellRow } from '@shared/analysis';
import { LogActivityChart } from '@/components/charts/log-activity-chart';
import { ProfileChart } from '@/components/charts/profile-chart';
import { ResidualChart } from '@/components/charts/residual-chart';
import { Notice } from '@/components/ui/notice';
import { profileView } from '../utils/profile-view';
import { flagSentence } from '../utils/words';
import { FitDetails } from './fit-details';
import { ModelChoice } from './model-choice';

export type ProfilePanelProps = {
  profile: VariantProfile;
  wells: WellRow[];
  units: Units;
  plateNames: Record<string, string>;
  bootstrapCurrent: boolean;
  flagText: Record<string, string>;
};

export function ProfilePanel({
  profile,
  wells,
  units,
  plateNames,
  bootstrapCurrent,
  flagText,
}: ProfilePanelProps) {
  const view = profileView(profile, wells, plateNames, bootstrapCurrent);
  const fit = profile.fit;
  const yLabel = `${units.activityLabel} (${units.activity})`;
  const excluded = view.wells.filter((w) => w.excluded).length;
  const flaggedPoints = profile.points.filter((p) => p.flags.length > 0);
  return (
    <section aria-label={`Profile of ${profile.name}`} className="space-y-4">
      {profile.error && (
        <Notice tone="warning" title="No fit for this variant">
          {profile.error.message}
        </Notice>
      )}
      {fit && fit.flags.length > 0 && (
        <Notice tone="warning" title="Flags of this fit">
          <ul className="list-disc pl-5">
            {fit.flags.map((f) => (
              <li key={f.code}>{f.message}</li>
            ))}
          </ul>
        </Notice>
      )}
      <ProfileChart
        title={`${profile.name}: activity against pH`}
        xLabel="pH"
        yLabel={yLabel}
        unit={units.activity}
        points={view.points}
        wells={view.wells}
        curve={view.curve}
        pKas={view.pKas}
        optimum={view.optimum}
        halfWindow={view.halfWindow}
        caption={`Replicate means ± SD; single wells faint${excluded ? `, ${excluded} excluded ${excluded === 1 ? 'well' : 'wells'} hollow (hover for the reason)` : ''}. Band: 95 % confidence band of the fitted curve. Marker bars: the intervals of the parameter table.`}
      />
      {flaggedPoints.length > 0 && (
        <div className="text-sm">
          <p className="font-semibold">Points with flags</p>
          <ul className="list-disc pl-5 text-warn-800">
            {flaggedPoints.map((p) => (
              <li key={`${p.pH}-${p.buffer}`}>
                pH {p.pH}
                {p.buffer ? ` (${p.buffer})` : ''}: {p.flags.map((f) => flagSentence(flagText, f)).join(' ')}
              </li>
            ))}
          </ul>
        </div>
      )}
      <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
        <ResidualChart
          title={`${profile.name}: residuals`}
          xLabel="pH"
          yLabel={`Residual (${units.activity})`}
          points={view.residuals}
          spread={view.s !== null ? 2 * view.s : null}
          spreadLabel="± 2 s (residual SD)"
          xDomain={view.curve ? [view.curve.x[0], view.curve.x[view.curve.x.length - 1]] : undefined}
          caption="Measured − fitted, one dot per well fitted. A pattern (runs of one sign) says the model misses something."
        />
        <LogActivityChart
          title={`${profile.name}: log activity against pH`}
          xLabel="pH"
          yLabel={`log₁₀ activity (${units.activity})`}
          points={view.points.map((p) => ({ pH: p.pH, value: p.mean }))}
          curve={view.curve}
          asymptotes={view.asymptotes}
          meetings={view.meetings}
          caption="Dashed: the asymptotes of the fitted model (slopes +1, 0, −1; +2 for two protons). They meet at the apparent pKa values; an isolated ionization passes log₁₀ 2 ≈ 0.30 below its meeting point."
        />
      </div>
      {profile.selection && <ModelChoice selection={profile.selection} />}
      {fit && <FitDetails fit={fit} activityUnit={units.activity} />}
    </section>
  );
}
