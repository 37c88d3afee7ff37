// Comparisons: profiles of variants across studies of one team, side by side and relative to a
// reference profile. Approved studies by default; others only when asked, and then marked.
import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import type { Units, VariantProfile } from '../../../shared/analysis';
import { compareProfiles, entryKey, type ComparisonEntryInput } from '../../../shared/comparison/compare';
import { fitGlobal } from '../../../shared/fitting';
import type { AvailableProfile, ComparisonInput, ComparisonView, SavedComparison } from '../../../shared/schemas/comparisons';
import type { Db } from '../../db/client';
import { assays, comparisons, plates, profileFits, readerFiles, studies, studyEvents, users, variants } from '../../db/schema';
import { badRequest, staleVersion } from '../../errors';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';
import { getAnalysis } from '../analysis/analysis';
import { asJson, deleteAudited, insertAudited, listScope, loadVisible, visible } from '../records/audited';

type StoredProfile = VariantProfile & { units: Units };

export async function availableProfiles(db: Db, user: CurrentUser, filter: { teamId?: string; includeUnapproved: boolean }): Promise<AvailableProfile[]> {
  const scope = listScope(user, filter.teamId);
  if (scope?.length === 0) return [];
  const rows = await db
    .select({ fit: profileFits, study: studies, variant: variants, assay: assays })
    .from(profileFits)
    .innerJoin(studies, eq(studies.id, profileFits.studyId))
    .innerJoin(variants, eq(variants.id, profileFits.variantId))
    .innerJoin(assays, eq(assays.id, studies.assayId))
    .where(and(scope ? inArray(studies.teamId, scope) : undefined, filter.includeUnapproved ? undefined : eq(studies.status, 'approved')))
    .orderBy(desc(studies.updatedAt), asc(variants.name));
  return asJson(
    rows.map(({ fit, study, variant, assay }) => ({
      studyId: study.id,
      studyName: study.name,
      studyStatus: study.status,
      approved: study.status === 'approved',
      teamId: study.teamId,
      variantId: variant.id,
      variantName: variant.name,
      isParent: variant.isParent,
      model: fit.model,
      pHopt: (fit.profile as StoredProfile).fit?.pHopt.value ?? null,
      assayName: assay.name,
      temperatureC: assay.temperatureC,
      computedAt: fit.computedAt,
    })),
  );
}

async function approvalOf(db: Db, studyId: string) {
  const [event] = await db
    .select({ at: studyEvents.createdAt, by: users.name })
    .from(studyEvents)
    .innerJoin(users, eq(users.id, studyEvents.authorId))
    .where(and(eq(studyEvents.studyId, studyId), eq(studyEvents.kind, 'approve')))
    .orderBy(desc(studyEvents.createdAt))
    .limit(1);
  return event ?? null;
}

/** Computes a comparison from the stored fits (analysing a study first if it never was). */
export async function computeComparison(db: Db, user: CurrentUser, input: ComparisonInput): Promise<ComparisonView> {
  visible({ teamId: input.teamId }, user, 'That team');
  const entries: ComparisonEntryInput[] = [];
  const provenance: ComparisonView['provenance'] = [];
  const units: Record<string, string> = {};
  for (const { studyId, variantId } of input.entries) {
    const study = await loadVisible(db, studies, studyId, user, 'That study');
    if (study.teamId !== input.teamId) throw badRequest(`"${study.name}" belongs to another team; a comparison stays inside one team.`, { entries: studyId });
    if (study.status !== 'approved' && !input.includeUnapproved) {
      throw badRequest(`"${study.name}" is not approved. Tick "include studies not yet approved" to compare it anyway.`, { includeUnapproved: 'Needed for this study.' });
    }
    let stored = await db.query.profileFits.findFirst({ where: and(eq(profileFits.studyId, studyId), eq(profileFits.variantId, variantId)) });
    if (!stored) {
      await getAnalysis(db, user, studyId);
      stored = await db.query.profileFits.findFirst({ where: and(eq(profileFits.studyId, studyId), eq(profileFits.variantId, variantId)) });
    }
    if (!stored) throw badRequest('That variant is not part of that study.', { entries: `${studyId}:${variantId}` });
    const assay = await db.query.assays.findFirst({ where: eq(assays.id, study.assayId) });
    const profile = stored.profile as StoredProfile;
    const key = entryKey({ studyId, variantId });
    units[key] = profile.units.activity;
    const approval = await approvalOf(db, studyId);
    const files = await db
      .select({ fileName: readerFiles.fileName, sha256: readerFiles.sha256 })
      .from(readerFiles)
      .innerJoin(plates, eq(plates.id, readerFiles.plateId))
      .where(eq(plates.studyId, studyId))
      .orderBy(asc(readerFiles.uploadedAt));
    provenance.push({
      rawFiles: files,
      key,
      engineVersion: stored.engineVersion,
      inputHash: stored.inputHash,
      computedAt: stored.computedAt.toISOString(),
      approvedAt: study.status === 'approved' ? (approval?.at.toISOString() ?? null) : null,
      approvedBy: study.status === 'approved' ? (approval?.by ?? null) : null,
    });
    entries.push({
      studyId,
      studyName: study.name,
      approved: study.status === 'approved',
      variantId,
      variantName: profile.name,
      assayId: study.assayId,
      assayName: assay?.name ?? '',
      temperatureC: assay?.temperatureC ?? Number.NaN,
      activityUnit: profile.units.activity,
      profile,
    });
  }
  const result = compareProfiles(entries, input.referenceKey);
  const curves = entries.map((e) => ({
    key: entryKey(e),
    label: `${e.variantName} — ${e.studyName}`,
    approved: e.approved,
    points: e.profile.relative?.points.map(({ pH, mean, sd }) => ({ pH, mean, sd })) ?? [],
    curve: e.profile.relative?.curve ?? null,
  }));
  let globalFit: ComparisonView['globalFit'] = null;
  if (input.globalFit) {
    const datasets = entries.map((e) => ({ id: entryKey(e), pH: e.profile.fitData.pH, v: e.profile.fitData.v }));
    const fitted = fitGlobal(datasets, { model: input.globalFit.model, shared: input.globalFit.shared });
    globalFit = fitted.ok
      ? { ...fitted.value, labels: Object.fromEntries(entries.map((e) => [entryKey(e), `${e.variantName} — ${e.studyName}`])) }
      : { error: fitted.error.message };
  }
  return asJson({ result, curves, units, globalFit, provenance });
}

