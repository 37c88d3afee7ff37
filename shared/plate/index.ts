/**
 * shared/plate — the plate science of Bellwether: pure functions, no I/O (SCIENCE.md §3).
 *
 * Every function that can meet bad input returns PlateResult<T>:
 *   { ok: true, value } | { ok: false, error: { code, message } }
 * Errors are for input that cannot be analysed (wrong shapes, impossible options, no blank for a pH
 * point). Poor data (missing reads, too few points, saturation) gives a value whose numbers are null
 * and whose `flags` say why; PLATE_FLAG_TEXT has a sentence for each flag. Values are plain JSON:
 * never NaN or ±Infinity. Flags never remove data: excluding a point is a person's decision.
 *
 * Geometry (geometry.ts)
 *   plateDimensions(format) · wellName(format, row, column) · parseWell(text, format) ·
 *   wellIndex(well, format, order) · listWells(format, order) · isEdgeWell(well, format)
 * Kinetic reads (kinetics.ts, kinetic-window.ts states the automatic-window criterion)
 *   initialRate({ times, values }, { window?, lag?, minPoints?, linearRangeMax?, confidence?, curvatureAlpha? })
 *     → slope, slopeSe, intercept, r2, n, window, indices, firstSlopeInterval, curvatureT, flags
 *   initialRates(times, wells, options) → per-well results
 * End points and blanks (endpoint.ts, blank.ts)
 *   endpointValues(wells, { linearRangeMax? }) · blankStats(values) · correctForBlanks(samples, blanks)
 * Conversions (beer-lambert.ts, chromophore.ts, standard-curve.ts, specific-activity.ts)
 *   concentrationFromAbsorbance(A, { epsilon, pathLengthCm }) · rateFromAbsorbanceSlope(slope, {...}) ·
 *   pathLengthFromVolume({ volumeUl, wellDiameterMm | wellAreaMm2 }) ·
 *   absorbingFraction(pH, pKa, form) · effectiveExtinction(epsilon, pH, pKa, form) ·
 *   fitStandardCurve(points) · concentrationFromSignal(curve, signal, m) · rateFromSignalSlope(curve, slope, se) ·
 *   specificActivity({ rateMolarPerSecond, wellVolumeUl, enzymeVolumeUl, proteinMgPerMl, ... })
 * Plate statistics (replicates.ts, z-prime.ts, trends.ts, blank-drift.ts)
 *   replicateStats(values) · flagOutliers(values, threshold = 3.5) · zPrimeFactor(positive, negative) ·
 *   zPrimeBand(z) · plateTrends(values, format, { alpha?, minEffect? }) · centreByGroup(values, groupOf) ·
 *   blankDrift(points, alpha = 0.05)
 */
export * from './result';
export * from './flags';
export * from './geometry';
export * from './kinetics';
export { DEFAULT_LINEAR_RANGE_MAX, DEFAULT_MIN_POINTS } from './rate-options';
export * from './endpoint';
export * from './blank';
export * from './beer-lambert';
export * from './chromophore';
export * from './standard-curve';
export * from './specific-activity';
export * from './replicates';
export * from './z-prime';
export * from './trends';
export * from './blank-drift';
