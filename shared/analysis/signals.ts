/**
 * Step 1: one row per mapped well, with its signal.
 *  - Kinetic reads: the initial rate of shared/plate initialRate (automatic linear window, SCIENCE.md
 *    §3.1, unless a window is set), reported per minute: signal [units/min] = 60 · slope [units/s].
 *    The window is the most specific one set: well, then variant, then plate; else automatic.
 *  - End-point reads: the value as read (shared/plate endpointValues).
 *  - Standards: their mean read (`standardSignal`), the y of the standard curve.
 * Absorbance reads above the reader's linear range (shared/plate default, 2.5 A) are left out;
 * fluorescence has no such limit here.
 */
import { endpointValues, initialRate, isPlateFormat, parseWell, type PlateFlag } from '../plate';
import type { WellAssignment } from '../plate-map';
import { num } from './result';
import type { AnalysisInput, PlateInput, RateWindow, WellRow, WindowSource } from './types';

export function emptyRow(plateId: string, well: string, a: WellAssignment): WellRow {
  return {
    plateId,
    well,
    role: a.role,
    variantId: a.variantId ?? null,
    pH: num(a.pH),
    buffer: a.buffer ?? null,
    replicate: a.replicate ?? null,
    concentrationUm: num(a.concentrationUm),
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
    activity: null,
    activitySe: null,
    readerFlag: null,
    flags: [],
    excluded: false,
    exclusion: null,
    outlier: false,
    outlierScore: null,
  };
}

/** The window that applies to a well: well beats variant beats plate; null = automatic. */
export function resolveWindow(
  settings: AnalysisInput['settings'],
  plateId: string,
  well: string,
  variantId: string | null,
): { window: RateWindow | null; source: WindowSource } {
  const w = settings.rateWindows;
  const byWell = w?.well?.[`${plateId}:${well}`];
  if (byWell) return { window: byWell, source: 'well' };
  const byVariant = variantId ? w?.variant?.[variantId] : undefined;
  if (byVariant) return { window: byVariant, source: 'variant' };
  const byPlate = w?.plate?.[plateId];
  if (byPlate) return { window: byPlate, source: 'plate' };
  return { window: null, source: 'automatic' };
}

function meanOfFinite(values: readonly (number | null)[] | null): number | null {
  if (!values) return null;
  let sum = 0;
  let n = 0;
  for (const v of values) {
    if (typeof v !== 'number' || !Number.isFinite(v)) continue;
    sum += v;
    n++;
  }
  return n > 0 ? num(sum / n) : null;
}

function kineticSignal(row: WellRow, plate: PlateInput, input: AnalysisInput, values: unknown): void {
  const read = plate.read!;
  const times = read.timesS!;
  if (!Array.isArray(values) || values.length !== times.length) {
    row.flags.push(values === null || values === undefined ? 'no_value' : 'invalid_trace');
    return;
  }
  if (row.role === 'standard') {
    row.standardSignal = meanOfFinite(values as (number | null)[]);
    if (row.standardSignal === null) row.flags.push('no_value');
    return;
  }
  const set = resolveWindow(input.settings, plate.id, row.well, row.variantId);
  const noEnzyme = (row.role === 'blank' || row.role === 'buffer') && set.window === null;
  const window = noEnzyme ? { startS: times[0], endS: times[times.length - 1] } : set.window;
  const source = noEnzyme ? 'all-reads' : set.source;
  const rate = initialRate(
    { times, values: values as (number | null)[] },
    {
      window: window ? { start: window.startS, end: window.endS } : undefined,
      lag: input.settings.lagS ?? 0,
      linearRangeMax: input.assay.detection === 'fluorescence' ? null : undefined,
    },
  );
  if (!rate.ok) {
    row.flags.push('invalid_trace');
    return;
  }
  const r = rate.value;
  row.signal = r.slope === null ? null : num(r.slope * 60);
  row.signalSe = r.slopeSe === null ? null : num(r.slopeSe * 60);
  row.r2 = r.r2;
  row.n = r.n;
  row.window = {
    startS: r.window?.start ?? null,
    endS: r.window?.end ?? null,
    automatic: set.window === null && !noEnzyme,
    source,
  };
  row.flags.push(...r.flags);
}

/** Rows of one plate, in the map's order, with signals from its read (if any). */
export function plateRows(plate: PlateInput, input: AnalysisInput): WellRow[] {
  const rows: WellRow[] = [];
  const read = plate.read;
  const format = isPlateFormat(plate.format) ? plate.format : 96;
  const endpoint =
    read?.kind === 'endpoint'
      ? endpointValues(Object.fromEntries(Object.entries(read.wells).map(([k, w]) => [k, w?.value])), {
          linearRangeMax: input.assay.detection === 'fluorescence' ? null : undefined,
        })
      : null;
  for (const [key, assignment] of Object.entries(plate.map.wells)) {
    const parsed = parseWell(key, format);
    const well = parsed.ok ? parsed.value.name : key;
    const row = emptyRow(plate.id, well, assignment);
    rows.push(row);
    if (!parsed.ok) row.flags.push('not_a_well');
    if (row.role === 'unused') continue;
    if (!read) {
      row.flags.push('no_read');
      continue;
    }
    const data = read.wells[well] ?? read.wells[key];
    row.readerFlag = typeof data?.flag === 'string' ? data.flag : null;
    if (row.readerFlag) row.flags.push('reader_flag');
    if (read.kind === 'kinetic') {
      kineticSignal(row, plate, input, data?.values ?? null);
      continue;
    }
    const value = endpoint?.ok ? (endpoint.value[well] ?? endpoint.value[key]) : undefined;
    if (!value || data?.value === null || data?.value === undefined) {
      row.flags.push('no_value');
      continue;
    }
    row.flags.push(...(value.flags as PlateFlag[]));
    if (row.role === 'standard') row.standardSignal = value.value;
    else row.signal = value.value;
  }
  return rows;
}
