// The legend of the signal scale: a pale-to-dark bar between the domain's ends, with a title.
import { useId } from 'react';
import { signalGradient } from './signal-scale';

export type SignalLegendProps = {
  min: number;
  max: number;
  title: string;
  width?: number;
  format?: (v: number) => string;
};

const defaultFormat = (v: number) =>
  Math.abs(v) >= 100 ? v.toFixed(0) : Math.abs(v) >= 1 ? v.toFixed(2) : v.toPrecision(3);

export function SignalLegend({ min, max, title, width = 160, format = defaultFormat }: SignalLegendProps) {
  const id = useId();
  return (
    <figure
      className="inline-flex items-center gap-2 text-sm"
      aria-label={`${title}: colour from ${format(min)} (pale) to ${format(max)} (dark)`}
    >
      <figcaption className="text-ink-muted">{title}</figcaption>
      <span className="tabular-nums text-ink-muted">{format(min)}</span>
      <svg width={width} height={10} aria-hidden="true">
        <defs>
          <linearGradient id={id} x1="0" x2="1" y1="0" y2="0">
            {signalGradient().map((s) => (
              <stop key={s.offset} offset={s.offset} stopColor={s.color} />
            ))}
          </linearGradient>
        </defs>
        <rect width={width} height={10} rx={2} fill={`url(#${id})`} stroke="#d8ddda" />
      </svg>
      <span className="tabular-nums text-ink-muted">{format(max)}</span>
    </figure>
  );
}
