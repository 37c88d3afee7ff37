import { linearRegression } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { fitLine, fitQuadratic } from '@shared/stats/linear-regression';
import norris from '../../fixtures/plate/nist-norris.json';
import pontius from '../../fixtures/plate/nist-pontius.json';

/** Log relative error (McCullough 1998, Am Stat 52:358 [memory]): the number of agreeing digits. */
function lre(value: number, certified: number): number {
  const rel = Math.abs((value - certified) / certified);
  return rel === 0 ? 15 : -Math.log10(rel);
}

describe('straight-line least squares against NIST StRD Norris (certified values, fixture nist-norris.json)', () => {
  const fit = fitLine(norris.x, norris.y)!;
  const c = norris.certified;

  it('reproduces the certified estimates to at least 11 digits', () => {
    expect(lre(fit.slope, c.B1)).toBeGreaterThanOrEqual(11);
    expect(lre(fit.intercept, c.B0)).toBeGreaterThanOrEqual(11);
  });

  it('reproduces the certified standard deviations, residual SD, R² and residual SS', () => {
    expect(lre(fit.slopeSe!, c.B1_sd)).toBeGreaterThanOrEqual(11);
    expect(lre(fit.interceptSe!, c.B0_sd)).toBeGreaterThanOrEqual(11);
    expect(lre(fit.residualSd!, c.residual_sd)).toBeGreaterThanOrEqual(11);
    expect(lre(fit.r2!, c.r_squared)).toBeGreaterThanOrEqual(11);
    expect(lre(fit.ssr, c.residual_ss)).toBeGreaterThanOrEqual(11);
    expect(fit.dof).toBe(c.residual_df);
  });

  it('agrees with simple-statistics linearRegression (a different algorithm: its own sums) on Norris', () => {
    const other = linearRegression(norris.x.map((x, i) => [x, norris.y[i]]));
    expect(fit.slope).toBeCloseTo(other.m, 10);
    expect(fit.intercept).toBeCloseTo(other.b, 9);
  });
});

describe('quadratic least squares against NIST StRD Pontius (certified values, fixture nist-pontius.json)', () => {
  const fit = fitQuadratic(pontius.x, pontius.y)!;
  const c = pontius.certified;

  it('reproduces the certified coefficients to at least 10 digits', () => {
    expect(lre(fit.coefficients[0], c.B0)).toBeGreaterThanOrEqual(10);
    expect(lre(fit.coefficients[1], c.B1)).toBeGreaterThanOrEqual(10);
    expect(lre(fit.coefficients[2], c.B2)).toBeGreaterThanOrEqual(10);
  });

  it('reproduces the certified standard deviations, residual SD, R² and residual SS', () => {
    expect(lre(fit.se![0], c.B0_sd)).toBeGreaterThanOrEqual(10);
    expect(lre(fit.se![1], c.B1_sd)).toBeGreaterThanOrEqual(10);
    expect(lre(fit.se![2], c.B2_sd)).toBeGreaterThanOrEqual(10);
    expect(lre(fit.residualSd!, c.residual_sd)).toBeGreaterThanOrEqual(10);
    expect(lre(fit.r2!, c.r_squared)).toBeGreaterThanOrEqual(10);
    expect(lre(fit.ssr, c.residual_ss)).toBeGreaterThanOrEqual(10);
  });

  it('gives the quadratic term t = B2/SD(B2) from the certified values', () => {
    expect(fit.tQuadratic!).toBeCloseTo(c.B2 / c.B2_sd, 8);
  });
});

describe('degenerate regressions return null instead of numbers', () => {
  it('needs two distinct x for a line and three for a parabola', () => {
    expect(fitLine([1], [2])).toBeNull();
    expect(fitLine([1, 1, 1], [1, 2, 3])).toBeNull();
    expect(fitQuadratic([1, 2, 1, 2], [1, 2, 3, 4])).toBeNull();
    expect(fitLine([0, 1, Number.NaN], [1, 2, 3])).toBeNull();
  });

  it('gives no standard errors without residual degrees of freedom', () => {
    const two = fitLine([0, 1], [1, 3])!;
    expect(two.slope).toBe(2);
    expect(two.slopeSe).toBeNull();
  });

  it('treats an exact line as having no curvature (t of the quadratic term is 0)', () => {
    const x = [0, 30, 60, 90, 120, 150, 180];
    expect(
      fitQuadratic(
        x,
        x.map((t) => 0.05 + 0.0013 * t),
      )!.tQuadratic,
    ).toBe(0);
  });
});
