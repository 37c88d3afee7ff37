// Studies: one pH-profile experiment (an assay, a buffer series, a set of variants, its plates).
// Editing is open in draft and returned; a study in review or approved refuses edits with 409.
import { and, asc, count, desc, eq, inArray, type SQL } from 'drizzle-orm';
import type { StudyStatus } from '../../../shared/schemas/studies';
import type { StudyDetail, StudySummary } from '../../../shared/schemas/records-types';
import type { Db, Tx } from '../../db/client';
import { assays, bufferSeries, enzymes, studies, studyVariants, teams, users, variants } from '../../db/schema';
import { badRequest, conflict } from '../../errors';
import type { CurrentUser } from '../../types';
import { asJson, deleteAudited, insertAudited, listScope, loadVisible, updateAudited, visible } from './audited';

type StudyInput = {
  teamId: string;
  name: string;
  enzymeId: string;
  variantIds: string[];
  referenceVariantId: string;
  assayId: string;
  bufferSeriesId: string | null;
  notes: string;
};

export type StudyFilter = { teamId?: string; status?: StudyStatus; mine?: boolean };

function summaryQuery(db: Db) {
  return db
    .select({
      study: studies,
      enzymeName: enzymes.name,
      assayName: assays.name,
      assayReadMode: assays.readMode,
      assayQuantitation: assays.quantitation,
      ownerName: users.name,
      teamName: teams.name,
      variantCount: count(studyVariants.variantId),
    })
    .from(studies)
    .innerJoin(enzymes, eq(enzymes.id, studies.enzymeId))
    .innerJoin(assays, eq(assays.id, studies.assayId))
    .innerJoin(users, eq(users.id, studies.ownerId))
    .innerJoin(teams, eq(teams.id, studies.teamId))
    .leftJoin(studyVariants, eq(studyVariants.studyId, studies.id))
    .groupBy(studies.id, enzymes.name, assays.name, assays.readMode, assays.quantitation, users.name, teams.name)
    .$dynamic();
}

type SummaryRow = Awaited<ReturnType<ReturnType<typeof summaryQuery>['execute']>>[number];
const toSummary = (r: SummaryRow) => ({
  ...r.study,
  enzymeName: r.enzymeName,
  assayName: r.assayName,
  assayReadMode: r.assayReadMode,
  assayQuantitation: r.assayQuantitation,
  ownerName: r.ownerName,
  teamName: r.teamName,
  variantCount: r.variantCount,
});

export async function listStudies(db: Db, user: CurrentUser, filter: StudyFilter): Promise<StudySummary[]> {
  const scope = listScope(user, filter.teamId);
  if (scope?.length === 0) return [];
  const conditions: SQL[] = [];
  if (scope) conditions.push(inArray(studies.teamId, scope));
  if (filter.status) conditions.push(eq(studies.status, filter.status));
  if (filter.mine) conditions.push(eq(studies.ownerId, user.id));
  const rows = await summaryQuery(db).where(and(...conditions)).orderBy(desc(studies.updatedAt));
  return asJson(rows.map(toSummary));
}

export async function getStudy(db: Db, user: CurrentUser, id: string): Promise<StudyDetail> {
  await loadVisible(db, studies, id, user, 'That study');
  const [row] = await summaryQuery(db).where(eq(studies.id, id));
  const included = await db
    .select({ variant: variants })
    .from(studyVariants)
    .innerJoin(variants, eq(variants.id, studyVariants.variantId))
    .where(eq(studyVariants.studyId, id))
    .orderBy(asc(studyVariants.position));
  return asJson({ ...toSummary(row), variants: included.map((r) => r.variant) });
}

/** Everything a study points at must exist in the study's own team (and variants in its enzyme). */
async function checkReferences(tx: Tx, user: CurrentUser, teamId: string, input: Partial<StudyInput> & { enzymeId: string }) {
  const enzyme = await loadVisible(tx, enzymes, input.enzymeId, user, 'That enzyme');
  if (enzyme.teamId !== teamId) throw badRequest('The enzyme belongs to another team.', { enzymeId: 'Pick an enzyme of this team.' });
  if (input.variantIds) {
    const found = await tx.select({ id: variants.id }).from(variants).where(and(inArray(variants.id, input.variantIds), eq(variants.enzymeId, enzyme.id)));
    if (found.length !== new Set(input.variantIds).size) {
      throw badRequest('Every variant must belong to the study\'s enzyme.', { variantIds: 'Pick variants of this enzyme.' });
    }
  }
  if (input.assayId) {
    const assay = await loadVisible(tx, assays, input.assayId, user, 'That assay');
    if (assay.teamId !== teamId) throw badRequest('The assay belongs to another team.', { assayId: 'Pick an assay of this team.' });
  }
  if (input.bufferSeriesId) {
    const series = await loadVisible(tx, bufferSeries, input.bufferSeriesId, user, 'That buffer series');
    if (series.teamId !== teamId) throw badRequest('The buffer series belongs to another team.', { bufferSeriesId: 'Pick a series of this team.' });
  }
}

async function setVariants(tx: Tx, studyId: string, variantIds: string[]) {
  await tx.delete(studyVariants).where(eq(studyVariants.studyId, studyId));
  const unique = [...new Set(variantIds)];
  await tx.insert(studyVariants).values(unique.map((variantId, position) => ({ studyId, variantId, position })));
}

export async function createStudy(db: Db, actor: CurrentUser, input: StudyInput) {
  visible({ teamId: input.teamId }, actor, 'That team');
  return db.transaction(async (tx) => {
    await checkReferences(tx, actor, input.teamId, input);
    const { variantIds, ...fields } = input;
    const study = await insertAudited(tx, actor, 'study', studies, { ...fields, ownerId: actor.id });
    await setVariants(tx, study.id, variantIds);
    return study;
  });
}

export function assertEditable(study: { status: StudyStatus }) {
  if (study.status === 'approved') {
    throw conflict('This study is approved and locked; an admin can unlock it with a reason.', 'study_locked');
  }
  if (study.status === 'in_review') {
    throw conflict('This study is in review; it can be edited again once the lead returns it.', 'study_in_review');
  }
}

/** Loads a study for a change, refusing when it is locked or in review. */
export async function loadEditableStudy(tx: Tx, user: CurrentUser, id: string) {
  const study = await loadVisible(tx, studies, id, user, 'That study');
  assertEditable(study);
  return study;
}

export async function updateStudy(db: Db, actor: CurrentUser, id: string, change: Partial<Omit<StudyInput, 'teamId' | 'enzymeId'>>) {
  return db.transaction(async (tx) => {
    const before = await loadEditableStudy(tx, actor, id);
    await checkReferences(tx, actor, before.teamId, { ...change, enzymeId: before.enzymeId });
    const { variantIds, ...fields } = change;
    if (variantIds || fields.referenceVariantId) {
      const current = variantIds ?? (await tx.select().from(studyVariants).where(eq(studyVariants.studyId, id))).map((v) => v.variantId);
      const reference = fields.referenceVariantId ?? before.referenceVariantId;
      if (!current.includes(reference)) {
        throw badRequest('The reference variant must be one of the variants included.', { referenceVariantId: 'Include it first.' });
      }
    }
    const after = await updateAudited(tx, actor, 'study', studies, before, { ...fields, version: before.version + 1 });
    if (variantIds) await setVariants(tx, id, variantIds);
    return after;
  });
}

export async function deleteStudy(db: Db, actor: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const before = await loadEditableStudy(tx, actor, id);
    await deleteAudited(tx, actor, 'study', studies, before);
  });
}
