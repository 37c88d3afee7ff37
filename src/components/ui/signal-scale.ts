// A sequential colour scale for measured signal (absorbance, fluorescence, rates): pale to dark
// slate, so that more signal reads as darker. It is kept apart from the pH scale (ph-scale.ts):
// nearly one hue (250° → 285° in OKLCH) with lightness falling 0.97 → 0.30, so heat maps never
// look like pH. Lightness carries the order, which also survives grey-scale printing.
import { oklchToHex } from './ph-scale';

const STEPS = 64;
const ramp: string[] = Array.from({ length: STEPS + 1 }, (_, k) => {
  const t = k / STEPS;
  return oklchToHex(
    0.97 - 0.67 * t,
    0.015 + 0.11 * Math.sin(Math.PI * Math.min(1, t * 1.1) * 0.5),
    250 + 35 * t,
  );
});

/** Colour of `t` in 0…1 (clamped). */
export function signalColor(t: number): string {
  const x = Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0;
  return ramp[Math.round(x * STEPS)];
}

/** Ink readable on a signal colour. */
export const inkOnSignal = (t: number) => (t > 0.55 ? '#ffffff' : '#1b2224');

/** A domain for the values: robust ends (2nd and 98th percentiles) when there are many. */
export function signalDomain(values: (number | null | undefined)[]): [number, number] {
  const finite = values
    .filter((v): v is number => typeof v === 'number' && Number.isFinite(v))
    .sort((a, b) => a - b);
  if (finite.length === 0) return [0, 1];
  const at = (q: number) =>
    finite[Math.min(finite.length - 1, Math.max(0, Math.round(q * (finite.length - 1))))];
  const [lo, hi] = finite.length >= 50 ? [at(0.02), at(0.98)] : [finite[0], finite[finite.length - 1]];
  return hi > lo ? [lo, hi] : [lo - 0.5, lo + 0.5];
}

export function signalGradient(steps = 16): { offset: number; color: string }[] {
  return Array.from({ length: steps + 1 }, (_, k) => ({ offset: k / steps, color: signalColor(k / steps) }));
}
