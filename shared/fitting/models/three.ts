// Three ionizations, two protons lost on the acid side and one on the alkaline side
// (SCIENCE.md §1.4):
//   v = V / (1 + 10^(pKb − pH) + 10^(pKa + pKb − 2·pH) + 10^(pH − pKc))
//   with u = 10^(pKb − pH), q = 10^(pKa + pKb − 2pH), c = 10^(pH − pKc), D = 1 + u + q + c:
//   ∂v/∂V = 1/D, ∂v/∂pKa = −V·q·ln10/D², ∂v/∂pKb = −V·(u + q)·ln10/D², ∂v/∂pKc = V·c·ln10/D².
// Optimum [derived]: with t = 10^pH, dD/dt = 0 gives t³ − BC·t − 2ABC = 0 (A, B, C = 10^pKa,
// 10^pKb, 10^pKc); t = √(BC)·s turns it into s³ − s − k = 0 with k = 2·10^(pKa − (pKb + pKc)/2),
// whose single root s > 1 has a closed form (Cardano, or the trigonometric form when k² < 4/27).

import { LN10, pow10, type PhModel } from './types';

/** The positive root of s³ − s − k = 0 (k ≥ 0). */
export function depressedCubicRoot(k: number): number {
  const disc = (k * k) / 4 - 1 / 27;
  if (disc < 0) return (2 / Math.sqrt(3)) * Math.cos(Math.acos(((3 * Math.sqrt(3)) / 2) * k) / 3);
  const sq = Math.sqrt(disc);
  return Math.cbrt(k / 2 + sq) + Math.cbrt(k / 2 - sq);
}

export const threeModel: PhModel = {
  id: 'three',
  names: ['V', 'pKa', 'pKb', 'pKc'],
  nLinear: 1,
  runaway: {
    1: { side: -1, levels: [] },
    2: { side: -1, levels: [], pKas: [1] },
    3: { side: 1, levels: [] },
  },
  constants(theta, k) {
    k[0] = pow10(theta[2]);
    k[1] = pow10(theta[1] + theta[2]);
    k[2] = pow10(-theta[3]);
  },
  point(theta, k, h, g, grad) {
    const u = k[0] * h;
    const q = k[1] * h * h;
    const c = k[2] * g;
    const D = 1 + u + q + c;
    const f = theta[0] / D;
    if (grad) {
      const z = (f * LN10) / D;
      grad[0] = 1 / D;
      grad[1] = -z * q;
      grad[2] = -z * (u + q);
      grad[3] = z * c;
    }
    return f;
  },
  basis(k, h, g, out) {
    out[0] = 1 / (1 + k[0] * h + k[1] * h * h + k[2] * g);
  },
  optimum(theta) {
    const k = 2 * pow10(theta[1] - (theta[2] + theta[3]) / 2);
    return (theta[2] + theta[3]) / 2 + Math.log10(depressedCubicRoot(k));
  },
};
