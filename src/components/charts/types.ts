// Plain data the scientific charts draw. Nothing here knows about studies or the API: a feature maps
// its results into these shapes, so comparison and report screens can reuse the charts as they are.

/** An interval; a null end is open (the data do not bound it on that side). */
export type ChartInterval = [number | null, number | null];

/** A curve on a grid of x values, with an optional 95 % band; null values leave a gap. */
export type ChartCurve = {
  x: number[];
  y: (number | null)[];
  lower?: (number | null)[];
  upper?: (number | null)[];
};

/** A value marked on the x axis (a pKa, an optimum) with its interval. */
export type XMarker = { label: string; value: number; interval: ChartInterval | null };

export type Domain = [number, number];
