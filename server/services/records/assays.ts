import { asc, count, eq, inArray } from 'drizzle-orm';
import { assayCautions, assayProblems } from '../../../shared/schemas/assays';
import type { Assay, AssayDetail } from '../../../shared/schemas/records-types';
import type { Db } from '../../db/client';
import { assays, studies, teams } from '../../db/schema';
import { badRequest, conflict } from '../../errors';
import type { CurrentUser } from '../../types';
import { asJson, deleteAudited, insertAudited, listScope, loadVisible, updateAudited, visible } from './audited';

type AssayInput = Omit<typeof assays.$inferInsert, 'id' | 'createdBy' | 'createdAt' | 'updatedAt'>;

export async function listAssays(db: Db, user: CurrentUser, teamId?: string): Promise<(Assay & { teamName: string })[]> {
  const scope = listScope(user, teamId);
  if (scope?.length === 0) return [];
  const rows = await db
    .select({ assay: assays, teamName: teams.name })
    .from(assays)
    .innerJoin(teams, eq(teams.id, assays.teamId))
    .where(scope ? inArray(assays.teamId, scope) : undefined)
    .orderBy(asc(assays.name));
  return asJson(rows.map((r) => ({ ...r.assay, teamName: r.teamName })));
}

export async function getAssay(db: Db, user: CurrentUser, id: string): Promise<AssayDetail> {
  const assay = await loadVisible(db, assays, id, user, 'That assay');
  const team = await db.query.teams.findFirst({ where: eq(teams.id, assay.teamId) });
  const [{ studyCount }] = await db.select({ studyCount: count() }).from(studies).where(eq(studies.assayId, id));
  return asJson({ ...assay, teamName: team?.name ?? '', studyCount, cautions: assayCautions(assay as Parameters<typeof assayCautions>[0]) });
}

export async function createAssay(db: Db, actor: CurrentUser, input: AssayInput) {
  visible({ teamId: input.teamId }, actor, 'That team');
  return db.transaction((tx) => insertAudited(tx, actor, 'assay', assays, { ...input, createdBy: actor.id }));
}

export async function updateAssay(db: Db, actor: CurrentUser, id: string, change: Partial<AssayInput>) {
  return db.transaction(async (tx) => {
    const before = await loadVisible(tx, assays, id, actor, 'That assay');
    const problems = assayProblems({ ...before, ...change } as Parameters<typeof assayProblems>[0]);
    if (Object.keys(problems).length) throw badRequest(`Invalid request body. ${Object.values(problems)[0]}`, problems);
    return updateAudited(tx, actor, 'assay', assays, before, change);
  });
}

export async function deleteAssay(db: Db, actor: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const before = await loadVisible(tx, assays, id, actor, 'That assay');
    const used = await tx.$count(studies, eq(studies.assayId, id));
    if (used > 0) throw conflict(`This assay is used by ${used} stud${used === 1 ? 'y' : 'ies'}.`, 'in_use');
    await deleteAudited(tx, actor, 'assay', assays, before);
  });
}
