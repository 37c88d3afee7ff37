// Activity against pH for one profile: replicate means ± SD, single wells faint, excluded wells
// hollow (their reason on hover), the fitted curve with its 95 % band, apparent pKa values and the
// optimum as vertical markers with their intervals, and the half-activity window as a level line.
import type { ReactNode } from 'react';
import { ChartFrame } from '@/components/ui/charts/chart-frame';
import type { ChartLegendItem } from '@/components/ui/charts/chart-legend';
import { chartTheme } from '@/components/ui/charts/chart-theme';
import { bandPath, ErrorBar, extent, pathThrough } from './marks';
import { markerRowsOf, ProfileMarkers } from './profile-markers';
import type { ChartCurve, Domain, XMarker } from './types';

export type ProfileChartPoint = { pH: number; mean: number; sd: number | null; n: number };
/** One well; `note` is shown on hover (an excluded well's reason). */
export type ProfileChartWell = {
  pH: number;
  value: number;
  excluded: boolean;
  label: string;
  note?: string | null;
};

export type ProfileChartProps = {
  title: string;
  /** Axis titles with units, e.g. "pH at 37 °C" and "Volumetric rate (µM/min)". */
  xLabel: string;
  yLabel: string;
  points: ProfileChartPoint[];
  wells?: ProfileChartWell[];
  curve?: ChartCurve | null;
  /** Apparent pKa values with their intervals. */
  pKas?: XMarker[];
  optimum?: XMarker | null;
  /** The pH range where the fitted activity is at least `level` (half the maximum). */
  halfWindow?: { lo: number | null; hi: number | null; level: number } | null;
  /** Units of the y values, for the hover text. */
  unit?: string;
  xDomain?: Domain;
  color?: string;
  height?: number;
  caption?: ReactNode;
  fileName?: string;
};

const fmt = (v: number) =>
  Math.abs(v) >= 100 ? v.toFixed(0) : Math.abs(v) >= 10 ? v.toFixed(1) : v.toPrecision(3);

export function ProfileChart(props: ProfileChartProps) {
  const {
    points,
    wells = [],
    curve,
    pKas = [],
    optimum,
    halfWindow,
    unit = '',
    color = chartTheme.accent,
  } = props;
  const xs = [...points.map((p) => p.pH), ...wells.map((w) => w.pH)];
  const xDomain = props.xDomain ?? (curve ? extent(curve.x, 0) : extent(xs, 0.08));
  const ys = [
    0,
    ...points.flatMap((p) => [p.mean + (p.sd ?? 0), p.mean - (p.sd ?? 0)]),
    ...wells.map((w) => w.value),
    ...(curve?.upper ?? curve?.y ?? []),
  ];
  const [yLo, yHi] = extent(ys, 0.02);
  // Head room above the data for the marker labels and interval bars.
  const markerRows = markerRowsOf(pKas, optimum ?? null);
  const yDomain: Domain = [Math.min(0, yLo), yHi + (yHi - Math.min(0, yLo)) * (0.06 + 0.09 * markerRows)];
  const legend: ChartLegendItem[] = [
    { label: 'mean ± SD', color, mark: 'dot' },
    ...(wells.length ? [{ label: 'single well', color: chartTheme.accentSoft, mark: 'dot' as const }] : []),
    ...(wells.some((w) => w.excluded)
      ? [{ label: 'excluded well', color: chartTheme.ink, mark: 'ring' as const }]
      : []),
    ...(curve ? [{ label: 'fit', color, mark: 'line' as const }] : []),
    ...(curve?.lower ? [{ label: '95 % band', color: chartTheme.accentSoft, mark: 'band' as const }] : []),
    ...(pKas.length ? [{ label: 'apparent pKa', color: chartTheme.inkMuted, mark: 'dashed' as const }] : []),
    ...(optimum ? [{ label: 'optimum', color: chartTheme.ink, mark: 'line' as const }] : []),
    ...(halfWindow
      ? [{ label: 'half-activity window', color: chartTheme.inkMuted, mark: 'line' as const }]
      : []),
  ];

  return (
    <ChartFrame
      title={props.title}
      xLabel={props.xLabel}
      yLabel={props.yLabel}
      xDomain={xDomain}
      yDomain={yDomain}
      nice={false}
      height={props.height ?? 340}
      legend={legend}
      caption={props.caption}
      fileName={props.fileName}
    >
      {({ x, y, width }) => {
        return (
          <>
            {curve?.lower && curve.upper && (
              <path
                d={bandPath(curve.x, curve.lower, curve.upper, x, y)}
                fill={chartTheme.accentSoft}
                opacity={0.45}
              />
            )}
            <ProfileMarkers
              x={x}
              y={y}
              width={width}
              bottom={y(yDomain[0])}
              pKas={pKas}
              optimum={optimum ?? null}
              halfWindow={halfWindow ?? null}
            />
            {curve && (
              <path d={pathThrough(curve.x, curve.y, x, y)} fill="none" stroke={color} strokeWidth={2} />
            )}
            {wells
              .filter((w) => !w.excluded)
              .map((w) => (
                <circle
                  key={w.label}
                  cx={x(w.pH)}
                  cy={y(w.value)}
                  r={2.6}
                  fill={chartTheme.accentSoft}
                  opacity={0.9}
                >
                  <title>{`${w.label}: ${fmt(w.value)} ${unit} at pH ${w.pH}`}</title>
                </circle>
              ))}
            {points.map((p, i) => (
              <g key={`${p.pH}-${i}`}>
                {p.sd !== null && p.sd > 0 && (
                  <ErrorBar cx={x(p.pH)} top={y(p.mean + p.sd)} bottom={y(p.mean - p.sd)} color={color} />
                )}
                <circle cx={x(p.pH)} cy={y(p.mean)} r={4} fill={color} stroke="#fff" strokeWidth={1}>
                  <title>{`pH ${p.pH}: mean ${fmt(p.mean)}${p.sd !== null ? ` ± ${fmt(p.sd)}` : ''} ${unit} (n = ${p.n})`}</title>
                </circle>
              </g>
            ))}
            {wells
              .filter((w) => w.excluded)
              .map((w) => (
                <circle
                  key={w.label}
                  data-excluded-well={w.label}
                  cx={x(w.pH)}
                  cy={y(w.value)}
                  r={4.5}
                  fill="#fff"
                  fillOpacity={0.01}
                  stroke={chartTheme.ink}
                  strokeWidth={1.5}
                >
                  <title>{`${w.label} excluded: ${w.note ?? 'no reason given'} (${fmt(w.value)} ${unit})`}</title>
                </circle>
              ))}
          </>
        );
      }}
    </ChartFrame>
  );
}
