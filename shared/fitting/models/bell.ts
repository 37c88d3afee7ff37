// Two ionizations, only EH active (SCIENCE.md §1.2; Michaelis' pH function):
//   v = V / (1 + 10^(pKa1 − pH) + 10^(pH − pKa2))
//   ∂v/∂V = 1/D,  ∂v/∂pKa1 = −V·a·ln10/D²,  ∂v/∂pKa2 = V·b·ln10/D²
//   with a = 10^(pKa1 − pH), b = 10^(pH − pKa2), D = 1 + a + b.
// Optimum pHopt = (pKa1 + pKa2)/2 exactly.

import { LN10, pow10, type PhModel } from './types';

export const bellModel: PhModel = {
  id: 'bell',
  names: ['V', 'pKa1', 'pKa2'],
  nLinear: 1,
  runaway: { 1: { side: -1, levels: [] }, 2: { side: 1, levels: [] } },
  constants(theta, k) {
    k[0] = pow10(theta[1]);
    k[1] = pow10(-theta[2]);
  },
  point(theta, k, h, g, grad) {
    const a = k[0] * h;
    const b = k[1] * g;
    const D = 1 + a + b;
    const f = theta[0] / D;
    if (grad) {
      const q = (f * LN10) / D;
      grad[0] = 1 / D;
      grad[1] = -q * a;
      grad[2] = q * b;
    }
    return f;
  },
  basis(k, h, g, out) {
    out[0] = 1 / (1 + k[0] * h + k[1] * g);
  },
  optimum: (theta) => (theta[1] + theta[2]) / 2,
};

/**
 * Half-width of the bell at half of its highest value (SCIENCE.md §1.2):
 * 10^(w/2) + 10^(−w/2) = 10^(Δ/2) + 4, so with S = 10^(Δ/2) + 4, 10^(w/2) = (S + √(S² − 4))/2.
 */
export function bellHalfWidth(delta: number): number {
  const S = pow10(delta / 2) + 4;
  return Math.log10((S + Math.sqrt(S * S - 4)) / 2);
}

/** Highest value of the bell: V / (1 + 2·10^(−Δ/2)) (SCIENCE.md §1.2). */
export function bellPeak(V: number, delta: number): number {
  return V / (1 + 2 * pow10(-delta / 2));
}
