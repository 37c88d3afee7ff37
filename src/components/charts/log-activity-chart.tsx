// The log plot (SCIENCE.md §1.5, Dixon 1953): log10 activity against pH is made of straight
// stretches of whole-number slope (+1, 0, −1; ±2 for two protons) whose tangents meet at the pKa
// values. The chart draws the replicate means and the fitted curve on a log10 scale, the asymptotes
// as dashed lines, and marks where they meet, so the apparent pKa values read off the intersections.
import type { ReactNode } from 'react';
import { ChartFrame } from '@/components/ui/charts/chart-frame';
import type { ChartLegendItem } from '@/components/ui/charts/chart-legend';
import { chartTheme } from '@/components/ui/charts/chart-theme';
import { extent, pathThrough } from './marks';
import type { ChartCurve, Domain } from './types';

/** log10 v = intercept + slope · pH. */
export type Asymptote = { slope: number; intercept: number };
/** Where two asymptotes meet: the pH (a pKa) and the height in log10 units. */
export type AsymptoteMeeting = { pH: number; log: number; label: string };

export type LogActivityChartProps = {
  title: string;
  xLabel: string;
  /** e.g. "log₁₀ activity (activity in µM/min)". */
  yLabel: string;
  /** Activities (not logs); values at or below zero cannot be drawn and are counted in the caption. */
  points: { pH: number; value: number }[];
  /** The fitted curve in activity units (not logs). */
  curve?: Pick<ChartCurve, 'x' | 'y'> | null;
  asymptotes?: Asymptote[];
  meetings?: AsymptoteMeeting[];
  xDomain?: Domain;
  color?: string;
  height?: number;
  caption?: ReactNode;
  fileName?: string;
};

const log10OrNull = (v: number | null) => (v !== null && Number.isFinite(v) && v > 0 ? Math.log10(v) : null);
const slopeWord = (s: number) => (s > 0 ? `+${s}` : s < 0 ? `−${-s}` : '0');

export function LogActivityChart(props: LogActivityChartProps) {
  const { points, curve, asymptotes = [], meetings = [], color = chartTheme.accent } = props;
  const shown = points.filter((p) => p.value > 0 && Number.isFinite(p.value));
  const hidden = points.length - shown.length;
  const curveLog = curve ? curve.y.map(log10OrNull) : [];
  const xDomain =
    props.xDomain ??
    (curve
      ? extent(curve.x, 0)
      : extent(
          shown.map((p) => p.pH),
          0.08,
        ));
  const logs = [...shown.map((p) => Math.log10(p.value)), ...curveLog, ...meetings.map((m) => m.log)];
  const [lo, hi] = extent(logs, 0.02);
  // The asymptotes meet above the curve (by log10 2 or more); keep room for them and their labels.
  const yDomain: Domain = [lo, hi + (hi - lo) * 0.12];
  const legend: ChartLegendItem[] = [
    { label: 'mean', color, mark: 'dot' },
    ...(curve ? [{ label: 'fit', color, mark: 'line' as const }] : []),
    ...(asymptotes.length
      ? [
          {
            label: `asymptotes (slopes ${[...new Set(asymptotes.map((a) => slopeWord(a.slope)))].join(', ')})`,
            color: chartTheme.inkMuted,
            mark: 'dashed' as const,
          },
        ]
      : []),
    ...(meetings.length
      ? [{ label: 'meeting point = apparent pKa', color: chartTheme.ink, mark: 'ring' as const }]
      : []),
  ];
  const caption = (
    <>
      {props.caption}
      {hidden > 0 &&
        ` ${hidden} ${hidden === 1 ? 'point is' : 'points are'} at or below zero and cannot be shown on a log scale.`}
    </>
  );
  return (
    <ChartFrame
      title={props.title}
      xLabel={props.xLabel}
      yLabel={props.yLabel}
      xDomain={xDomain}
      yDomain={yDomain}
      nice={false}
      height={props.height ?? 280}
      legend={legend}
      caption={caption}
      fileName={props.fileName}
      yTickFormat={(v) => v.toFixed(1).replace('-', '−')}
    >
      {({ x, y, height }) => (
        <>
          {asymptotes.map((a, i) => (
            <line
              key={i}
              x1={x(xDomain[0])}
              x2={x(xDomain[1])}
              y1={y(a.intercept + a.slope * xDomain[0])}
              y2={y(a.intercept + a.slope * xDomain[1])}
              stroke={chartTheme.inkMuted}
              strokeDasharray="5 4"
              strokeWidth={1.2}
            />
          ))}
          {meetings.map((m) => (
            <g key={m.label}>
              <line
                x1={x(m.pH)}
                x2={x(m.pH)}
                y1={y(m.log)}
                y2={height}
                stroke={chartTheme.inkFaint}
                strokeDasharray="2 3"
              />
              <circle cx={x(m.pH)} cy={y(m.log)} r={4} fill="#fff" stroke={chartTheme.ink} strokeWidth={1.5}>
                <title>{m.label}</title>
              </circle>
              <text x={x(m.pH) + 6} y={y(m.log) - 6} fontSize={chartTheme.fontSize} fill={chartTheme.ink}>
                {m.label}
              </text>
            </g>
          ))}
          {curve && (
            <path d={pathThrough(curve.x, curveLog, x, y)} fill="none" stroke={color} strokeWidth={2} />
          )}
          {shown.map((p, i) => (
            <circle
              key={`${p.pH}-${i}`}
              cx={x(p.pH)}
              cy={y(Math.log10(p.value))}
              r={3.5}
              fill={color}
              stroke="#fff"
            >
              <title>{`pH ${p.pH}: log₁₀ ${p.value.toPrecision(3)} = ${Math.log10(p.value).toFixed(2)}`}</title>
            </circle>
          ))}
        </>
      )}
    </ChartFrame>
  );
}
