// A legend drawn inside the chart's SVG, so an exported file keeps it.
import { chartTheme } from './chart-theme';

export type LegendMark = 'line' | 'dashed' | 'dot' | 'ring' | 'diamond' | 'band';
export type ChartLegendItem = { label: string; color: string; mark: LegendMark };

export type ChartLegendProps = { items: ChartLegendItem[]; x: number; y: number };

const ROW = 15;

function Mark({ mark, color }: { mark: LegendMark; color: string }) {
  switch (mark) {
    case 'line':
      return <line x1={0} x2={16} y1={0} y2={0} stroke={color} strokeWidth={2} />;
    case 'dashed':
      return <line x1={0} x2={16} y1={0} y2={0} stroke={color} strokeWidth={1.5} strokeDasharray="4 3" />;
    case 'dot':
      return <circle cx={8} cy={0} r={4} fill={color} />;
    case 'ring':
      return <circle cx={8} cy={0} r={4} fill="#fff" stroke={color} strokeWidth={1.5} />;
    case 'diamond':
      return <path d="M8 -5 L13 0 L8 5 L3 0 Z" fill="#fff" stroke={color} strokeWidth={1.5} />;
    case 'band':
      return <rect x={0} y={-5} width={16} height={10} fill={color} opacity={0.35} />;
  }
}

/** Rows of mark + label, right-aligned at (x, y) (the chart's top-right corner). */
export function ChartLegend({ items, x, y }: ChartLegendProps) {
  const width = Math.max(...items.map((i) => i.label.length)) * 5.6 + 26;
  return (
    <g transform={`translate(${x - width},${y})`}>
      <rect
        x={-6}
        y={-4}
        width={width + 8}
        height={items.length * ROW + 4}
        fill="#ffffff"
        opacity={0.88}
        rx={3}
      />
      {items.map((item, i) => (
        <g key={item.label} transform={`translate(0,${i * ROW + 6})`}>
          <Mark mark={item.mark} color={item.color} />
          <text x={22} y={4} fontSize={chartTheme.fontSize} fill={chartTheme.ink}>
            {item.label}
          </text>
        </g>
      ))}
    </g>
  );
}
