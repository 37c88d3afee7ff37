// Capacity across the series: β at each point (pH-coloured; weak points ringed in amber), overlap
// points as diamonds, each system's β curve, and the line below which a point counts as weak.
import { LinePath } from '@visx/shape';
import { useMemo } from 'react';
import type { BufferSystem } from '@shared/chemistry';
import type { DesignedSeries, SeriesRequest } from '@shared/schemas/buffer-series';
import { ChartFrame } from '@/components/ui/charts/chart-frame';
import { chartTheme } from '@/components/ui/charts/chart-theme';
import { phColor } from '@/components/ui/ph-scale';
import { capacityCurves } from '../utils/curves';

export type CapacityChartProps = {
  design: DesignedSeries;
  request: Pick<SeriesRequest, 'bufferConcMm' | 'targetIonicStrengthM' | 'method'>;
  library: readonly BufferSystem[];
};

/** A point is weak below half the buffer's peak β = ln10·C/4 (shared/chemistry series.ts default). */
const WEAK_FRACTION = 0.5;

export function CapacityChart({ design, request, library }: CapacityChartProps) {
  const curves = useMemo(() => capacityCurves(design, request, library), [design, request, library]);
  const points = design.points.filter((p) => p.capacity !== null);
  const weakLine = (WEAK_FRACTION * Math.LN10 * request.bufferConcMm) / 4;
  const pHs = design.points.map((p) => p.pH);
  const ys = [
    ...points.map((p) => p.capacity! * 1000),
    ...design.points.flatMap((p) => (p.overlap ? [p.overlap.capacity * 1000] : [])),
    ...curves.flatMap((c) => c.points.map((q) => q.y)),
    weakLine,
  ];
  const xDomain: [number, number] = [Math.min(...pHs) - 0.5, Math.max(...pHs) + 0.5];
  return (
    <ChartFrame
      title="Buffer capacity across the series"
      xLabel={`pH at ${design.assayTemperatureC} °C`}
      yLabel="β (mM/pH)"
      xDomain={xDomain}
      yDomain={[0, Math.max(...ys) * 1.08]}
      legend={[
        { label: 'proposed buffer', color: chartTheme.inkMuted, mark: 'dot' },
        { label: 'weak point', color: chartTheme.warn, mark: 'ring' },
        { label: 'overlap buffer', color: chartTheme.inkMuted, mark: 'diamond' },
        { label: 'β of each system', color: chartTheme.accentSoft, mark: 'line' },
        { label: 'weak below', color: chartTheme.warn, mark: 'dashed' },
      ]}
      caption={`Capacity at ${request.bufferConcMm} mM with water’s own terms (Van Slyke); a point is weak when the buffer gives less than half its peak ln10·C/4.`}
    >
      {({ x, y, width }) => (
        <>
          <line
            x1={0}
            x2={width}
            y1={y(weakLine)}
            y2={y(weakLine)}
            stroke={chartTheme.warn}
            strokeDasharray="5 4"
            strokeWidth={1.2}
          />
          {curves.map((c) => (
            <LinePath
              key={c.systemId}
              data={c.points}
              x={(d) => x(d.x)}
              y={(d) => y(d.y)}
              stroke={chartTheme.accentSoft}
              strokeWidth={1.5}
            />
          ))}
          {design.points.map((p) =>
            p.overlap ? (
              <path
                key={`o-${p.pH}`}
                transform={`translate(${x(p.pH)},${y(p.overlap.capacity * 1000)})`}
                d="M0 -5 L5 0 L0 5 L-5 0 Z"
                fill="#fff"
                stroke={chartTheme.inkMuted}
                strokeWidth={1.4}
              >
                <title>{`pH ${p.pH}: overlap ${p.overlap.systemName}, β ${(p.overlap.capacity * 1000).toFixed(1)} mM/pH`}</title>
              </path>
            ) : null,
          )}
          {points.map((p) => (
            <circle
              key={`p-${p.pH}`}
              cx={x(p.pH)}
              cy={y(p.capacity! * 1000)}
              r={p.weak ? 6 : 4.5}
              fill={phColor(p.pH)}
              stroke={p.weak ? chartTheme.warn : '#fff'}
              strokeWidth={p.weak ? 2.5 : 1}
            >
              <title>{`pH ${p.pH}: ${p.proposal?.systemName}, β ${(p.capacity! * 1000).toFixed(1)} mM/pH${p.weak ? ' (weak)' : ''}`}</title>
            </circle>
          ))}
        </>
      )}
    </ChartFrame>
  );
}
