// The markers of the profile chart: apparent pKa values (dashed) and the optimum (solid), each with
// its interval as a bar in a row above the data, and the half-activity window as a level line.
import type { LinearScale } from '@/components/ui/charts/chart-frame';
import { chartTheme } from '@/components/ui/charts/chart-theme';
import { IntervalBar } from './marks';
import type { XMarker } from './types';

export type ProfileMarkersProps = {
  x: LinearScale;
  y: LinearScale;
  width: number;
  /** The plot's bottom edge in px (the vertical markers run down to it). */
  bottom: number;
  pKas: XMarker[];
  optimum: XMarker | null;
  halfWindow: { lo: number | null; hi: number | null; level: number } | null;
};

/** Rows of interval bars above the data: one for the pKa values, one for the optimum. */
export const markerRowsOf = (pKas: XMarker[], optimum: XMarker | null) =>
  (pKas.length > 0 ? 1 : 0) + (optimum ? 1 : 0);

const rowY = (row: number) => 12 + row * 16;

export function ProfileMarkers({ x, y, width, bottom, pKas, optimum, halfWindow }: ProfileMarkersProps) {
  const markerRows = markerRowsOf(pKas, optimum);
  return (
    <>
      {halfWindow && (
        <g stroke={chartTheme.inkMuted} strokeWidth={1.5}>
          <line
            x1={halfWindow.lo === null ? 0 : x(halfWindow.lo)}
            x2={halfWindow.hi === null ? width : x(halfWindow.hi)}
            y1={y(halfWindow.level)}
            y2={y(halfWindow.level)}
          />
          {[halfWindow.lo, halfWindow.hi].map((v, i) =>
            v === null ? null : (
              <line key={i} x1={x(v)} x2={x(v)} y1={y(halfWindow.level) - 5} y2={y(halfWindow.level) + 5} />
            ),
          )}
        </g>
      )}
      {pKas.map((m) => (
        <g key={m.label}>
          <line
            x1={x(m.value)}
            x2={x(m.value)}
            y1={rowY(0)}
            y2={bottom}
            stroke={chartTheme.inkMuted}
            strokeDasharray="4 3"
          />
          {m.interval && <IntervalBar interval={m.interval} x={x} at={rowY(0)} width={width} />}
          <text x={x(m.value) + 4} y={rowY(0) + 12} fontSize={chartTheme.fontSize} fill={chartTheme.inkMuted}>
            {m.label}
          </text>
        </g>
      ))}
      {optimum && (
        <g>
          <line
            x1={x(optimum.value)}
            x2={x(optimum.value)}
            y1={rowY(markerRows - 1)}
            y2={bottom}
            stroke={chartTheme.ink}
            strokeWidth={1}
          />
          {optimum.interval && (
            <IntervalBar
              interval={optimum.interval}
              x={x}
              at={rowY(markerRows - 1)}
              width={width}
              color={chartTheme.ink}
            />
          )}
          <text
            x={x(optimum.value) + 4}
            y={rowY(markerRows - 1) + 12}
            fontSize={chartTheme.fontSize}
            fill={chartTheme.ink}
          >
            {optimum.label}
          </text>
        </g>
      )}
    </>
  );
}
