// A legend drawn inside the chart's SVG (so an exported file keeps it), below the x-axis title:
// items left to right, wrapping to a new row when the width runs out.
import { chartTheme } from './chart-theme';

export type LegendMark = 'line' | 'dashed' | 'dot' | 'ring' | 'diamond' | 'band';
export type ChartLegendItem = { label: string; color: string; mark: LegendMark };

export const LEGEND_ROW_HEIGHT = 16;

/** Approximate width of an item at the chart's font size (no text measuring in SVG before paint). */
const itemWidth = (item: ChartLegendItem) => 28 + item.label.length * 5.7;

/** Rows of items that fit in `width`. */
export function legendRows(items: ChartLegendItem[], width: number): ChartLegendItem[][] {
  const rows: ChartLegendItem[][] = [[]];
  let used = 0;
  for (const item of items) {
    const w = itemWidth(item);
    if (used + w > width && rows[rows.length - 1].length > 0) {
      rows.push([]);
      used = 0;
    }
    rows[rows.length - 1].push(item);
    used += w;
  }
  return rows;
}

function Mark({ mark, color }: { mark: LegendMark; color: string }) {
  switch (mark) {
    case 'line':
      return <line x1={0} x2={16} y1={0} y2={0} stroke={color} strokeWidth={2} />;
    case 'dashed':
      return <line x1={0} x2={16} y1={0} y2={0} stroke={color} strokeWidth={1.5} strokeDasharray="4 3" />;
    case 'dot':
      return <circle cx={8} cy={0} r={4} fill={color} />;
    case 'ring':
      return <circle cx={8} cy={0} r={4} fill="#fff" stroke={color} strokeWidth={2} />;
    case 'diamond':
      return <path d="M8 -5 L13 0 L8 5 L3 0 Z" fill="#fff" stroke={color} strokeWidth={1.5} />;
    case 'band':
      return <rect x={0} y={-5} width={16} height={10} fill={color} opacity={0.5} />;
  }
}

export type ChartLegendProps = { rows: ChartLegendItem[][]; x: number; y: number };

export function ChartLegend({ rows, x, y }: ChartLegendProps) {
  return (
    <g transform={`translate(${x},${y})`}>
      {rows.map((row, r) => {
        let offset = 0;
        return row.map((item) => {
          const at = offset;
          offset += itemWidth(item);
          return (
            <g key={item.label} transform={`translate(${at},${r * LEGEND_ROW_HEIGHT})`}>
              <Mark mark={item.mark} color={item.color} />
              <text x={21} y={4} fontSize={chartTheme.fontSize} fill={chartTheme.ink}>
                {item.label}
              </text>
            </g>
          );
        });
      })}
    </g>
  );
}
