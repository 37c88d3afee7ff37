/**
 * shared/analysis — a study's plate reads turned into activity-against-pH profiles with fits and
 * plate QC. Pure functions, no I/O; results are plain JSON (numbers finite or null).
 *
 *   analyseStudy(input: AnalysisInput): Result<AnalysisResult>
 *       wells (signal, window, blank, corrected, rate, activity, flags, exclusion, outlier),
 *       blanks, standard curves, profiles (points, fit data, model selection, fit, curve with band,
 *       relative activity), qc per plate (Z′, CVs, outliers, blank drift, trends, overlap points,
 *       map checks), units, notes, flag sentences.
 *   bootstrapProfiles(result, input, { resamples = 1000, seed = 1, onProgress }): Result<AnalysisResult>
 *       the same result with bootstrap intervals of the optimum, window and parameters per profile.
 *   bootstrapProfile(profile, { resamples = 1000, seed = 1 }): Result<VariantProfile>
 *       one profile's bootstrap (seed + i for the i-th profile reproduces bootstrapProfiles).
 *   resolveWindow(settings, plateId, well, variantId) — which rate window applies to a well.
 *   planUnits(input, hasStandardCurve) — the units rule (units.ts).
 *   flagText(code) · ANALYSIS_FLAG_TEXT · CV_LIMIT_PERCENT · OVERLAP_ALPHA · Z_PRIME_RULE · ANALYSIS_VERSION
 * Every entry point returns { ok: true, value } | { ok: false, error: { code, message } }.
 */
export { analyseStudy, ANALYSIS_VERSION } from './analyse';
export { bootstrapProfile, bootstrapProfiles } from './bootstrap';
export { ANALYSIS_FLAG_TEXT, flagText, type AnalysisFlag } from './flags';
export { OVERLAP_ALPHA } from './overlaps';
export { CV_LIMIT_PERCENT } from './qc';
export { Z_PRIME_RULE } from './z-prime';
export type { AnalysisError, AnalysisErrorCode, Result } from './result';
export { resolveWindow } from './signals';
export { planUnits, type UnitPlan } from './units';
export type * from './types';
