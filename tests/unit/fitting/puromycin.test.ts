import { describe, expect, it } from 'vitest';
import { fitCurve } from '@shared/fitting';
import { readReference } from './helpers/reference';

// Puromycin (Bates & Watts 1988, App. A1.3; Treloar 1974): tests/fixtures/reference/puromycin.json.
const puromycin = readReference<{
  treated: { conc: number[]; rate: number[] };
  untreated: { conc: number[]; rate: number[] };
}>('puromycin.json');

// Michaelis–Menten v = Vm·S/(K + S), with its analytic gradient
const michaelisMenten = {
  names: ['Vm', 'K'],
  f: (s: number, b: ArrayLike<number>) => (b[0] * s) / (b[1] + s),
  gradient: (s: number, b: ArrayLike<number>, out: Float64Array) => {
    out[0] = s / (b[1] + s);
    out[1] = (-b[0] * s) / (b[1] + s) ** 2;
  },
};

describe('Puromycin, Michaelis–Menten (SCIENCE.md §4)', () => {
  it('treated: Vm = 212.68 (SE 6.947), K = 0.06412 (SE 0.008281) [derived, agrees with R nls]', () => {
    const { conc, rate } = puromycin.treated;
    for (const model of [michaelisMenten, { names: michaelisMenten.names, f: michaelisMenten.f }]) {
      const fit = fitCurve({ x: conc, y: rate }, model, { start: [200, 0.1] });
      expect(fit.ok).toBe(true);
      if (!fit.ok) return;
      const { Vm, K } = fit.value.parameters;
      expect(Vm.value).toBeCloseTo(212.68, 2);
      expect(Vm.se).toBeCloseTo(6.947, 3);
      expect(K.value).toBeCloseTo(0.06412, 5);
      expect(K.se).toBeCloseTo(0.008281, 6);
      expect(fit.value.dof).toBe(10);
      // residual standard error 10.93 on 10 degrees of freedom (puromycin.json, scipy/R)
      expect(Math.sqrt(fit.value.s2 as number)).toBeCloseTo(10.934, 3);
    }
  });
  it('untreated: Vm = 160.28 (SE 6.480), K = 0.04771 (SE 0.007782) (puromycin.json, scipy and R)', () => {
    const { conc, rate } = puromycin.untreated;
    const fit = fitCurve({ x: conc, y: rate }, michaelisMenten, { start: [150, 0.1] });
    if (!fit.ok) throw new Error(fit.error.message);
    expect(fit.value.parameters.Vm.value).toBeCloseTo(160.28, 2);
    expect(fit.value.parameters.Vm.se).toBeCloseTo(6.4802, 3);
    expect(fit.value.parameters.K.value).toBeCloseTo(0.047708, 5);
    expect(fit.value.parameters.K.se).toBeCloseTo(0.007782, 6);
  });
});
