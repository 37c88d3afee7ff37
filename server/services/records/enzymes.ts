// Enzymes with their variants and preparations.
import { and, asc, count, eq, inArray } from 'drizzle-orm';
import type { EnzymeDetail, EnzymeSummary } from '../../../shared/schemas/records-types';
import type { Db } from '../../db/client';
import { enzymes, preparations, studies, studyVariants, teams, variants } from '../../db/schema';
import { conflict } from '../../errors';
import type { CurrentUser } from '../../types';
import { asJson, deleteAudited, insertAudited, listScope, loadVisible, updateAudited, visible } from './audited';

type EnzymeInput = { teamId: string; name: string; organism: string; notes: string };
type VariantInput = { name: string; mutations: string; isParent: boolean; notes: string };
type PreparationInput = { lot: string; proteinMgPerMl: number; preparedOn: string; storageBuffer: string; notes: string };

export async function listEnzymes(db: Db, user: CurrentUser, teamId?: string): Promise<EnzymeSummary[]> {
  const scope = listScope(user, teamId);
  if (scope?.length === 0) return [];
  const rows = await db
    .select({ enzyme: enzymes, teamName: teams.name, variantCount: count(variants.id) })
    .from(enzymes)
    .innerJoin(teams, eq(teams.id, enzymes.teamId))
    .leftJoin(variants, eq(variants.enzymeId, enzymes.id))
    .where(scope ? inArray(enzymes.teamId, scope) : undefined)
    .groupBy(enzymes.id, teams.name)
    .orderBy(asc(enzymes.name));
  return asJson(rows.map((r) => ({ ...r.enzyme, teamName: r.teamName, variantCount: r.variantCount })));
}

export async function getEnzyme(db: Db, user: CurrentUser, id: string): Promise<EnzymeDetail> {
  const enzyme = await loadVisible(db, enzymes, id, user, 'That enzyme');
  const team = await db.query.teams.findFirst({ where: eq(teams.id, enzyme.teamId) });
  const vs = await db.select().from(variants).where(eq(variants.enzymeId, id)).orderBy(asc(variants.isParent), asc(variants.name));
  const preps = vs.length
    ? await db.select().from(preparations).where(inArray(preparations.variantId, vs.map((v) => v.id))).orderBy(asc(preparations.preparedOn))
    : [];
  const [{ studyCount }] = await db.select({ studyCount: count() }).from(studies).where(eq(studies.enzymeId, id));
  // The parent first, then variants by name.
  const ordered = [...vs.filter((v) => v.isParent), ...vs.filter((v) => !v.isParent)];
  return asJson({
    ...enzyme,
    teamName: team?.name ?? '',
    studyCount,
    variants: ordered.map((v) => ({ ...v, preparations: preps.filter((p) => p.variantId === v.id) })),
  });
}

export async function createEnzyme(db: Db, actor: CurrentUser, input: EnzymeInput) {
  visible({ teamId: input.teamId }, actor, 'That team');
  return db.transaction((tx) => insertAudited(tx, actor, 'enzyme', enzymes, { ...input, createdBy: actor.id }));
}

export async function updateEnzyme(db: Db, actor: CurrentUser, id: string, change: Partial<EnzymeInput>) {
  return db.transaction(async (tx) => {
    const before = await loadVisible(tx, enzymes, id, actor, 'That enzyme');
    return updateAudited(tx, actor, 'enzyme', enzymes, before, change);
  });
}

export async function deleteEnzyme(db: Db, actor: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const before = await loadVisible(tx, enzymes, id, actor, 'That enzyme');
    const used = await tx.$count(studies, eq(studies.enzymeId, id));
    if (used > 0) throw conflict(`This enzyme is used by ${used} stud${used === 1 ? 'y' : 'ies'}; delete those first.`, 'in_use');
    await deleteAudited(tx, actor, 'enzyme', enzymes, before);
  });
}

async function assertOneParent(tx: Parameters<Parameters<Db['transaction']>[0]>[0], enzymeId: string, exceptId?: string) {
  const parents = await tx.select({ id: variants.id }).from(variants).where(and(eq(variants.enzymeId, enzymeId), eq(variants.isParent, true)));
  if (parents.some((p) => p.id !== exceptId)) throw conflict('This enzyme already has a parent (wild type).', 'parent_exists');
}

export async function createVariant(db: Db, actor: CurrentUser, enzymeId: string, input: VariantInput) {
  return db.transaction(async (tx) => {
    const enzyme = await loadVisible(tx, enzymes, enzymeId, actor, 'That enzyme');
    if (input.isParent) await assertOneParent(tx, enzymeId);
    const clash = await tx.$count(variants, and(eq(variants.enzymeId, enzymeId), eq(variants.name, input.name)));
    if (clash) throw conflict(`A variant named "${input.name}" exists already.`, 'name_taken');
    return insertAudited(tx, actor, 'variant', variants, { ...input, enzymeId, teamId: enzyme.teamId });
  });
}

export async function updateVariant(db: Db, actor: CurrentUser, id: string, change: Partial<VariantInput>) {
  return db.transaction(async (tx) => {
    const before = await loadVisible(tx, variants, id, actor, 'That variant');
    if (change.isParent) await assertOneParent(tx, before.enzymeId, id);
    if (change.name && change.name !== before.name) {
      const clash = await tx.$count(variants, and(eq(variants.enzymeId, before.enzymeId), eq(variants.name, change.name)));
      if (clash) throw conflict(`A variant named "${change.name}" exists already.`, 'name_taken');
    }
    return updateAudited(tx, actor, 'variant', variants, before, change);
  });
}

export async function deleteVariant(db: Db, actor: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const before = await loadVisible(tx, variants, id, actor, 'That variant');
    const used = await tx.$count(studyVariants, eq(studyVariants.variantId, id));
    if (used > 0) throw conflict('This variant is part of a study; remove it from the study first.', 'in_use');
    await deleteAudited(tx, actor, 'variant', variants, before);
  });
}

export async function createPreparation(db: Db, actor: CurrentUser, variantId: string, input: PreparationInput) {
  return db.transaction(async (tx) => {
    const variant = await loadVisible(tx, variants, variantId, actor, 'That variant');
    return insertAudited(tx, actor, 'preparation', preparations, { ...input, variantId, teamId: variant.teamId });
  });
}

export async function updatePreparation(db: Db, actor: CurrentUser, id: string, change: Partial<PreparationInput>) {
  return db.transaction(async (tx) => {
    const before = await loadVisible(tx, preparations, id, actor, 'That preparation');
    return updateAudited(tx, actor, 'preparation', preparations, before, change);
  });
}

export async function deletePreparation(db: Db, actor: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const before = await loadVisible(tx, preparations, id, actor, 'That preparation');
    await deleteAudited(tx, actor, 'preparation', preparations, before);
  });
}
