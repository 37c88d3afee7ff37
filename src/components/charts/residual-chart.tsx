// Residuals of a fit against x (pH): a zero line, one dot per fitted value, and optional dashed
// lines at ± a reference spread (e.g. 2 s, twice the residual standard deviation).
import type { ReactNode } from 'react';
import { ChartFrame } from '@/components/ui/charts/chart-frame';
import type { ChartLegendItem } from '@/components/ui/charts/chart-legend';
import { chartTheme } from '@/components/ui/charts/chart-theme';
import { extent } from './marks';
import type { Domain } from './types';

export type ResidualPoint = { x: number; residual: number; label?: string };

export type ResidualChartProps = {
  title: string;
  xLabel: string;
  /** With units, e.g. "Residual (µM/min)". */
  yLabel: string;
  points: ResidualPoint[];
  /** Draws ± this value as dashed lines, named in the legend by `spreadLabel`. */
  spread?: number | null;
  spreadLabel?: string;
  xDomain?: Domain;
  color?: string;
  height?: number;
  caption?: ReactNode;
  fileName?: string;
};

export function ResidualChart(props: ResidualChartProps) {
  const { points, spread, color = chartTheme.accent } = props;
  const xDomain =
    props.xDomain ??
    extent(
      points.map((p) => p.x),
      0.06,
    );
  const reach = Math.max(
    ...points.map((p) => Math.abs(p.residual)).filter(Number.isFinite),
    spread && Number.isFinite(spread) ? spread : 0,
    1e-12,
  );
  const legend: ChartLegendItem[] = [
    { label: 'residual', color, mark: 'dot' },
    ...(spread
      ? [{ label: props.spreadLabel ?? `± ${spread}`, color: chartTheme.inkMuted, mark: 'dashed' as const }]
      : []),
  ];
  return (
    <ChartFrame
      title={props.title}
      xLabel={props.xLabel}
      yLabel={props.yLabel}
      xDomain={xDomain}
      yDomain={[-reach * 1.12, reach * 1.12]}
      height={props.height ?? 230}
      legend={legend}
      caption={props.caption}
      fileName={props.fileName}
    >
      {({ x, y, width }) => (
        <>
          <line x1={0} x2={width} y1={y(0)} y2={y(0)} stroke={chartTheme.inkMuted} />
          {spread
            ? [spread, -spread].map((s) => (
                <line
                  key={s}
                  x1={0}
                  x2={width}
                  y1={y(s)}
                  y2={y(s)}
                  stroke={chartTheme.inkMuted}
                  strokeDasharray="4 3"
                />
              ))
            : null}
          {points.map((p, i) => (
            <circle key={i} cx={x(p.x)} cy={y(p.residual)} r={2.8} fill={color} opacity={0.8}>
              {p.label && <title>{p.label}</title>}
            </circle>
          ))}
        </>
      )}
    </ChartFrame>
  );
}
