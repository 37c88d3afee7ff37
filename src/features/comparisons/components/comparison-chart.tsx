// The overlaid normalised profiles: each profile's relative activity (1 = its fitted maximum)
// against pH, with its 95 % band and its points (mean ± SD). Colours are categorical and
// colour-blind safe (utils/colors.ts); the legend above the chart hides and shows each profile,
// and the legend inside the chart (kept in the SVG/PNG files) lists the profiles shown.
import type { ComparisonCurve } from '@shared/schemas/comparisons';
import { bandPath, ErrorBar, extent, pathThrough } from '@/components/charts/marks';
import { ChartFrame } from '@/components/ui/charts/chart-frame';
import type { ChartLegendItem } from '@/components/ui/charts/chart-legend';
import type { ProfileStyle } from '../utils/colors';
import { LegendToggles } from './legend-toggles';

export type ComparisonChartProps = {
  curves: ComparisonCurve[];
  styles: Record<string, ProfileStyle>;
  referenceKey: string;
  hidden: ReadonlySet<string>;
  onToggle?: (key: string) => void;
  title?: string;
  height?: number;
};

export const curveLabel = (c: ComparisonCurve, referenceKey: string) =>
  `${c.label}${c.key === referenceKey ? ' (reference)' : ''}${c.approved ? '' : ' (not approved)'}`;

export function ComparisonChart(props: ComparisonChartProps) {
  const { curves, styles, referenceKey, hidden, onToggle } = props;
  const shown = curves.filter((c) => !hidden.has(c.key));
  const xDomain = extent(
    curves.flatMap((c) => [...(c.curve?.pH ?? []), ...c.points.map((p) => p.pH)]),
    0,
    [2, 9],
  );
  // Room for the highest point with its SD; bands that run off at the ends are clipped.
  const top = Math.max(
    1.1,
    ...shown.flatMap((c) => c.points.map((p) => (p.mean ?? 0) + (p.sd ?? 0))).filter((v) => v < 2),
  );
  const legend: ChartLegendItem[] = shown.map((c) => ({
    label: curveLabel(c, referenceKey),
    color: styles[c.key]?.color ?? '#000',
    mark: 'line',
  }));
  return (
    <div>
      {onToggle && (
        <LegendToggles
          curves={curves}
          styles={styles}
          referenceKey={referenceKey}
          hidden={hidden}
          onToggle={onToggle}
        />
      )}
      <ChartFrame
        title={props.title ?? 'Relative activity against pH'}
        xLabel="pH"
        yLabel="Relative activity (1 = fitted maximum)"
        xDomain={xDomain}
        yDomain={[0, top]}
        nice={false}
        height={props.height ?? 360}
        legend={legend}
        caption="Each profile divided by its own fitted maximum; shaded: the 95 % confidence band of the fitted curve; points: replicate means ± SD."
      >
        {({ x, y }) => (
          <>
            {shown.map((c) =>
              c.curve ? (
                <path
                  key={`band-${c.key}`}
                  d={bandPath(c.curve.pH, c.curve.lower, c.curve.upper, x, y)}
                  fill={styles[c.key]?.color}
                  opacity={0.14}
                />
              ) : null,
            )}
            {shown.map((c) => {
              const style = styles[c.key];
              return (
                <g key={c.key} data-profile={c.label}>
                  {c.curve && (
                    <path
                      d={pathThrough(c.curve.pH, c.curve.v, x, y)}
                      fill="none"
                      stroke={style?.color}
                      strokeWidth={c.key === referenceKey ? 2.6 : 2}
                      strokeDasharray={style?.dash}
                    />
                  )}
                  {c.points.map((p) =>
                    p.mean === null ? null : (
                      <g key={p.pH}>
                        {p.sd !== null && p.sd > 0 && (
                          <ErrorBar
                            cx={x(p.pH)}
                            top={y(p.mean + p.sd)}
                            bottom={y(p.mean - p.sd)}
                            color={style?.color ?? '#000'}
                          />
                        )}
                        <circle
                          cx={x(p.pH)}
                          cy={y(p.mean)}
                          r={3.2}
                          fill={style?.color}
                          stroke="#fff"
                          strokeWidth={0.8}
                        >
                          <title>{`${c.label}, pH ${p.pH}: ${p.mean.toFixed(3)}${p.sd !== null ? ` ± ${p.sd.toFixed(3)}` : ''}`}</title>
                        </circle>
                      </g>
                    ),
                  )}
                </g>
              );
            })}
          </>
        )}
      </ChartFrame>
    </div>
  );
}
