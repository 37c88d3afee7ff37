// The pH optimum, the highest activity and the half-activity window (the pH range where the
// fitted activity is at least half its maximum) of a fitted curve.
// Bell: analytic (SCIENCE.md §1.2). One limb: the window is open on the side of the plateau and
// bounded at the pKa (v = V/2 at pH = pKa). Other models: numerically on the fitted curve.

import { bellHalfWidth, bellPeak } from './models/bell';
import { pow10, valueAt, type PhModel } from './models/types';
import { crossing, numericOptimum } from './optimum';

export interface CurveShape {
  pHopt: number | null;
  peak: number | null;
  /** null ends are open */
  lo: number | null;
  hi: number | null;
}

/** How far beyond the fitted pKa values the numeric search looks. */
const SEARCH_MARGIN = 6;

/**
 * Shape of the fitted curve. `determined[j]` is false for parameters the data do not fix (their
 * θ then holds an effectively infinite pKa, which the formulas below handle as a limit).
 */
export function curveShape(
  model: PhModel,
  theta: ArrayLike<number>,
  determined: readonly boolean[],
): CurveShape {
  const open: CurveShape = { pHopt: null, peak: null, lo: null, hi: null };
  const m = model.nLinear;
  const pKaKnown = determined.slice(m).every(Boolean);
  if (model.id === 'bell' && pKaKnown) {
    const delta = theta[2] - theta[1];
    const center = (theta[1] + theta[2]) / 2;
    const half = bellHalfWidth(delta);
    return { pHopt: center, peak: bellPeak(theta[0], delta), lo: center - half, hi: center + half };
  }
  if (!determined.slice(0, m).some(Boolean)) return open;
  const rising = model.id === 'acid' || (model.id === 'bell' && determined[1] && !determined[2]);
  const falling = model.id === 'base' || (model.id === 'bell' && !determined[1] && determined[2]);
  if (rising) return { ...open, lo: theta[1] };
  if (falling) return { ...open, hi: model.id === 'base' ? theta[1] : theta[2] };
  if (model.id === 'bell') return open;
  // bell-plateau and three ionizations: on the fitted curve, over the span of the fitted pKa values
  const pKas: number[] = [];
  for (let j = m; j < model.names.length; j++) if (determined[j]) pKas.push(theta[j]);
  if (pKas.length === 0) return open;
  const from = Math.min(...pKas) - SEARCH_MARGIN;
  const to = Math.max(...pKas) + SEARCH_MARGIN;
  const f = (pH: number): number => valueAt(model, theta, pH);
  const opt = pKaKnown ? model.optimum(theta) : numericOptimum(f, from, to, 120);
  if (opt === null || !Number.isFinite(opt)) return open;
  const peak = f(opt);
  if (!(peak > 0)) return { ...open, pHopt: opt, peak };
  const half = peak / 2;
  const lo = f(from) >= half ? null : crossing(f, opt, from, half);
  const hi = f(to) >= half ? null : crossing(f, opt, to, half);
  return { pHopt: opt, peak, lo, hi };
}

export type ShapeKey = 'pHopt' | 'peak' | 'lo' | 'hi' | 'width';
export const SHAPE_KEYS: readonly ShapeKey[] = ['pHopt', 'peak', 'lo', 'hi', 'width'];

function shapeValue(s: CurveShape, key: ShapeKey): number | null {
  if (key === 'width') return s.lo !== null && s.hi !== null ? s.hi - s.lo : null;
  return s[key];
}

/**
 * Gradients of the optimum, peak and window ends with respect to the parameters (for the delta
 * method). Bell: analytic. With hw(Δ) = log10 x, x = (S + √(S² − 4))/2, S = 10^(Δ/2) + 4:
 *   hw′(Δ) = (1 + S/√(S² − 4))·10^(Δ/2)/(4x);  lo, hi = (pKa1 + pKa2)/2 ∓ hw(Δ);
 *   peak = V/(1 + 2c), c = 10^(−Δ/2): ∂peak/∂V = 1/(1 + 2c), ∂peak/∂Δ = V·c·ln10/(1 + 2c)².
 * Other models: central differences over the free parameters.
 */
export function shapeGradients(
  model: PhModel,
  theta: ArrayLike<number>,
  determined: readonly boolean[],
  free: readonly number[],
): Record<ShapeKey, number[] | null> {
  const p = model.names.length;
  const out = {} as Record<ShapeKey, number[] | null>;
  if (model.id === 'bell' && determined[1] && determined[2]) {
    const delta = theta[2] - theta[1];
    const up = pow10(delta / 2);
    const S = up + 4;
    const root = Math.sqrt(S * S - 4);
    const x = (S + root) / 2;
    const hw1 = ((1 + S / root) * up) / (4 * x);
    const c = 1 / up;
    const dPeak = (theta[0] * c * Math.LN10) / ((1 + 2 * c) * (1 + 2 * c));
    out.pHopt = [0, 0.5, 0.5];
    out.peak = [1 / (1 + 2 * c), -dPeak, dPeak];
    out.lo = [0, 0.5 + hw1, 0.5 - hw1];
    out.hi = [0, 0.5 - hw1, 0.5 + hw1];
    out.width = [0, -2 * hw1, 2 * hw1];
    return out;
  }
  const base = curveShape(model, theta, determined);
  const t = Float64Array.from(theta);
  for (const key of SHAPE_KEYS)
    out[key] = shapeValue(base, key) === null ? null : new Array<number>(p).fill(0);
  for (const j of free) {
    const h = 6e-6 * Math.max(Math.abs(theta[j]), 1);
    t[j] = theta[j] + h;
    const up = curveShape(model, t, determined);
    t[j] = theta[j] - h;
    const down = curveShape(model, t, determined);
    t[j] = theta[j];
    for (const key of SHAPE_KEYS) {
      const g = out[key];
      if (!g) continue;
      const a = shapeValue(up, key);
      const b = shapeValue(down, key);
      if (a === null || b === null) out[key] = null;
      else g[j] = (a - b) / (2 * h);
    }
  }
  return out;
}
