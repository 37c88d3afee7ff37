// Gathers everything a study's analysis depends on into shared/analysis's AnalysisInput, and the
// hash of it: the same hash means the same result, so stored results are reused and can be
// recomputed and compared later.
import { createHash } from 'node:crypto';
import { and, asc, desc, eq, inArray, isNull } from 'drizzle-orm';
import stableStringify from 'fast-json-stable-stringify';
import { ANALYSIS_VERSION, type AnalysisInput } from '../../../shared/analysis';
import { ENGINE_VERSION } from '../../../shared/fitting';
import type { PlateMap } from '../../../shared/plate-map/schema';
import type { StudyAnalysisSettings } from '../../../shared/schemas/analysis';
import type { DbOrTx } from '../../db/client';
import type { studies} from '../../db/schema';
import { analysisSettings, assays, exclusions, plates, preparations, reads, studyVariants, variants, wellRecords } from '../../db/schema';

type Study = typeof studies.$inferSelect;

export async function loadSettings(db: DbOrTx, studyId: string): Promise<{ settings: StudyAnalysisSettings; version: number }> {
  const row = await db.query.analysisSettings.findFirst({ where: eq(analysisSettings.studyId, studyId) });
  return row ? { settings: row.settings as StudyAnalysisSettings, version: row.version } : { settings: {}, version: 1 };
}

async function chooseRead(db: DbOrTx, plateId: string, wanted: string | undefined, readMode: 'endpoint' | 'kinetic') {
  const plateReads = await db.select().from(reads).where(eq(reads.plateId, plateId)).orderBy(desc(reads.createdAt), asc(reads.blockIndex));
  // The newest read of the assay's read mode, unless the scientist picked one.
  return plateReads.find((r) => r.id === wanted) ?? plateReads.find((r) => r.kind === readMode) ?? plateReads[0] ?? null;
}

export async function buildAnalysisInput(db: DbOrTx, study: Study) {
  const { settings, version } = await loadSettings(db, study.id);
  const assay = await db.query.assays.findFirst({ where: eq(assays.id, study.assayId) });
  if (!assay) throw new Error(`assay ${study.assayId} of study ${study.id} is missing`);
  const included = await db
    .select({ variant: variants })
    .from(studyVariants)
    .innerJoin(variants, eq(variants.id, studyVariants.variantId))
    .where(eq(studyVariants.studyId, study.id))
    .orderBy(asc(studyVariants.position));
  const variantIds = included.map((r) => r.variant.id);
  const preps = variantIds.length
    ? await db.select().from(preparations).where(inArray(preparations.variantId, variantIds)).orderBy(desc(preparations.preparedOn), desc(preparations.createdAt))
    : [];
  const prepOf = (variantId: string) =>
    preps.find((p) => p.id === settings.preparations?.[variantId] && p.variantId === variantId) ?? preps.find((p) => p.variantId === variantId) ?? null;

  const studyPlates = await db.select().from(plates).where(eq(plates.studyId, study.id)).orderBy(asc(plates.createdAt));
  const platesInput: AnalysisInput['plates'] = [];
  for (const plate of studyPlates) {
    const read = await chooseRead(db, plate.id, settings.plateReads?.[plate.id], assay.readMode);
    const wells = read ? await db.select().from(wellRecords).where(eq(wellRecords.readId, read.id)) : [];
    platesInput.push({
      id: plate.id,
      name: plate.name,
      format: plate.format as 96 | 384,
      map: plate.map as PlateMap,
      read: read
        ? {
            id: read.id,
            kind: read.kind,
            timesS: read.timesS,
            wells: Object.fromEntries(wells.map((w) => [w.well, { value: w.value, values: w.values, flag: w.flag }])),
          }
        : null,
    });
  }
  const active = await db
    .select()
    .from(exclusions)
    .where(and(eq(exclusions.studyId, study.id), isNull(exclusions.liftedAt)))
    .orderBy(asc(exclusions.createdAt));

  const { plateReads: _reads, preparations: _preps, ...engineSettings } = settings;
  const usedReads = Object.fromEntries(platesInput.map((p) => [p.id, p.read?.id ?? null]));
  const input: AnalysisInput = {
    assay: {
      readMode: assay.readMode,
      detection: assay.detection,
      quantitation: assay.quantitation,
      extinctionCoefficient: assay.extinctionCoefficient,
      extinctionUnit: assay.extinctionUnit as 'M-1cm-1' | 'mM-1cm-1',
      pathLengthCm: assay.pathLengthCm,
      wellVolumeUl: assay.wellVolumeUl,
      chromophorePka: assay.chromophorePka,
      stopSolution: assay.stopSolution,
      temperatureC: assay.temperatureC,
      wavelengthNm: assay.wavelengthNm,
    },
    variants: included.map(({ variant }) => ({
      id: variant.id,
      name: variant.name,
      isParent: variant.isParent,
      proteinMgPerMl: prepOf(variant.id)?.proteinMgPerMl ?? null,
    })),
    referenceVariantId: study.referenceVariantId,
    plates: platesInput,
    settings: engineSettings,
    exclusions: active.map((e) => ({ id: e.id, plateId: e.plateId, well: e.well, reason: e.reason })),
  };
  return { input, settings, settingsVersion: version, exclusions: active, usedReads, assay: { readMode: assay.readMode, quantitation: assay.quantitation } };
}

/** SHA-256 of the input in a stable key order, with the engine and analysis versions. */
export function hashAnalysisInput(input: AnalysisInput): string {
  return createHash('sha256').update(stableStringify({ engine: ENGINE_VERSION, analysis: ANALYSIS_VERSION, input })).digest('hex');
}

/** The hash of exactly what one profile's fit was computed from. */
export function hashProfileInput(value: unknown): string {
  return createHash('sha256').update(stableStringify({ engine: ENGINE_VERSION, value })).digest('hex');
}
