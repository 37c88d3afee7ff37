// One row per variant for the parameter table: V, the apparent pKa values, the optimum and the
// half-activity window, each with the interval the screen shows (and which kind it is).
import type { VariantProfile } from '@shared/analysis';
import type { Flag, Interval, ModelId } from '@shared/fitting';
import { pickInterval, type Estimated, type IntervalKind } from '@/lib/intervals';
import { levelName, pkaSides } from './models';

export type EstimateCell = {
  value: number | null;
  interval: Interval | null;
  kind: IntervalKind | null;
  /** The model's own name for the parameter when it differs from the column's (e.g. pKb). */
  name?: string;
  notDetermined?: boolean;
};

export type ParameterRow = {
  variantId: string;
  name: string;
  isReference: boolean;
  isParent: boolean;
  model: ModelId | null;
  requested: string | null;
  n: number | null;
  V: EstimateCell | null;
  pKa1: EstimateCell | null;
  pKa2: EstimateCell | null;
  optimum: EstimateCell | null;
  low: EstimateCell | null;
  high: EstimateCell | null;
  width: EstimateCell | null;
  flags: Flag[];
  error: string | null;
};

function cell(
  e: (Estimated & { status?: 'fitted' | 'not_determined' }) | null | undefined,
  boot: boolean,
  name?: string,
): EstimateCell | null {
  if (!e) return null;
  const chosen = pickInterval(e, boot);
  return {
    value: e.value,
    interval: chosen?.interval ?? null,
    kind: chosen?.kind ?? null,
    name,
    notDetermined: e.status === 'not_determined' || e.value === null,
  };
}

export function parameterRows(profiles: VariantProfile[], bootstrapCurrent: boolean): ParameterRow[] {
  return profiles.map((p) => {
    const fit = p.fit;
    const sides = fit ? pkaSides(fit.model) : { acid: null, alkaline: null };
    const named = (n: string | null, column: string) =>
      n && fit ? cell(fit.parameters[n], bootstrapCurrent, n === column ? undefined : n) : null;
    const level = fit ? levelName(fit.model) : 'V';
    return {
      variantId: p.variantId,
      name: p.name,
      isReference: p.isReference,
      isParent: p.isParent,
      model: fit?.model ?? null,
      requested: p.selection?.requested ?? null,
      n: fit?.n ?? (p.fitData.pH.length || null),
      V: fit ? cell(fit.parameters[level], bootstrapCurrent, level === 'V' ? undefined : level) : null,
      pKa1: named(sides.acid, 'pKa1'),
      pKa2: named(sides.alkaline, 'pKa2'),
      optimum: fit ? cell(fit.pHopt, bootstrapCurrent) : null,
      low: fit ? cell(fit.window.lo, bootstrapCurrent) : null,
      high: fit ? cell(fit.window.hi, bootstrapCurrent) : null,
      width: fit ? cell(fit.window.width, bootstrapCurrent) : null,
      flags: fit?.flags ?? [],
      error: p.error?.message ?? null,
    };
  });
}
