/**
 * Shape checks of the parts of an AnalysisInput (assay, settings, plates); each returns the message
 * a scientist reads, or null when the part is fine.
 */
import { MODEL_IDS } from '../fitting';
import { wellRoles } from '../plate-map';
import type { RateWindow } from './types';

export const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);
export const isFinite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
export const isText = (v: unknown): v is string => typeof v === 'string' && v.length > 0;

export function checkAssay(a: unknown): string | null {
  if (!isObject(a)) return 'The study has no assay.';
  if (a.readMode !== 'endpoint' && a.readMode !== 'kinetic')
    return "The assay's read mode must be 'endpoint' or 'kinetic'.";
  if (a.detection !== 'absorbance' && a.detection !== 'fluorescence')
    return "The assay's detection must be 'absorbance' or 'fluorescence'.";
  if (a.quantitation !== 'extinction' && a.quantitation !== 'standard-curve')
    return "The assay's quantitation must be 'extinction' or 'standard-curve'.";
  if (!isFinite(a.wellVolumeUl) || a.wellVolumeUl <= 0) return 'The assay needs a positive well volume (µL).';
  for (const key of ['extinctionCoefficient', 'pathLengthCm', 'chromophorePka'] as const) {
    if (a[key] !== null && a[key] !== undefined && !isFinite(a[key]))
      return `The assay's ${key} must be a number or empty.`;
  }
  return null;
}

function checkWindow(where: string, w: unknown): string | null {
  if (!isObject(w) || !isFinite(w.startS) || !isFinite(w.endS) || !(w.startS < w.endS)) {
    return `The rate window for ${where} needs a start and an end time in seconds, start before end.`;
  }
  return null;
}

export function checkSettings(s: unknown): string | null {
  if (s === undefined || s === null) return null;
  if (!isObject(s)) return 'Settings must be an object.';
  const windows = s.rateWindows;
  if (windows !== undefined && windows !== null) {
    if (!isObject(windows)) return 'Rate windows must be given per plate, variant or well.';
    for (const level of ['plate', 'variant', 'well'] as const) {
      const table = windows[level];
      if (table === undefined || table === null) continue;
      if (!isObject(table)) return `Rate windows per ${level} must be an object keyed by ${level}.`;
      for (const [key, w] of Object.entries(table)) {
        const problem = checkWindow(`${level} ${key}`, w as RateWindow);
        if (problem) return problem;
      }
    }
  }
  if (s.lagS !== undefined && (!isFinite(s.lagS) || s.lagS < 0))
    return 'The lag must be zero or a positive number of seconds.';
  for (const key of ['enzymeVolumeUl', 'reactionTimeMin'] as const) {
    const v = s[key];
    if (v !== undefined && v !== null && (!isFinite(v) || v <= 0))
      return `The setting ${key} must be a positive number or empty.`;
  }
  if (
    s.replicatesRequired !== undefined &&
    !(Number.isInteger(s.replicatesRequired) && (s.replicatesRequired as number) >= 1)
  )
    return 'The required number of replicates must be a whole number of at least 1.';
  if (s.models !== undefined && s.models !== null) {
    if (!isObject(s.models)) return 'Models must be given per variant.';
    for (const [variant, m] of Object.entries(s.models)) {
      if (m !== 'auto' && !MODEL_IDS.includes(m as never))
        return `Unknown model '${String(m)}' for variant ${variant}; use 'auto' or one of ${MODEL_IDS.join(', ')}.`;
    }
  }
  return null;
}

export function checkPlate(
  p: unknown,
  index: number,
  readMode: string,
): { code: 'invalid_input' | 'read_mismatch'; message: string } | null {
  const bad = (message: string) => ({ code: 'invalid_input' as const, message });
  if (!isObject(p) || !isText(p.id)) return bad(`Plate ${index + 1} has no id.`);
  const name = isText(p.name) ? p.name : p.id;
  if (p.format !== 96 && p.format !== 384) return bad(`Plate ${name}: the format must be 96 or 384 wells.`);
  if (!isObject(p.map) || !isObject(p.map.wells)) return bad(`Plate ${name} has no plate map.`);
  for (const [well, a] of Object.entries(p.map.wells)) {
    if (!isObject(a) || !wellRoles.includes(a.role as never))
      return bad(`Plate ${name}, well ${well}: the map gives no role (one of ${wellRoles.join(', ')}).`);
  }
  if (p.read === null || p.read === undefined) return null;
  const r = p.read;
  if (!isObject(r) || !isObject(r.wells)) return bad(`Plate ${name}: its read has no wells.`);
  if (r.kind !== readMode) {
    return {
      code: 'read_mismatch',
      message: `Plate ${name}: its read is ${String(r.kind)} but the assay reads ${readMode === 'kinetic' ? 'kinetically' : 'end points'}. Import the matching read or change the assay.`,
    };
  }
  if (r.kind === 'kinetic') {
    const t = r.timesS;
    if (!Array.isArray(t) || t.length === 0 || !t.every(isFinite))
      return { code: 'read_mismatch', message: `Plate ${name}: the kinetic read has no usable time axis.` };
    for (let i = 1; i < t.length; i++) {
      if (!(t[i] > t[i - 1]))
        return {
          code: 'read_mismatch',
          message: `Plate ${name}: the read's times must increase (read ${i + 1}).`,
        };
    }
  }
  return null;
}
