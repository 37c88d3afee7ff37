/**
 * shared/stats — general statistics helpers used by the science core (pure, no I/O):
 *   fitLine(x, y, from?, to?)      straight-line OLS with SEs, covariance, residual SD, R² (NIST Norris checked)
 *   fitQuadratic(x, y, from?, to?) parabola OLS with SEs and the t of its quadratic term (NIST Pontius checked)
 *   studentTCdf(t, ν) · studentTTwoSidedP(t, ν) · studentTQuantile(p, ν) · regularizedIncompleteBeta(x, a, b)
 *   welchTTest(a, b)               Welch's unequal-variance t test
 *   NORMAL_QUARTILE                Φ⁻¹(¾), for MAD scaling
 * They return null where a value is not determined; callers turn that into flags or errors.
 */
export * from './linear-regression';
export * from './t-distribution';
export * from './welch';
