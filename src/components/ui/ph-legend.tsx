// The legend of the pH colour scale: a gradient bar with pH ticks. Every pH-coloured view shows it.
import { useId } from 'react';
import { phGradient } from './ph-scale';

export type PhLegendProps = {
  min?: number;
  max?: number;
  /** Width of the bar in px. */
  width?: number;
  /** Tick every `step` pH units. */
  step?: number;
  title?: string;
};

export function PhLegend({ min = 2, max = 10, width = 240, step = 1, title = 'pH' }: PhLegendProps) {
  const gradientId = useId();
  const pad = 10;
  const barHeight = 10;
  const ticks: number[] = [];
  for (let v = Math.ceil(min / step) * step; v <= max + 1e-9; v += step) ticks.push(Number(v.toFixed(6)));
  const x = (v: number) => pad + ((v - min) / (max - min)) * width;
  return (
    <figure
      className="inline-flex items-center gap-2"
      aria-label={`${title} colour scale from ${min} to ${max}`}
    >
      <figcaption className="text-sm font-semibold text-ink-muted">{title}</figcaption>
      <svg width={width + 2 * pad} height={barHeight + 18} role="img" aria-hidden="true">
        <defs>
          <linearGradient id={gradientId} x1="0" x2="1" y1="0" y2="0">
            {phGradient(min, max).map((s) => (
              <stop key={s.offset} offset={s.offset} stopColor={s.color} />
            ))}
          </linearGradient>
        </defs>
        <rect x={pad} y={1} width={width} height={barHeight} rx={2} fill={`url(#${gradientId})`} />
        {ticks.map((t) => (
          <g key={t} transform={`translate(${x(t)},0)`}>
            <line y1={barHeight + 1} y2={barHeight + 4} stroke="#4f5a5c" />
            <text
              y={barHeight + 15}
              textAnchor="middle"
              fontSize={11}
              fill="#4f5a5c"
              className="tabular-nums"
            >
              {t}
            </text>
          </g>
        ))}
      </svg>
    </figure>
  );
}
