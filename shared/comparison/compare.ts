// Comparing variants across studies: each profile's optimum, pKa values, half-activity window and
// maximum activity, and its difference to the reference variant with a 95 % interval.
//
// Differences use the delta method on two independent fits: d = a − b, SE(d) = √(SEa² + SEb²), with
// Welch–Satterthwaite degrees of freedom ν = (SEa² + SEb²)² / (SEa⁴/νa + SEb⁴/νb) for Student's t.
// The maximum activity is compared as a ratio to the reference's: ln r = ln a − ln b with
// SE(ln r) = √((SEa/a)² + (SEb/b)²); its interval is exp(ln r ± t·SE). A difference is called
// clear only when its interval excludes zero (a ratio: when it excludes one).
import type { VariantProfile } from '../analysis';
import { studentTQuantile, type ProfileFit } from '../fitting';

export const comparisonMetrics = ['pHopt', 'pKa1', 'pKa2', 'windowLo', 'windowHi', 'windowWidth', 'maxActivity'] as const;
export type ComparisonMetric = (typeof comparisonMetrics)[number];

export const metricLabels: Record<ComparisonMetric, string> = {
  pHopt: 'pH optimum',
  pKa1: 'apparent pKa1',
  pKa2: 'apparent pKa2',
  windowLo: 'half-activity window, low end',
  windowHi: 'half-activity window, high end',
  windowWidth: 'half-activity window width',
  maxActivity: 'maximum activity',
};

export type ComparisonEntryInput = {
  studyId: string;
  studyName: string;
  approved: boolean;
  variantId: string;
  variantName: string;
  assayId: string;
  assayName: string;
  temperatureC: number;
  activityUnit: string;
  profile: VariantProfile;
};

export type MetricValue = {
  value: number | null;
  se: number | null;
  ci95: [number, number] | null;
  /** Bootstrap percentile interval where the study's bootstrap has been run. */
  boot95: [number | null, number | null] | null;
  dof: number | null;
};

export type MetricDifference = {
  /** a − b; for maxActivity the ratio a / b. */
  value: number | null;
  ci95: [number, number] | null;
  method: 'delta' | 'ratio-delta';
  /** The interval excludes no-difference (0, or 1 for a ratio). */
  clear: boolean;
};

export type ComparisonRow = {
  key: string;
  studyId: string;
  studyName: string;
  variantId: string;
  variantName: string;
  approved: boolean;
  isReference: boolean;
  model: string | null;
  metrics: Record<ComparisonMetric, MetricValue>;
  differences: Record<ComparisonMetric, MetricDifference | null>;
  /** Reasons the row is not directly comparable with the reference (temperature, assay, units). */
  comparability: string[];
  error: string | null;
};

export type ComparisonResult = {
  referenceKey: string;
  rows: ComparisonRow[];
  method: string;
};

const empty: MetricValue = { value: null, se: null, ci95: null, boot95: null, dof: null };

function fromEstimate(e: { value: number | null; se: number | null; ci95: [number, number] | null; boot95?: [number | null, number | null] | null } | undefined, dof: number): MetricValue {
  if (!e || e.value === null) return empty;
  return { value: e.value, se: e.se, ci95: e.ci95, boot95: e.boot95 ?? null, dof };
}

/** The two pKa values that set the acid and the alkaline limbs, whatever the model. */
function limbPKas(fit: ProfileFit) {
  const p = fit.parameters;
  switch (fit.model) {
    case 'acid':
      return { pKa1: p.pKa, pKa2: undefined };
    case 'base':
      return { pKa1: undefined, pKa2: p.pKa };
    case 'three':
      // Two protons on the acid side: the upper one (pKb) sets where the acid limb rises.
      return { pKa1: p.pKb, pKa2: p.pKc };
    default:
      return { pKa1: p.pKa1, pKa2: p.pKa2 };
  }
}

export function profileMetrics(profile: VariantProfile): Record<ComparisonMetric, MetricValue> {
  const fit = profile.fit;
  if (!fit) return Object.fromEntries(comparisonMetrics.map((m) => [m, empty])) as Record<ComparisonMetric, MetricValue>;
  const limbs = limbPKas(fit);
  return {
    pHopt: fromEstimate(fit.pHopt, fit.dof),
    pKa1: fromEstimate(limbs.pKa1, fit.dof),
    pKa2: fromEstimate(limbs.pKa2, fit.dof),
    windowLo: fromEstimate(fit.window.lo, fit.dof),
    windowHi: fromEstimate(fit.window.hi, fit.dof),
    windowWidth: fromEstimate(fit.window.width, fit.dof),
    maxActivity: fromEstimate(fit.peak.value !== null ? fit.peak : fit.parameters.V, fit.dof),
  };
}

