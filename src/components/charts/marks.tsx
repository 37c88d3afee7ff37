// Small SVG marks the scientific charts share: error bars, interval bars along x, and the curve path
// with gaps where the curve has no value.
import { chartTheme } from '@/components/ui/charts/chart-theme';
import type { LinearScale } from '@/components/ui/charts/chart-frame';
import type { ChartInterval } from './types';

/** An SVG path through (x, y) pairs, broken where y is null or not finite. */
export function pathThrough(
  xs: readonly number[],
  ys: readonly (number | null)[],
  x: LinearScale,
  y: LinearScale,
) {
  let d = '';
  let pen = false;
  xs.forEach((xv, i) => {
    const yv = ys[i];
    if (yv === null || yv === undefined || !Number.isFinite(yv) || !Number.isFinite(xv)) {
      pen = false;
      return;
    }
    d += `${pen ? 'L' : 'M'}${x(xv).toFixed(2)},${y(yv).toFixed(2)}`;
    pen = true;
  });
  return d;
}

/** A closed path between a lower and an upper line (a confidence band), one piece per unbroken run. */
export function bandPath(
  xs: readonly number[],
  lower: readonly (number | null)[],
  upper: readonly (number | null)[],
  x: LinearScale,
  y: LinearScale,
) {
  const pieces: string[] = [];
  let run: number[] = [];
  const close = () => {
    if (run.length > 1) {
      const top = run.map((i, k) => `${k ? 'L' : 'M'}${x(xs[i]).toFixed(2)},${y(upper[i]!).toFixed(2)}`);
      const bottom = [...run].reverse().map((i) => `L${x(xs[i]).toFixed(2)},${y(lower[i]!).toFixed(2)}`);
      pieces.push(`${top.join('')}${bottom.join('')}Z`);
    }
    run = [];
  };
  xs.forEach((_, i) => {
    const lo = lower[i];
    const hi = upper[i];
    if (lo === null || hi === null || !Number.isFinite(lo) || !Number.isFinite(hi)) close();
    else run.push(i);
  });
  close();
  return pieces.join('');
}

export type ErrorBarProps = { cx: number; top: number; bottom: number; color: string };

/** A vertical error bar with short caps (mean ± SD). */
export function ErrorBar({ cx, top, bottom, color }: ErrorBarProps) {
  return (
    <g stroke={color} strokeWidth={1.2}>
      <line x1={cx} x2={cx} y1={top} y2={bottom} />
      <line x1={cx - 3} x2={cx + 3} y1={top} y2={top} />
      <line x1={cx - 3} x2={cx + 3} y1={bottom} y2={bottom} />
    </g>
  );
}

export type IntervalBarProps = {
  interval: ChartInterval;
  x: LinearScale;
  at: number;
  width: number;
  color?: string;
};

/** A horizontal interval along x at height `at`; an open end runs to the plot edge with an arrow. */
export function IntervalBar({ interval, x, at, width, color = chartTheme.inkMuted }: IntervalBarProps) {
  const [lo, hi] = interval;
  const x0 = lo === null ? 0 : x(lo);
  const x1 = hi === null ? width : x(hi);
  return (
    <g stroke={color} strokeWidth={1.5} fill="none">
      <line x1={x0} x2={x1} y1={at} y2={at} />
      {lo === null ? (
        <path d={`M${x0 + 5},${at - 3} L${x0},${at} L${x0 + 5},${at + 3}`} />
      ) : (
        <line x1={x0} x2={x0} y1={at - 3.5} y2={at + 3.5} />
      )}
      {hi === null ? (
        <path d={`M${x1 - 5},${at - 3} L${x1},${at} L${x1 - 5},${at + 3}`} />
      ) : (
        <line x1={x1} x2={x1} y1={at - 3.5} y2={at + 3.5} />
      )}
    </g>
  );
}

/** Lowest and highest finite value, padded; a fallback when there is none. */
export function extent(
  values: Iterable<number | null | undefined>,
  pad = 0.06,
  fallback: [number, number] = [0, 1],
) {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v === null || v === undefined || !Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (lo === Infinity) return fallback;
  if (lo === hi) return [lo - 1, hi + 1] as [number, number];
  const span = hi - lo;
  return [lo - pad * span, hi + pad * span] as [number, number];
}
