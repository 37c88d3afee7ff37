import { describe, expect, it } from 'vitest';
import { fitCurve } from '@shared/fitting';
import { lre, NIST_NAMES, readNist } from './helpers/nist';

// NIST StRD nonlinear regression (NIST ITL, public domain; files unchanged in tests/fixtures/nist).
// Bellwether's aim (SCIENCE.md §4): log relative error ≥ 6 for the certified parameters from both
// NIST starting points, with the generic model fitted by central-difference Jacobians.
describe('NIST StRD nonlinear regression, both starting points', () => {
  for (const name of NIST_NAMES) {
    const problem = readNist(name);
    const names = problem.certified.map((_, j) => `b${j + 1}`);
    for (const [label, start] of [
      ['start 1', problem.start1],
      ['start 2', problem.start2],
    ] as const) {
      it(`${name} from ${label} reaches the certified values (NIST ${name}.dat)`, () => {
        // probe: false — the solver alone, from this start, with no extra starts to help it
        const fit = fitCurve(
          { x: problem.x, y: problem.y },
          { names, f: problem.f },
          { start, probe: false },
        );
        expect(fit.ok).toBe(true);
        if (!fit.ok) return;
        expect(fit.value.converged).toBe(true);
        problem.certified.forEach((c, j) => {
          expect(lre(c, fit.value.parameters[names[j]].value as number)).toBeGreaterThanOrEqual(6);
          expect(
            lre(problem.certifiedSD[j], fit.value.parameters[names[j]].se as number),
          ).toBeGreaterThanOrEqual(4);
        });
        expect(lre(problem.certifiedRSS, fit.value.ssr as number)).toBeGreaterThanOrEqual(9);
      });
    }
  }
});
