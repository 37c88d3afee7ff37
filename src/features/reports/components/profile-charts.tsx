// One chart per variant for the study report, two to a row on A4.
import type { VariantProfile } from '@shared/analysis';
import { ProfileChart } from '@/components/charts/profile-chart';
import { profileChartData } from '@/components/charts/profile-chart-data';

export type ProfileChartsProps = {
  profiles: VariantProfile[];
  xLabel: string;
  yLabel: string;
  unit: string;
  bootstrapCurrent: boolean;
};

export function ProfileCharts({ profiles, xLabel, yLabel, unit, bootstrapCurrent }: ProfileChartsProps) {
  return (
    <div className="grid grid-cols-2 gap-3">
      {profiles.map((p) => {
        const d = profileChartData(p, bootstrapCurrent);
        return (
          <ProfileChart
            key={p.variantId}
            title={p.name}
            xLabel={xLabel}
            yLabel={yLabel}
            unit={unit}
            points={d.points}
            curve={d.curve}
            pKas={d.pKas}
            optimum={d.optimum}
            halfWindow={d.halfWindow}
            height={270}
            caption={p.fit ? undefined : (p.error?.message ?? 'No fit.')}
          />
        );
      })}
    </div>
  );
}
