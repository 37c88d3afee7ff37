import { describe, expect, it } from 'vitest';
import { curveProblem } from '@shared/fitting/curve-problem';
import { levenbergMarquardt } from '@shared/fitting/lm';

// Small invented problems (common practice, no source): an exponential decay with fixed noise.
const x = [1, 2, 3, 4, 5, 6];
const noise = [0.01, -0.02, 0.015, -0.01, 0.02, -0.005];
const yExp = x.map((xx, i) => 5 * Math.exp(-0.3 * xx) + noise[i]);
const ones = new Float64Array(6).fill(1);
const problem = (f: (x: number, b: ArrayLike<number>) => number, y = yExp) =>
  curveProblem(x, y, ones, 2, { f });
const decay = (xx: number, b: ArrayLike<number>) => b[0] * Math.exp(-b[1] * xx);

describe('Levenberg–Marquardt gives a reason for every stop', () => {
  it('converged-step, converged-gradient and converged-ssr each end a fit when that rule fires first', () => {
    expect(levenbergMarquardt(problem(decay), [1, 1], { xtol: 1e-4, ftol: 0, gtol: 0 }).stop).toBe(
      'converged-step',
    );
    expect(levenbergMarquardt(problem(decay), [1, 1], { xtol: 0, ftol: 0, gtol: 1e-3 }).stop).toBe(
      'converged-gradient',
    );
    expect(levenbergMarquardt(problem(decay), [1, 1], { xtol: 0, ftol: 1e-6, gtol: 0 }).stop).toBe(
      'converged-ssr',
    );
  });
  it('max-iterations when the limit is reached first', () => {
    const r = levenbergMarquardt(problem(decay), [1, 1], { maxIterations: 1 });
    expect(r.stop).toBe('max-iterations');
    expect(r.converged).toBe(false);
  });
  it('non-finite when the model cannot be evaluated at the start', () => {
    const r = levenbergMarquardt(
      problem((xx, b) => Math.log(b[0]) * xx),
      [-1, 1],
    );
    expect(r.stop).toBe('non-finite');
    expect(r.converged).toBe(false);
  });
  it('singular when a parameter has no influence on the model', () => {
    const r = levenbergMarquardt(
      problem((_, b) => b[0] + 0 * b[1]),
      [1, 1],
    );
    expect(r.stop).toBe('singular');
    expect(r.converged).toBe(false);
  });
  it('all defaults converge to the least-squares point (gradient zero)', () => {
    const r = levenbergMarquardt(problem(decay), [1, 1]);
    expect(r.converged).toBe(true);
    const h = 1e-7;
    const ssrAt = (b: number[]) => yExp.reduce((s, yy, i) => s + (yy - decay(x[i], b)) ** 2, 0);
    for (const j of [0, 1]) {
      const up = Array.from(r.theta);
      const down = Array.from(r.theta);
      up[j] += h;
      down[j] -= h;
      expect(Math.abs(ssrAt(up) - ssrAt(down)) / (2 * h)).toBeLessThan(1e-6);
    }
  });
});

describe('bounds', () => {
  it('keeps a parameter inside its box and reports it held there', () => {
    const r = levenbergMarquardt(problem(decay), [1, 0.1], { upper: [4, 10] });
    expect(r.theta[0]).toBe(4);
    expect(r.atBound).toEqual([1, 0]);
    expect(r.converged).toBe(true);
  });
  it('clamps a start outside the box into it', () => {
    const r = levenbergMarquardt(problem(decay), [10, 0.3], { lower: [0, 0], upper: [6, 1] });
    expect(r.theta[0]).toBeLessThanOrEqual(6);
    expect(r.theta[0]).toBeCloseTo(5, 0);
  });
});
