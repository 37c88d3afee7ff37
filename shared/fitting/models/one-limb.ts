// One ionization (SCIENCE.md §1.1).
//   rising (acid) limb, deprotonated form active:  v = V / (1 + 10^(pKa − pH))
//   falling (base) limb, protonated form active:   v = V / (1 + 10^(pH − pKa))
//   ∂v/∂V = 1/D, ∂v/∂pKa = ∓v·x·ln10/D with x the power term and D = 1 + x.
// Neither has an interior optimum: activity approaches V beyond the pKa.

import { LN10, pow10, type PhModel } from './types';

export const acidModel: PhModel = {
  id: 'acid',
  names: ['V', 'pKa'],
  nLinear: 1,
  runaway: { 1: { side: -1, levels: [] } },
  constants(theta, k) {
    k[0] = pow10(theta[1]);
  },
  point(theta, k, h, _g, grad) {
    const a = k[0] * h;
    const D = 1 + a;
    const f = theta[0] / D;
    if (grad) {
      grad[0] = 1 / D;
      grad[1] = (-f * a * LN10) / D;
    }
    return f;
  },
  basis(k, h, _g, out) {
    out[0] = 1 / (1 + k[0] * h);
  },
  optimum: () => null,
};

export const baseModel: PhModel = {
  id: 'base',
  names: ['V', 'pKa'],
  nLinear: 1,
  runaway: { 1: { side: 1, levels: [] } },
  constants(theta, k) {
    k[0] = pow10(-theta[1]);
  },
  point(theta, k, _h, g, grad) {
    const b = k[0] * g;
    const D = 1 + b;
    const f = theta[0] / D;
    if (grad) {
      grad[0] = 1 / D;
      grad[1] = (f * b * LN10) / D;
    }
    return f;
  },
  basis(k, _h, g, out) {
    out[0] = 1 / (1 + k[0] * g);
  },
  optimum: () => null,
};
