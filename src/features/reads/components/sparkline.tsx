// A small time course of one well: signal against time, with the ends of both axes written out.
export type SparklineProps = {
  timesS: number[];
  values: (number | null)[];
  label: string;
  unit?: string;
  width?: number;
  height?: number;
};

const fmt = (v: number) =>
  Math.abs(v) >= 100 ? v.toFixed(0) : Math.abs(v) >= 1 ? v.toFixed(2) : v.toPrecision(3);
const fmtTime = (s: number) => (s >= 120 ? `${(s / 60).toFixed(s % 60 ? 1 : 0)} min` : `${s.toFixed(0)} s`);

export function Sparkline({ timesS, values, label, unit = '', width = 280, height = 90 }: SparklineProps) {
  const points = timesS
    .map((t, i) => [t, values[i]] as const)
    .filter((p): p is readonly [number, number] => typeof p[1] === 'number');
  if (points.length < 2) return <p className="text-sm text-ink-muted">{label}: too few values to draw.</p>;
  const pad = { l: 44, r: 8, t: 8, b: 20 };
  const t0 = timesS[0];
  const t1 = timesS[timesS.length - 1];
  const vs = points.map((p) => p[1]);
  const lo = Math.min(...vs);
  const hi = Math.max(...vs) > lo ? Math.max(...vs) : lo + 1;
  const x = (t: number) => pad.l + ((t - t0) / (t1 - t0 || 1)) * (width - pad.l - pad.r);
  const y = (v: number) => pad.t + (1 - (v - lo) / (hi - lo)) * (height - pad.t - pad.b);
  const d = points.map(([t, v], i) => `${i ? 'L' : 'M'}${x(t).toFixed(1)} ${y(v).toFixed(1)}`).join('');
  const missing = values.length - points.length;
  return (
    <figure>
      <svg
        role="img"
        aria-label={`${label}: from ${fmt(points[0][1])} to ${fmt(points[points.length - 1][1])}${unit} over ${fmtTime(t1 - t0)}`}
        width={width}
        height={height}
      >
        <line x1={pad.l} x2={pad.l} y1={pad.t} y2={height - pad.b} stroke="#b9c1bd" />
        <line x1={pad.l} x2={width - pad.r} y1={height - pad.b} y2={height - pad.b} stroke="#b9c1bd" />
        <text x={pad.l - 4} y={pad.t + 8} fontSize={10} textAnchor="end" fill="#4f5a5c">
          {fmt(hi)}
        </text>
        <text x={pad.l - 4} y={height - pad.b} fontSize={10} textAnchor="end" fill="#4f5a5c">
          {fmt(lo)}
        </text>
        <text x={pad.l} y={height - 6} fontSize={10} fill="#4f5a5c">
          {fmtTime(t0)}
        </text>
        <text x={width - pad.r} y={height - 6} fontSize={10} textAnchor="end" fill="#4f5a5c">
          {fmtTime(t1)}
        </text>
        <path d={d} fill="none" stroke="#0f5c58" strokeWidth={1.5} />
        {points.map(([t, v]) => (
          <circle key={t} cx={x(t)} cy={y(v)} r={1.6} fill="#0f5c58" />
        ))}
      </svg>
      <figcaption className="text-sm text-ink-muted">
        {label}: signal as read (vertical) against time (horizontal)
        {missing > 0 ? ` · ${missing} missing point(s)` : ''}
      </figcaption>
    </figure>
  );
}
