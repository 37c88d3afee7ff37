// One well's time course: the reads as dots, the window the rate was fitted over shaded, and the
// fitted straight line across that window (its slope is the initial rate, SCIENCE.md §3.1).
import type { ReactNode } from 'react';
import { ChartFrame } from '@/components/ui/charts/chart-frame';
import type { ChartLegendItem } from '@/components/ui/charts/chart-legend';
import { chartTheme } from '@/components/ui/charts/chart-theme';
import { extent } from './marks';

export type TimeCourseChartProps = {
  title: string;
  /** e.g. "Time (s)". */
  xLabel: string;
  /** e.g. "A410". */
  yLabel: string;
  /** Seconds. */
  times: number[];
  values: (number | null)[];
  /** The fitted window in the same unit as `times`; null when there is none. */
  window?: { start: number; end: number } | null;
  /** Words for the window in the legend, e.g. "window (automatic)". */
  windowLabel?: string;
  /** The fitted line, signal = intercept + slope · t, drawn across the window. */
  line?: { slope: number; intercept: number } | null;
  color?: string;
  height?: number;
  caption?: ReactNode;
  fileName?: string;
};

export function TimeCourseChart(props: TimeCourseChartProps) {
  const { times, values, window, line, color = chartTheme.accent } = props;
  const read = times.flatMap((t, i) => {
    const v = values[i];
    return v !== null && v !== undefined && Number.isFinite(v) ? [{ t, v }] : [];
  });
  const xDomain = extent(times, 0.03);
  const yDomain = extent(
    read.map((r) => r.v),
    0.08,
  );
  const legend: ChartLegendItem[] = [
    { label: 'read', color, mark: 'dot' },
    ...(window
      ? [{ label: props.windowLabel ?? 'rate window', color: chartTheme.accentSoft, mark: 'band' as const }]
      : []),
    ...(line ? [{ label: 'fitted line', color: chartTheme.ink, mark: 'line' as const }] : []),
  ];
  const inWindow = (t: number) => window && t >= window.start && t <= window.end;
  return (
    <ChartFrame
      title={props.title}
      xLabel={props.xLabel}
      yLabel={props.yLabel}
      xDomain={xDomain}
      yDomain={yDomain}
      height={props.height ?? 240}
      legend={legend}
      caption={props.caption}
      fileName={props.fileName}
    >
      {({ x, y, height }) => (
        <>
          {window && (
            <rect
              data-rate-window={`${window.start}-${window.end}`}
              x={x(window.start)}
              width={Math.max(1, x(window.end) - x(window.start))}
              y={0}
              height={height}
              fill={chartTheme.accentSoft}
              opacity={0.35}
            />
          )}
          {read.map((r) => (
            <circle
              key={r.t}
              cx={x(r.t)}
              cy={y(r.v)}
              r={2.6}
              fill={inWindow(r.t) ? color : chartTheme.inkFaint}
            >
              <title>{`${r.t} s: ${r.v}`}</title>
            </circle>
          ))}
          {line && window && (
            <line
              x1={x(window.start)}
              x2={x(window.end)}
              y1={y(line.intercept + line.slope * window.start)}
              y2={y(line.intercept + line.slope * window.end)}
              stroke={chartTheme.ink}
              strokeWidth={1.5}
            />
          )}
        </>
      )}
    </ChartFrame>
  );
}
