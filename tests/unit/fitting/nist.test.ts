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
        expect(fit.value.starts).toHaveLength(1);
        problem.certified.forEach((c, j) => {
          expect(lre(c, fit.value.parameters[names[j]].value as number)).toBeGreaterThanOrEqual(6);
          // certified standard deviations, cov = s²(JᵀJ)⁻¹ (SCIENCE.md §4)
          expect(
            lre(problem.certifiedSD[j], fit.value.parameters[names[j]].se as number),
          ).toBeGreaterThanOrEqual(6);
        });
        expect(lre(problem.certifiedRSS, fit.value.ssr as number)).toBeGreaterThanOrEqual(9);
      });
    }
  }
});

describe('a start that stalls on a plateau is detected by comparing starts', () => {
  // NIST StRD BoxBOD [memory: data, starts and certified values of BoxBOD.dat, not among the copied
  // files]: y = b1(1 − exp(−b2·x)); from start 1 (1, 1) a solver can stop on a plateau with
  // RSS 9771.5 (reference README: scipy does, and reports success); certified RSS 1168.0088766.
  const x = [1, 2, 3, 5, 7, 10];
  const y = [109, 149, 149, 191, 213, 224];
  const model = {
    names: ['b1', 'b2'],
    f: (xx: number, b: ArrayLike<number>) => b[0] * (1 - Math.exp(-b[1] * xx)),
  };
  it('from start 1 alone the run is reported as singular, not as converged', () => {
    const fit = fitCurve({ x, y }, model, { start: [1, 1], probe: false });
    if (!fit.ok) throw new Error(fit.error.message);
    expect(fit.value.converged).toBe(false);
    expect(fit.value.stop).toBe('singular');
    expect(fit.value.flags.map((f) => f.code)).toContain('not_converged');
  });
  it('with both NIST starts the best run reaches the certified minimum and the stalled start is flagged', () => {
    const fit = fitCurve({ x, y }, model, {
      start: [
        [1, 1],
        [100, 0.75],
      ],
    });
    if (!fit.ok) throw new Error(fit.error.message);
    expect(lre(213.80940889, fit.value.parameters.b1.value as number)).toBeGreaterThanOrEqual(6);
    expect(lre(0.54723748542, fit.value.parameters.b2.value as number)).toBeGreaterThanOrEqual(6);
    expect(lre(1168.0088766, fit.value.ssr as number)).toBeGreaterThanOrEqual(6);
    expect(fit.value.flags.map((f) => f.code)).toContain('stalled_start');
  });
  it('from start 1 with the default restarts, scaled copies of the start find the minimum', () => {
    const fit = fitCurve({ x, y }, model, { start: [1, 1] });
    if (!fit.ok) throw new Error(fit.error.message);
    expect(fit.value.converged).toBe(true);
    expect(lre(1168.0088766, fit.value.ssr as number)).toBeGreaterThanOrEqual(6);
  });
});
