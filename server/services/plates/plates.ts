// Plates and their maps. A plate belongs to a study; changing it needs the study to be editable.
// Map saves carry the version they started from: an older version gets 409 (someone saved since).
import { and, asc, count, eq } from 'drizzle-orm';
import { checkPlateMap } from '../../../shared/plate-map/checks';
import { emptyPlateMap, plateMapSchemaFor, type PlateMap } from '../../../shared/plate-map/schema';
import type { PlateDetail, PlateSummary } from '../../../shared/schemas/plates-types';
import type { Db, Tx } from '../../db/client';
import { assays, plates, plateTemplates, reads, studies, studyVariants, variants } from '../../db/schema';
import { badRequest, staleVersion } from '../../errors';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';
import { asJson, deleteAudited, insertAudited, loadVisible, updateAudited } from '../records/audited';
import { assertEditable } from '../records/studies';
import { listReads } from './reads';

type Format = 96 | 384;

export function validMap(format: Format, map: unknown): PlateMap {
  const parsed = plateMapSchemaFor(format).safeParse(map);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw badRequest(`The plate map is not valid: ${issue.message}`, { [`map.${issue.path.join('.')}`]: issue.message });
  }
  return parsed.data;
}

/** The plate and its study, refusing changes when the study is in review or approved. */
export async function loadEditablePlate(tx: Tx, user: CurrentUser, plateId: string) {
  const plate = await loadVisible(tx, plates, plateId, user, 'That plate');
  const study = await loadVisible(tx, studies, plate.studyId, user, 'That study');
  assertEditable(study);
  return { plate, study };
}

export async function listPlates(db: Db, user: CurrentUser, studyId: string): Promise<PlateSummary[]> {
  await loadVisible(db, studies, studyId, user, 'That study');
  const rows = await db
    .select({ plate: plates, readCount: count(reads.id) })
    .from(plates)
    .leftJoin(reads, eq(reads.plateId, plates.id))
    .where(eq(plates.studyId, studyId))
    .groupBy(plates.id)
    .orderBy(asc(plates.createdAt));
  return asJson(rows.map(({ plate: { map: _m, ...p }, readCount }) => ({ ...p, readCount })));
}

async function checkContext(db: Db | Tx, studyId: string, format: Format) {
  const study = await db.query.studies.findFirst({ where: eq(studies.id, studyId) });
  const vs = await db
    .select({ id: variants.id, name: variants.name })
    .from(studyVariants)
    .innerJoin(variants, eq(variants.id, studyVariants.variantId))
    .where(eq(studyVariants.studyId, studyId));
  const assay = study ? await db.query.assays.findFirst({ where: eq(assays.id, study.assayId) }) : undefined;
  return {
    format,
    variantNames: Object.fromEntries(vs.map((v) => [v.id, v.name])),
    needsStandardCurve: assay?.quantitation === 'standard-curve',
  };
}

export async function getPlate(db: Db, user: CurrentUser, id: string): Promise<PlateDetail> {
  const plate = await loadVisible(db, plates, id, user, 'That plate');
  const map = plate.map as PlateMap;
  const plateReads = await listReads(db, user, id);
  const checks = checkPlateMap(map, await checkContext(db, plate.studyId, plate.format as Format));
  return asJson({ ...plate, map, checks, reads: plateReads, readCount: plateReads.length });
}

async function startingMap(tx: Tx, user: CurrentUser, format: Format, templateId: string | null, copyFromPlateId: string | null) {
  if (templateId && copyFromPlateId) throw badRequest('Start from a template or from a plate, not both.');
  const source = templateId
    ? await loadVisible(tx, plateTemplates, templateId, user, 'That template')
    : copyFromPlateId
      ? await loadVisible(tx, plates, copyFromPlateId, user, 'That plate')
      : null;
  if (!source) return emptyPlateMap();
  if (source.format !== format) throw badRequest(`The source is a ${source.format}-well map; this plate has ${format} wells.`, { format: 'Formats differ.' });
  return validMap(format, source.map);
}

export async function createPlate(
  db: Db,
  actor: CurrentUser,
  studyId: string,
  input: { name: string; format: Format; templateId: string | null; copyFromPlateId: string | null },
) {
  return db.transaction(async (tx) => {
    const study = await loadVisible(tx, studies, studyId, actor, 'That study');
    assertEditable(study);
    const map = await startingMap(tx, actor, input.format, input.templateId, input.copyFromPlateId);
    return insertAudited(tx, actor, 'plate', plates, { teamId: study.teamId, studyId, name: input.name, format: input.format, map, createdBy: actor.id });
  });
}

export async function renamePlate(db: Db, actor: CurrentUser, id: string, name: string) {
  return db.transaction(async (tx) => {
    const { plate } = await loadEditablePlate(tx, actor, id);
    return updateAudited(tx, actor, 'plate', plates, plate, { name });
  });
}

export async function saveMap(db: Db, actor: CurrentUser, id: string, version: number, map: unknown) {
  return db.transaction(async (tx) => {
    const { plate } = await loadEditablePlate(tx, actor, id);
    const valid = validMap(plate.format as Format, map);
    // The version check and the write are one statement, so two saves cannot both win.
    const [saved] = await tx
      .update(plates)
      .set({ map: valid, version: plate.version + 1, updatedAt: new Date() })
      .where(and(eq(plates.id, id), eq(plates.version, version)))
      .returning();
    if (!saved) {
      const [now] = await tx.select({ version: plates.version }).from(plates).where(eq(plates.id, id));
      const current = now?.version ?? plate.version;
      throw staleVersion(
        `This plate map was saved by someone else since you opened it (version ${current}, yours ${version}). Reload to see their changes.`,
        current,
      );
    }
    await writeAudit(tx, {
      actorId: actor.id,
      teamId: plate.teamId,
      entity: 'plate',
      entityId: id,
      action: 'save-map',
      before: { version: plate.version, wells: Object.keys((plate.map as PlateMap).wells).length },
      after: { version: saved.version, map: valid },
    });
    return { id, version: saved.version };
  });
}

export async function copyPlate(db: Db, actor: CurrentUser, id: string, input: { name: string; studyId: string | null }) {
  return db.transaction(async (tx) => {
    const source = await loadVisible(tx, plates, id, actor, 'That plate');
    const target = await loadVisible(tx, studies, input.studyId ?? source.studyId, actor, 'That study');
    if (target.teamId !== source.teamId) throw badRequest('A plate map can be copied only within its team.');
    assertEditable(target);
    return insertAudited(tx, actor, 'plate', plates, {
      teamId: target.teamId,
      studyId: target.id,
      name: input.name,
      format: source.format,
      map: source.map,
      createdBy: actor.id,
    });
  });
}

export async function deletePlate(db: Db, actor: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const { plate } = await loadEditablePlate(tx, actor, id);
    await deleteAudited(tx, actor, 'plate', plates, { ...plate, map: undefined } as typeof plate);
  });
}