function welchDof(seA: number, dofA: number, seB: number, dofB: number) {
  const a = seA * seA;
  const b = seB * seB;
  const denominator = (dofA > 0 ? (a * a) / dofA : 0) + (dofB > 0 ? (b * b) / dofB : 0);
  return denominator > 0 ? ((a + b) * (a + b)) / denominator : Math.max(dofA + dofB, 1);
}

function tQuantile(dof: number) {
  const q = studentTQuantile(0.975, Math.max(1, dof));
  return Number.isFinite(q) ? q : 1.96;
}

export function difference(a: MetricValue, b: MetricValue): MetricDifference | null {
  if (a.value === null || b.value === null || a.se === null || b.se === null) return null;
  const value = a.value - b.value;
  const se = Math.hypot(a.se, b.se);
  const t = tQuantile(welchDof(a.se, a.dof ?? 1, b.se, b.dof ?? 1));
  const ci95: [number, number] = [value - t * se, value + t * se];
  return { value, ci95, method: 'delta', clear: ci95[0] > 0 || ci95[1] < 0 };
}

export function ratio(a: MetricValue, b: MetricValue): MetricDifference | null {
  if (a.value === null || b.value === null || a.se === null || b.se === null || a.value <= 0 || b.value <= 0) return null;
  const value = a.value / b.value;
  const seA = a.se / a.value;
  const seB = b.se / b.value;
  const se = Math.hypot(seA, seB);
  const t = tQuantile(welchDof(seA, a.dof ?? 1, seB, b.dof ?? 1));
  const ci95: [number, number] = [value * Math.exp(-t * se), value * Math.exp(t * se)];
  return { value, ci95, method: 'ratio-delta', clear: ci95[0] > 1 || ci95[1] < 1 };
}

export const entryKey = (e: { studyId: string; variantId: string }) => `${e.studyId}:${e.variantId}`;

export function compareProfiles(entries: ComparisonEntryInput[], referenceKey: string): ComparisonResult {
  const reference = entries.find((e) => entryKey(e) === referenceKey) ?? entries[0];
  const refMetrics = reference ? profileMetrics(reference.profile) : null;
  const rows = entries.map((entry): ComparisonRow => {
    const key = entryKey(entry);
    const metrics = profileMetrics(entry.profile);
    const isReference = key === (reference ? entryKey(reference) : '');
    const differences = Object.fromEntries(
      comparisonMetrics.map((m) => [m, isReference || !refMetrics ? null : m === 'maxActivity' ? ratio(metrics[m], refMetrics[m]) : difference(metrics[m], refMetrics[m])]),
    ) as Record<ComparisonMetric, MetricDifference | null>;
    const comparability: string[] = [];
    if (reference && !isReference) {
      if (Math.abs(entry.temperatureC - reference.temperatureC) > 0.05) {
        comparability.push(`Measured at ${entry.temperatureC} °C, the reference at ${reference.temperatureC} °C.`);
      }
      if (entry.assayId !== reference.assayId) comparability.push(`Another assay (${entry.assayName}) than the reference's (${reference.assayName}).`);
      if (entry.activityUnit !== reference.activityUnit) {
        comparability.push(`Activity in ${entry.activityUnit}, the reference in ${reference.activityUnit}: the maximum activities cannot be compared.`);
        differences.maxActivity = null;
      }
    }
    return {
      key,
      studyId: entry.studyId,
      studyName: entry.studyName,
      variantId: entry.variantId,
      variantName: entry.variantName,
      approved: entry.approved,
      isReference,
      model: entry.profile.fit?.model ?? null,
      metrics,
      differences,
      comparability,
      error: entry.profile.fit ? null : (entry.profile.error?.message ?? 'This profile has no fit.'),
    };
  });
  return {
    referenceKey: reference ? entryKey(reference) : referenceKey,
    rows,
    method:
      'Differences to the reference by the delta method on independent fits (SE = √(SE₁² + SE₂²), Welch–Satterthwaite degrees of freedom, Student t); maximum activity as a ratio with a log-scale interval. A difference is marked only when its 95 % interval excludes no difference.',
  };
}
