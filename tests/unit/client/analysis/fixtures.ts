// Hand-made analysis results for the client's view logic (invented values, shaped like analyseStudy's).
import type { ProfilePoint, VariantProfile, WellRow } from '@shared/analysis';
import type { DerivedEstimate, Interval, ModelId, ParameterEstimate, ProfileFit } from '@shared/fitting';

export const estimate = (value: number | null, over: Partial<ParameterEstimate> = {}): ParameterEstimate => ({
  value,
  se: value === null ? null : 0.05,
  ci95: value === null ? null : [value - 0.1, value + 0.1],
  status: value === null ? 'not_determined' : 'fitted',
  profile95: null,
  boot95: null,
  ...over,
});

export const derived = (value: number | null, over: Partial<DerivedEstimate> = {}): DerivedEstimate => ({
  value,
  se: null,
  ci95: value === null ? null : [value - 0.2, value + 0.2],
  profile95: null,
  boot95: null,
  ...over,
});

export function fitOf(
  model: ModelId,
  parameters: Record<string, ParameterEstimate>,
  over: Partial<ProfileFit> = {},
): ProfileFit {
  const names = Object.keys(parameters);
  const none = derived(null, { ci95: null });
  return {
    engine: { name: 'bellwether', version: 'test' },
    model,
    parameterNames: names,
    n: 12,
    pHRange: [3, 9],
    nFitted: names.length,
    dof: 12 - names.length,
    converged: true,
    stop: 'converged-gradient',
    iterations: 10,
    starts: 1,
    parameters,
    ssr: 0.12,
    s2: 0.0144,
    aicc: -40,
    pHopt: none,
    peak: none,
    delta: null,
    window: { lo: none, hi: none, width: none },
    covariance: [],
    correlation: [],
    fitted: [],
    residuals: [],
    runs: null,
    flags: [],
    alternative: null,
    selection: null,
    bootstrap: null,
    ...over,
  };
}

export const point = (pH: number, over: Partial<ProfilePoint> = {}): ProfilePoint => ({
  pH,
  buffer: null,
  n: 0,
  mean: null,
  sd: null,
  cvPercent: null,
  wells: [],
  excluded: [],
  missing: [],
  flags: [],
  ...over,
});

export function profileOf(over: Partial<VariantProfile> = {}): VariantProfile {
  return {
    variantId: 'v-wt',
    name: 'FR1-WT',
    isParent: true,
    isReference: true,
    points: [],
    fitData: { wells: [], pH: [], v: [] },
    selection: null,
    fit: null,
    curve: null,
    relative: null,
    error: null,
    bootstrap: null,
    ...over,
  };
}

export function wellRow(
  plateId: string,
  well: string,
  activity: number | null,
  over: Partial<WellRow> = {},
): WellRow {
  return {
    plateId,
    well,
    role: 'sample',
    variantId: 'v-wt',
    pH: null,
    buffer: null,
    replicate: null,
    concentrationUm: null,
    signal: null,
    signalSe: null,
    window: null,
    r2: null,
    n: null,
    standardSignal: null,
    blank: null,
    corrected: null,
    correctedSe: null,
    rate: null,
    rateSe: null,
    activity,
    activitySe: null,
    readerFlag: null,
    flags: [],
    excluded: false,
    exclusion: null,
    outlier: false,
    outlierScore: null,
    ...over,
  };
}

export type { Interval };
