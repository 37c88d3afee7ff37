// Two ionizations with partially active states (SCIENCE.md §1.3):
//   v = (V_lo·a + V_mid + V_hi·b) / (1 + a + b),  a = 10^(pKa1 − pH), b = 10^(pH − pKa2)
//   ∂v/∂V_lo = a/D, ∂v/∂V_mid = 1/D, ∂v/∂V_hi = b/D,
//   ∂v/∂pKa1 = a·ln10·(V_lo − v)/D,  ∂v/∂pKa2 = b·ln10·(v − V_hi)/D.
// The optimum has no closed form: it is found numerically (see optimum.ts).

import { LN10, pow10, valueAt, type PhModel } from './types';
import { numericOptimum } from '../optimum';

export const bellPlateauModel: PhModel = {
  id: 'bell-plateau',
  names: ['V_lo', 'V_mid', 'V_hi', 'pKa1', 'pKa2'],
  nLinear: 3,
  runaway: { 3: { side: -1, levels: [0] }, 4: { side: 1, levels: [2] } },
  constants(theta, k) {
    k[0] = pow10(theta[3]);
    k[1] = pow10(-theta[4]);
  },
  point(theta, k, h, g, grad) {
    const a = k[0] * h;
    const b = k[1] * g;
    const D = 1 + a + b;
    const f = (theta[0] * a + theta[1] + theta[2] * b) / D;
    if (grad) {
      grad[0] = a / D;
      grad[1] = 1 / D;
      grad[2] = b / D;
      grad[3] = (a * LN10 * (theta[0] - f)) / D;
      grad[4] = (b * LN10 * (f - theta[2])) / D;
    }
    return f;
  },
  basis(k, h, g, out) {
    const a = k[0] * h;
    const b = k[1] * g;
    const D = 1 + a + b;
    out[0] = a / D;
    out[1] = 1 / D;
    out[2] = b / D;
  },
  optimum(theta) {
    return numericOptimum((pH) => valueAt(bellPlateauModel, theta, pH), theta[3] - 3, theta[4] + 3);
  },
};
