/**
 * Row, column and edge effects on a plate (SCIENCE.md §3.3: edge evaporation), as flags.
 * Give values that should be alike (controls, a uniform test plate, or each well minus its group mean:
 * see centreByGroup); wells with different conditions would show their design, not an artefact.
 * Tests, each at α = 0.01 (chosen, not from a source; several are made per plate):
 *  - row trend: OLS of value on row index; flagged when the slope's two-sided t test gives p < α;
 *  - column trend: the same on column index;
 *  - edge effect: outer-ring wells against inner wells by Welch's t test; flagged when p < α.
 * An optional minEffect (signal units) also requires the effect to be that large: the change across the
 * plate (slope × (rows − 1), or × (columns − 1)) or the edge − inner difference.
 */
import { mean } from 'simple-statistics';
import { fitLine } from '../stats/linear-regression';
import { studentTTwoSidedP } from '../stats/t-distribution';
import { welchTTest } from '../stats/welch';
import type { PlateFlag } from './flags';
import { isEdgeWell, isPlateFormat, parseWell, plateDimensions, type PlateFormat } from './geometry';
import { isFiniteNumber } from './input';
import { fail, finiteOrNull, ok, type PlateResult } from './result';

export interface TrendTest {
  /** Change per row (or column). */
  slope: number;
  slopeSe: number | null;
  /** Predicted change from the first to the last row (or column). */
  changeAcrossPlate: number;
  p: number | null;
}

export interface PlateTrends {
  n: number;
  row: TrendTest | null;
  column: TrendTest | null;
  edge: { edgeMean: number; innerMean: number; difference: number; p: number | null } | null;
  flags: PlateFlag[];
}

function trend(index: number[], values: number[], span: number): TrendTest | null {
  const fit = fitLine(index, values);
  if (!fit || fit.slopeSe === null) return null;
  const p = fit.slopeSe > 0 ? studentTTwoSidedP(fit.slope / fit.slopeSe, fit.dof) : fit.slope === 0 ? 1 : 0;
  return {
    slope: fit.slope,
    slopeSe: finiteOrNull(fit.slopeSe),
    changeAcrossPlate: fit.slope * span,
    p: finiteOrNull(p),
  };
}

export function plateTrends(
  values: Readonly<Record<string, unknown>>,
  format: PlateFormat,
  options: { alpha?: number; minEffect?: number } = {},
): PlateResult<PlateTrends> {
  if (!isPlateFormat(format))
    return fail('invalid_input', `Plate format must be 96 or 384 wells (got ${String(format)}).`);
  if (typeof values !== 'object' || values === null)
    return fail('invalid_input', 'Values must be given per well.');
  const alpha = options.alpha ?? 0.01;
  const minEffect = options.minEffect ?? 0;
  if (!(alpha > 0 && alpha < 1))
    return fail('invalid_option', 'The significance level must lie between 0 and 1.');
  if (!isFiniteNumber(minEffect) || minEffect < 0)
    return fail('invalid_option', 'The minimum effect must be zero or positive.');
  const rows: number[] = [];
  const columns: number[] = [];
  const v: number[] = [];
  const edge: number[] = [];
  const inner: number[] = [];
  for (const [name, raw] of Object.entries(values)) {
    const well = parseWell(name, format);
    if (!well.ok) return well;
    if (!isFiniteNumber(raw)) continue;
    rows.push(well.value.row);
    columns.push(well.value.column);
    v.push(raw);
    (isEdgeWell(well.value, format) ? edge : inner).push(raw);
  }
  const { rows: nr, columns: nc } = plateDimensions(format);
  const flags: PlateFlag[] = [];
  const row = trend(rows, v, nr - 1);
  const column = trend(columns, v, nc - 1);
  const welch = welchTTest(edge, inner);
  const big = (effect: number) => Math.abs(effect) >= minEffect;
  if (row?.p != null && row.p < alpha && big(row.changeAcrossPlate)) flags.push('row_trend');
  if (column?.p != null && column.p < alpha && big(column.changeAcrossPlate)) flags.push('column_trend');
  if (welch && welch.p < alpha && big(welch.difference)) flags.push('edge_effect');
  if (!row || !column || !welch) flags.push('too_few_wells');
  return ok({
    n: v.length,
    row,
    column,
    edge: welch
      ? {
          edgeMean: mean(edge),
          innerMean: mean(inner),
          difference: welch.difference,
          p: finiteOrNull(welch.p),
        }
      : null,
    flags,
  });
}

/** Each well's value minus the mean of its group (e.g. its variant and pH point), for trend tests. */
export function centreByGroup(
  values: Readonly<Record<string, number | null>>,
  groupOf: Readonly<Record<string, string>>,
): Record<string, number | null> {
  const sums = new Map<string, { sum: number; n: number }>();
  for (const [well, value] of Object.entries(values)) {
    const g = groupOf[well];
    if (g === undefined || !isFiniteNumber(value)) continue;
    const s = sums.get(g) ?? { sum: 0, n: 0 };
    s.sum += value;
    s.n += 1;
    sums.set(g, s);
  }
  const out: Record<string, number | null> = {};
  for (const [well, value] of Object.entries(values)) {
    const s = sums.get(groupOf[well]);
    out[well] = s && isFiniteNumber(value) ? finiteOrNull(value - s.sum / s.n) : null;
  }
  return out;
}