const toSaved = (row: typeof comparisons.$inferSelect): SavedComparison => asJson(row);

export async function listComparisons(db: Db, user: CurrentUser, teamId?: string) {
  const scope = listScope(user, teamId);
  if (scope?.length === 0) return [];
  const rows = await db
    .select({ c: comparisons, by: users.name })
    .from(comparisons)
    .innerJoin(users, eq(users.id, comparisons.createdBy))
    .where(scope ? inArray(comparisons.teamId, scope) : undefined)
    .orderBy(desc(comparisons.updatedAt));
  const saved = rows.map(({ c, by }) => ({ ...toSaved(c), createdByName: by }));
  const labels = await entryLabels(db, saved.flatMap((c) => c.entries));
  return saved.map((c) => ({ ...c, labels: Object.fromEntries(c.entries.map((e) => [entryKey(e), labels.get(entryKey(e)) ?? null])) }));
}

/** "FR1-D92N — Study name" for each study:variant key that still exists. */
async function entryLabels(db: Db, entries: { studyId: string; variantId: string }[]) {
  const labels = new Map<string, string>();
  if (entries.length === 0) return labels;
  const studyRows = await db.select({ id: studies.id, name: studies.name }).from(studies).where(inArray(studies.id, [...new Set(entries.map((e) => e.studyId))]));
  const variantRows = await db.select({ id: variants.id, name: variants.name }).from(variants).where(inArray(variants.id, [...new Set(entries.map((e) => e.variantId))]));
  for (const e of entries) {
    const study = studyRows.find((x) => x.id === e.studyId);
    const variant = variantRows.find((x) => x.id === e.variantId);
    if (study && variant) labels.set(entryKey(e), `${variant.name} — ${study.name}`);
  }
  return labels;
}

export async function getComparison(db: Db, user: CurrentUser, id: string) {
  const row = await loadVisible(db, comparisons, id, user, 'That comparison');
  const creator = await db.query.users.findFirst({ where: eq(users.id, row.createdBy) });
  const saved = { ...toSaved(row), createdByName: creator?.name ?? '' };
  const view = await computeComparison(db, user, {
    teamId: saved.teamId,
    entries: saved.entries,
    referenceKey: saved.referenceKey,
    includeUnapproved: saved.includeUnapproved,
    globalFit: saved.globalFit,
  });
  return { ...saved, view };
}

export async function saveComparison(db: Db, user: CurrentUser, input: ComparisonInput & { name: string; notes: string }) {
  await computeComparison(db, user, input); // refuses what cannot be compared before anything is stored
  return db.transaction((tx) =>
    insertAudited(tx, user, 'comparison', comparisons, {
      teamId: input.teamId,
      name: input.name,
      notes: input.notes,
      entries: input.entries,
      referenceKey: input.referenceKey,
      includeUnapproved: input.includeUnapproved,
      globalFit: input.globalFit,
      createdBy: user.id,
    }),
  );
}

export async function updateComparison(db: Db, user: CurrentUser, id: string, input: ComparisonInput & { name: string; notes: string; version: number }) {
  const before = await loadVisible(db, comparisons, id, user, 'That comparison');
  if (input.teamId !== before.teamId) throw badRequest('A comparison stays in its team.', { teamId: 'Keep the team.' });
  await computeComparison(db, user, input);
  return db.transaction(async (tx) => {
    const [after] = await tx
      .update(comparisons)
      .set({ name: input.name, notes: input.notes, entries: input.entries, referenceKey: input.referenceKey, includeUnapproved: input.includeUnapproved, globalFit: input.globalFit, version: before.version + 1, updatedAt: new Date() })
      .where(and(eq(comparisons.id, id), eq(comparisons.version, input.version)))
      .returning();
    if (!after) {
      const [now] = await tx.select({ version: comparisons.version }).from(comparisons).where(eq(comparisons.id, id));
      throw staleVersion('This comparison was changed by someone else since you opened it; reload.', now?.version ?? before.version);
    }
    await writeAudit(tx, { actorId: user.id, teamId: after.teamId, entity: 'comparison', entityId: id, action: 'update', before, after });
    return toSaved(after);
  });
}

export async function deleteComparison(db: Db, user: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const before = await loadVisible(tx, comparisons, id, user, 'That comparison');
    await deleteAudited(tx, user, 'comparison', comparisons, before);
  });
}
