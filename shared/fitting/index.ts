/**
 * Bellwether's fitting engine: activity-against-pH models fitted by Levenberg–Marquardt, with
 * honest uncertainty. Pure TypeScript, no I/O; every result is plain JSON (numbers finite or
 * null). Bad input never throws: each entry point returns
 * `{ ok: true, value } | { ok: false, error: { code, message } }`.
 *
 *   fitProfile({ pH, v, w? }, { model?: 'bell' | … | 'auto', profile?, bootstrap?, seed?, alternative? })
 *       → ProfileFit: parameters (value, se, ci95, profile95, boot95, status), pHopt, peak, Δ,
 *         half-activity window, covariance, correlation, residuals, runs test, flags, and the
 *         simpler model offered when a pKa is not determined (`alternative`).
 *   chooseModel({ pH, v, w? }, { candidates?, alpha? })
 *       → ModelChoice: the simplest adequate model by nested F-tests, AICc table, its fit.
 *   fitGlobal([{ id, pH, v, w? }, ...], { model?, shared: ['pKa1'] })
 *       → GlobalFit: shared and per-profile parameters, shared-vs-separate F-test and AICc.
 *   curveWithBand(fit, { from?, to?, points? }) → CurveBand: curve and 95 % band on a pH grid.
 *   evaluateModel(model, parameters, pH[]) → activities.
 *   fitCurve({ x, y, w? }, { names, f, gradient? }, { start, lower?, upper?, probe? })
 *       → CurveFit: any model (NIST StRD problems, Michaelis–Menten, standard curves).
 *
 * Models ('acid', 'base', 'bell', 'bell-plateau', 'three') and their equations: models/*.ts and
 * SCIENCE.md §1. Weights are 1/σ². Standard errors: cov = s²(JᵀWJ)⁻¹, s² = SSR/(n − p).
 * A pKa more than 2 units beyond the measured pH range is never reported: it is null with
 * status 'not_determined', and the fit is the simpler model it tends to.
 *
 * Flag codes (stable): `<parameter>_not_determined` (e.g. pKa2_not_determined),
 * `<pKa>_outside_range` (e.g. pKa1_outside_range; pKa_outside_range for one-limb models),
 * `pKa_too_close`, `narrow_bell`, `too_few_points`, `not_converged`, `residual_runs`,
 * `V_lo_extrapolated`, `V_hi_extrapolated`; fitCurve adds `stalled_start`.
 */

import { chooseModel as chooseModelRaw } from './choose-model';
import { fitCurve as fitCurveRaw } from './fit-curve';
import { fitProfile as fitProfileRaw } from './fit-profile';
import { fitGlobal as fitGlobalRaw } from './global';
import { curveWithBand as curveWithBandRaw, evaluateModel as evaluateModelRaw } from './curve';
import { guarded, ok } from './result';

export { ENGINE_VERSION } from './version';
export { NO_START_MESSAGE } from './fit-profile';
export { MODEL_IDS } from './models';
export type { ModelId } from './models';
export type { Result, FitError, FitErrorCode } from './result';
export type * from './types';
export type { FitOptions } from './fit-profile';
export type { ProfileInput } from './ph-data';
export type { ModelChoice } from './choose-model';
export type { GlobalFit, GlobalDataset, GlobalInput } from './global';
export type { CurveBand } from './curve';
export type { CurveFit, CurveData, CurveFitOptions, StartReport } from './fit-curve';
export type { CurveModel } from './curve-problem';
export { studentTQuantile, studentTCdf, fUpperTail } from './stats/distributions';
export { runsTest } from './stats/runs-test';
export { mulberry32 } from './prng';

export const fitProfile: typeof fitProfileRaw = (input, options = {}) =>
  guarded(() => {
    if (options?.model !== 'auto') return fitProfileRaw(input, options);
    // 'auto': the proposed model's fit, with how it was chosen in `selection`
    const { model: _auto, ...rest } = options;
    const choice = chooseModelRaw(input, rest);
    return choice.ok ? ok(choice.value.fit) : choice;
  });
export const chooseModel: typeof chooseModelRaw = (input, options) =>
  guarded(() => chooseModelRaw(input, options));
export const fitGlobal: typeof fitGlobalRaw = (inputs, options) =>
  guarded(() => fitGlobalRaw(inputs, options));
export const curveWithBand: typeof curveWithBandRaw = (fit, grid) =>
  guarded(() => curveWithBandRaw(fit, grid));
export const evaluateModel: typeof evaluateModelRaw = (model, parameters, pH) =>
  guarded(() => evaluateModelRaw(model, parameters, pH));
export const fitCurve: typeof fitCurveRaw = (data, model, options) =>
  guarded(() => fitCurveRaw(data, model, options));
