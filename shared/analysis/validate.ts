/**
 * Checks an AnalysisInput before anything is computed. Input arrives as JSON from the server, so
 * every field is checked for shape; what cannot be analysed is a typed error naming the field, what
 * is merely incomplete (an exclusion for a well that is not mapped) becomes a note.
 * Reading values themselves are not checked here: NaN or null reads become flagged nulls later.
 */
import { parseWell } from '../plate';
import { fail, ok, type Result } from './result';
import type { AnalysisInput, AnalysisNote, ExclusionInput, PlateInput } from './types';
import { checkAssay, checkPlate, checkSettings, isFinite, isObject, isText } from './validate-parts';

export interface Checked {
  input: AnalysisInput;
  /** Exclusions by `${plateId}:${canonical well}`. */
  exclusions: Map<string, ExclusionInput>;
  notes: AnalysisNote[];
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
