/**
 * Checks an AnalysisInput before anything is computed. Input arrives as JSON from the server, so
 * every field is checked for shape; what cannot be analysed is a typed error naming the field, what
 * is merely incomplete (an exclusion for a well that is not mapped) becomes a note.
 * Reading values themselves are not checked here: NaN or null reads become flagged nulls later.
 */
import { MODEL_IDS } from '../fitting';
import { parseWell } from '../plate';
import { wellRoles } from '../plate-map';
import { fail, ok, type Result } from './result';
import type { AnalysisInput, AnalysisNote, ExclusionInput, PlateInput, RateWindow } from './types';

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);
const isFinite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
const isText = (v: unknown): v is string => typeof v === 'string' && v.length > 0;

export interface Checked {
  input: AnalysisInput;
  /** Exclusions by `${plateId}:${canonical well}`. */
  exclusions: Map<string, ExclusionInput>;
  notes: AnalysisNote[];
}

function checkAssay(a: unknown): string | null {
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

function checkSettings(s: unknown): string | null {
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

function checkPlate(
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

function checkExclusions(input: AnalysisInput, notes: AnalysisNote[]): Result<Map<string, ExclusionInput>> {
  const out = new Map<string, ExclusionInput>();
  if (input.exclusions === undefined || input.exclusions === null) return ok(out);
  if (!Array.isArray(input.exclusions)) return fail('invalid_input', 'Exclusions must be a list.');
  const plates = new Map<string, PlateInput>(input.plates.map((p) => [p.id, p]));
  for (const e of input.exclusions) {
    if (!isObject(e) || !isText(e.plateId) || !isText(e.well))
      return fail('invalid_input', 'Every exclusion needs a plate and a well.');
    if (typeof e.reason !== 'string' || e.reason.trim() === '')
      return fail(
        'invalid_input',
        `The exclusion of ${e.well} has no reason: a well is excluded only with a reason.`,
      );
    const plate = plates.get(e.plateId);
    const parsed = plate ? parseWell(e.well, plate.format) : null;
    const mapped =
      plate &&
      parsed?.ok &&
      Object.keys(plate.map.wells).some((k) => {
        const w = parseWell(k, plate.format);
        return w.ok && w.value.name === parsed.value.name;
      });
    if (!plate || !parsed?.ok || !mapped) {
      notes.push({
        level: 'warning',
        code: 'unknown_exclusion',
        message: `An exclusion names ${e.well} on plate ${e.plateId}, which is not a mapped well of the study; it was ignored.`,
      });
      continue;
    }
    out.set(`${plate.id}:${parsed.value.name}`, {
      id: String(e.id),
      plateId: plate.id,
      well: parsed.value.name,
      reason: e.reason,
    });
  }
  return ok(out);
}

export function checkInput(input: unknown): Result<Checked> {
  if (!isObject(input))
    return fail(
      'invalid_input',
      'The analysis needs a study: assay, variants, plates, settings and exclusions.',
    );
  const assayProblem = checkAssay(input.assay);
  if (assayProblem) return fail('invalid_input', assayProblem);
  const study = input as unknown as AnalysisInput;
  if (!Array.isArray(study.variants) || study.variants.length === 0)
    return fail('no_variants', 'The study has no variants to analyse.');
  const ids = new Set<string>();
  for (const v of study.variants) {
    if (!isObject(v) || !isText(v.id)) return fail('invalid_input', 'Every variant needs an id.');
    if (ids.has(v.id)) return fail('invalid_input', `Variant ${v.id} is listed twice.`);
    if (v.proteinMgPerMl !== null && v.proteinMgPerMl !== undefined && !isFinite(v.proteinMgPerMl))
      return fail(
        'invalid_input',
        `Variant ${v.name ?? v.id}: the protein concentration must be a number or empty.`,
      );
    ids.add(v.id);
  }
  if (!ids.has(study.referenceVariantId))
    return fail(
      'unknown_reference_variant',
      `The reference variant (${String(study.referenceVariantId)}) is not one of the study's variants.`,
    );
  if (!Array.isArray(study.plates) || study.plates.length === 0)
    return fail('no_plates', 'The study has no plates to analyse.');
  const plateIds = new Set<string>();
  for (const [i, p] of study.plates.entries()) {
    const problem = checkPlate(p, i, study.assay.readMode);
    if (problem) return fail(problem.code, problem.message);
    if (plateIds.has(p.id)) return fail('invalid_input', `Plate ${p.id} is listed twice.`);
    plateIds.add(p.id);
  }
  if (!study.plates.some((p) => p.read))
    return fail(
      'no_reads',
      'Nothing to analyse yet: no plate of the study has a read. Import a reader file first.',
    );
  const settingsProblem = checkSettings(study.settings);
  if (settingsProblem) return fail('invalid_setting', settingsProblem);
  const notes: AnalysisNote[] = [];
  const exclusions = checkExclusions(study, notes);
  if (!exclusions.ok) return exclusions;
  const a = study.assay;
  const normalised: AnalysisInput = {
    ...study,
    assay: {
      ...a,
      extinctionCoefficient: a.extinctionCoefficient ?? null,
      extinctionUnit: a.extinctionUnit === 'mM-1cm-1' ? 'mM-1cm-1' : 'M-1cm-1',
      pathLengthCm: a.pathLengthCm ?? null,
      chromophorePka: a.chromophorePka ?? null,
      stopSolution: typeof a.stopSolution === 'string' ? a.stopSolution : '',
    },
    variants: study.variants.map((v) => ({
      ...v,
      name: isText(v.name) ? v.name : v.id,
      isParent: v.isParent === true,
      proteinMgPerMl: v.proteinMgPerMl ?? null,
    })),
    settings: study.settings ?? {},
    exclusions: study.exclusions ?? [],
  };
  return ok({ input: normalised, exclusions: exclusions.value, notes });
}
