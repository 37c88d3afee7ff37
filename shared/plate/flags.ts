/**
 * Every flag shared/plate can raise, with the sentence the interface shows for it.
 * Flags inform; none of them removes data (excluding a point is a person's decision).
 */

export const PLATE_FLAG_TEXT = {
  // kinetic reads and end points
  missing_values: 'Some reads were missing or not numbers and were skipped.',
  above_linear_range: "Reads above the reader's linear range were left out.",
  too_few_points: 'Too few usable reads for a rate; no value is given.',
  curvature: 'The reads in the window bend (significant quadratic term): the rate may be underestimated.',
  accelerating: 'The trace speeds up after the window: a lag phase? Consider skipping it.',
  non_monotonic:
    'The trace goes up and down: more than a third of its steps go against the fitted direction.',
  slope_not_significant: 'The rate cannot be told apart from zero (its 95 % interval includes 0).',
  constant_signal: 'Every read is the same value.',
  not_computable: 'The numbers are too large or too extreme to compute with.',
  // blanks, replicates, controls
  single_blank: 'Only one blank well: its spread is unknown.',
  single_replicate: 'Only one replicate: no spread can be given.',
  cv_undefined: 'The mean is zero, so the coefficient of variation is undefined.',
  too_few_for_outliers: 'Fewer than three values: outliers cannot be judged.',
  mad_zero: 'Half or more of the values are identical (MAD = 0): the robust scale is zero.',
  too_few_controls: 'Fewer than two positive or negative controls: Z′ cannot be computed.',
  controls_not_separated: 'Positive and negative controls have the same centre: Z′ is undefined.',
  // conversions
  extrapolated: 'The value lies outside the range of the standards.',
  calibration_slope_not_significant: 'The standard curve slope cannot be told apart from zero.',
  meniscus_not_corrected:
    'Path length from volume and well area ignores the meniscus; a standard curve in the plate is better.',
  // plate trends and drift
  row_trend: 'Values change steadily from the first to the last row.',
  column_trend: 'Values change steadily from the first to the last column.',
  edge_effect: 'Outer-ring wells differ from inner wells (evaporation or temperature at the edge?).',
  too_few_wells: 'Too few wells to test for trends.',
  blank_drift: 'Blanks change with pH (slope of blank against pH significant at 5 %).',
} as const;

export type PlateFlag = keyof typeof PLATE_FLAG_TEXT;
