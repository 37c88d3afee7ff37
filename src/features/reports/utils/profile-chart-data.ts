// The report's overlaid chart of relative curves (one profile chart per variant is drawn from
// profileChartData in src/components/charts, as on the analysis screen).
import type { VariantProfile } from '@shared/analysis';
import type { ComparisonCurve } from '@shared/schemas/comparisons';

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
