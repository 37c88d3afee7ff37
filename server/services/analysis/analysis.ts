// A study's analysis: computed from the shared code on the server, stored with the engine version
// and the hash of its inputs (reused while nothing changes), refitted at once after every
// exclusion or settings change. Approved studies show their stored result, frozen.
import { and, desc, eq, inArray } from 'drizzle-orm';
import { analyseStudy, type AnalysisResult, type VariantProfile } from '../../../shared/analysis';
import type { BootstrapSummary } from '../../../shared/fitting';
import type { AnalysisJob, ExclusionCreate, ExclusionView, RecomputeComparison, StudyAnalysis, StudyAnalysisSettings } from '../../../shared/schemas/analysis';
import type { DesignedSeries } from '../../../shared/schemas/buffer-series';
import type { Db, DbOrTx } from '../../db/client';
import { analysisJobs, analysisRuns, analysisSettings, bufferSeries, exclusions, plates, preparations, profileFits, reads, studies, studyVariants, users } from '../../db/schema';
import { AppError, badRequest, conflict, staleVersion } from '../../errors';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';
import { asJson, loadVisible } from '../records/audited';
import { loadEditableStudy } from '../records/studies';
import { buildAnalysisInput, hashAnalysisInput, hashProfileInput } from './input';

type Study = typeof studies.$inferSelect;
type Run = typeof analysisRuns.$inferSelect;
export type BootstrapStore = { resamples: number; profiles: Record<string, { fit: VariantProfile['fit']; bootstrap: BootstrapSummary | null }> };

/** Computes and stores the analysis for `input`, with one stored fit per variant. */
async function computeAndStore(db: Db, study: Study, built: Awaited<ReturnType<typeof buildAnalysisInput>>, hash: string) {
  const analysed = analyseStudy(built.input);
  if (!analysed.ok) throw new AppError(`analysis_${analysed.error.code}`, analysed.error.message, 422);
  const result = analysed.value;
  const computedAt = new Date();
  await db.transaction(async (tx) => {
    const values = { teamId: study.teamId, engineVersion: result.engineVersion, analysisVersion: result.analysisVersion, inputHash: hash, result, computedAt };
    await tx.insert(analysisRuns).values({ studyId: study.id, ...values }).onConflictDoUpdate({ target: analysisRuns.studyId, set: values });
    for (const profile of result.profiles) {
      const fitValues = {
        teamId: study.teamId,
        engineVersion: result.engineVersion,
        inputHash: hashProfileInput({ fitData: profile.fitData, selection: profile.selection?.requested ?? null, units: result.units }),
        model: profile.fit?.model ?? null,
        profile: { ...profile, units: result.units },
        computedAt,
      };
      await tx
        .insert(profileFits)
        .values({ studyId: study.id, variantId: profile.variantId, ...fitValues })
        .onConflictDoUpdate({ target: [profileFits.studyId, profileFits.variantId], set: fitValues });
    }
  });
  return { result, computedAt };
}

/** Bootstrap intervals belong to the input they were computed from; graft them when it is this one. */
function withBootstrap(result: AnalysisResult, run: Run | undefined, hash: string): { result: AnalysisResult; current: boolean } {
  const store = run?.bootstrap as BootstrapStore | null | undefined;
  if (!store || run?.bootstrapHash !== hash) return { result, current: false };
  const profiles = result.profiles.map((p) => {
    const boot = store.profiles[p.variantId];
    return boot ? { ...p, fit: boot.fit ?? p.fit, bootstrap: boot.bootstrap } : p;
  });
  return { result: { ...result, profiles }, current: true };
}

async function exclusionViews(db: DbOrTx, studyId: string): Promise<ExclusionView[]> {
  const rows = await db
    .select({ e: exclusions, plateName: plates.name, createdBy: users.name })
    .from(exclusions)
    .innerJoin(plates, eq(plates.id, exclusions.plateId))
    .innerJoin(users, eq(users.id, exclusions.createdBy))
    .where(eq(exclusions.studyId, studyId))
    .orderBy(desc(exclusions.createdAt));
  const lifters = await db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, rows.map((r) => r.e.liftedBy).filter((x): x is string => !!x).concat(['00000000-0000-0000-0000-000000000000'])));
  return asJson(
    rows.map(({ e, plateName, createdBy }) => ({
      id: e.id,
      plateId: e.plateId,
      plateName,
      well: e.well,
      reason: e.reason,
      createdBy,
      createdAt: e.createdAt,
      liftedAt: e.liftedAt,
      liftedBy: lifters.find((l) => l.id === e.liftedBy)?.name ?? null,
      liftReason: e.liftReason,
    })),
  );
}

export async function latestJob(db: DbOrTx, studyId: string, hash: string): Promise<AnalysisJob | null> {
  const [job] = await db.select().from(analysisJobs).where(eq(analysisJobs.studyId, studyId)).orderBy(desc(analysisJobs.createdAt)).limit(1);
  return job ? jobView(job, hash) : null;
}

export const jobView = (job: typeof analysisJobs.$inferSelect, hash: string | null): AnalysisJob =>
  asJson({
    id: job.id,
    kind: job.kind,
    state: job.state,
    done: job.done,
    total: job.total,
    error: job.error,
    createdAt: job.createdAt,
    finishedAt: job.finishedAt,
    current: hash !== null && job.inputHash === hash,
  });

/** The analysis as the study's page shows it; computed (and stored) when its inputs changed. */
export async function getAnalysis(db: Db, user: CurrentUser, studyId: string): Promise<StudyAnalysis> {
  const study = await loadVisible(db, studies, studyId, user, 'That study');
  const built = await buildAnalysisInput(db, study);
  const hash = hashAnalysisInput(built.input);
  const run = await db.query.analysisRuns.findFirst({ where: eq(analysisRuns.studyId, studyId) });
  const frozen = study.status === 'approved' && !!run;
  let result: AnalysisResult;
  let computedAt: Date;
  if (frozen || (run && run.inputHash === hash)) {
    result = run!.result as AnalysisResult;
    computedAt = run!.computedAt;
  } else {
    ({ result, computedAt } = await computeAndStore(db, study, built, hash));
  }
  const effectiveHash = frozen ? run!.inputHash : hash;
  const boot = withBootstrap(result, run, effectiveHash);
  const store = run?.bootstrap as BootstrapStore | null | undefined;
  return {
    studyId,
    inputHash: effectiveHash,
    computedAt: computedAt.toISOString(),
    frozen,
    settings: built.settings,
    settingsVersion: built.settingsVersion,
    exclusions: await exclusionViews(db, studyId),
    result: boot.result,
    bootstrap: { current: boot.current, at: boot.current ? (run?.bootstrapAt?.toISOString() ?? null) : null, resamples: boot.current ? (store?.resamples ?? null) : null },
    job: await latestJob(db, studyId, effectiveHash),
    wellPh: await predictedWellPh(db, study),
    plateReads: built.usedReads,
    assay: built.assay,
  };
}

/** The series designer's predicted well pH at each point; drift beyond 0.05 pH is marked (SCIENCE.md §2.6). */
async function predictedWellPh(db: DbOrTx, study: Study): Promise<StudyAnalysis['wellPh']> {
  if (!study.bufferSeriesId) return [];
  const series = await db.query.bufferSeries.findFirst({ where: eq(bufferSeries.id, study.bufferSeriesId) });
  const design = series?.design as DesignedSeries | undefined;
  return (design?.points ?? []).map((p) => ({
    pH: p.pH,
    buffer: p.proposal?.systemId ?? null,
    predicted: p.well?.pH ?? null,
    drift: p.well?.drift ?? null,
    overLimit: p.well ? Math.abs(p.well.drift) > 0.05 : false,
  }));
}

/** Recomputes an analysis from its inputs without storing it, and says what differs from the stored one. */
export async function recomputeAndCompare(db: Db, user: CurrentUser, studyId: string): Promise<RecomputeComparison> {
  const study = await loadVisible(db, studies, studyId, user, 'That study');
  const built = await buildAnalysisInput(db, study);
  const run = await db.query.analysisRuns.findFirst({ where: eq(analysisRuns.studyId, studyId) });
  const fresh = analyseStudy(built.input);
  if (!fresh.ok) throw new AppError(`analysis_${fresh.error.code}`, fresh.error.message, 422);
  const stored = run?.result as AnalysisResult | undefined;
  const differences = fresh.value.profiles.map((p) => {
    const before = stored?.profiles.find((s) => s.variantId === p.variantId);
    const names = p.fit?.parameterNames ?? [];
    const parameters = Object.fromEntries(
      names.map((n) => {
        const now = p.fit?.parameters[n]?.value ?? null;
        const then = before?.fit?.parameters[n]?.value ?? null;
        return [n, { stored: then, recomputed: now, relativeDifference: now !== null && then !== null && then !== 0 ? Math.abs(now - then) / Math.abs(then) : null }];
      }),
    );
    return { variantId: p.variantId, name: p.name, model: { stored: before?.fit?.model ?? null, recomputed: p.fit?.model ?? null }, parameters };
  });
  return {
    stored: run ? { inputHash: run.inputHash, engineVersion: run.engineVersion, analysisVersion: run.analysisVersion, computedAt: run.computedAt.toISOString() } : null,
    recomputed: { inputHash: hashAnalysisInput(built.input), engineVersion: fresh.value.engineVersion, analysisVersion: fresh.value.analysisVersion },
    sameInputs: run?.inputHash === hashAnalysisInput(built.input),
    differences,
  };
}

const staleSettings = (current: number) =>
  staleVersion('The analysis settings were changed by someone else since you opened them; reload.', current);

export async function saveSettings(db: Db, user: CurrentUser, studyId: string, version: number, settings: StudyAnalysisSettings) {
  await db.transaction(async (tx) => {
    const study = await loadEditableStudy(tx, user, studyId);
    const studyPlates = await tx.select({ id: plates.id }).from(plates).where(eq(plates.studyId, studyId));
    const plateIds = new Set(studyPlates.map((p) => p.id));
    const included = new Set((await tx.select().from(studyVariants).where(eq(studyVariants.studyId, studyId))).map((v) => v.variantId));
    const unknown = (keys: string[], known: Set<string>) => keys.find((k) => !known.has(k));
    const badPlate = unknown([...Object.keys(settings.plateReads ?? {}), ...Object.keys(settings.rateWindows?.plate ?? {})], plateIds);
    if (badPlate) throw badRequest('A setting names a plate that is not in this study.', { settings: badPlate });
    const badVariant = unknown([...Object.keys(settings.models ?? {}), ...Object.keys(settings.preparations ?? {}), ...Object.keys(settings.rateWindows?.variant ?? {})], included);
    if (badVariant) throw badRequest('A setting names a variant that is not in this study.', { settings: badVariant });
    for (const [plateId, readId] of Object.entries(settings.plateReads ?? {})) {
      const read = await tx.query.reads.findFirst({ where: and(eq(reads.id, readId), eq(reads.plateId, plateId)) });
      if (!read) throw badRequest('A chosen read does not belong to its plate.', { settings: readId });
    }
    for (const [variantId, prepId] of Object.entries(settings.preparations ?? {})) {
      const prep = await tx.query.preparations.findFirst({ where: and(eq(preparations.id, prepId), eq(preparations.variantId, variantId)) });
      if (!prep) throw badRequest('A chosen preparation does not belong to its variant.', { settings: prepId });
    }
    const current = await tx.query.analysisSettings.findFirst({ where: eq(analysisSettings.studyId, studyId) });
    const currentVersion = current?.version ?? 1;
    if (currentVersion !== version) throw staleSettings(currentVersion);
    const values = { teamId: study.teamId, settings, version: currentVersion + 1, updatedBy: user.id, updatedAt: new Date() };
    const saved = current
      ? await tx.update(analysisSettings).set(values).where(and(eq(analysisSettings.studyId, studyId), eq(analysisSettings.version, version))).returning()
      : await tx.insert(analysisSettings).values({ studyId, ...values }).onConflictDoNothing().returning();
    if (saved.length === 0) {
      const now = await tx.query.analysisSettings.findFirst({ where: eq(analysisSettings.studyId, studyId) });
      throw staleSettings(now?.version ?? currentVersion);
    }
    // Settings the engine cannot work with are refused before they are kept (the transaction rolls back).
    const check = analyseStudy((await buildAnalysisInput(tx, study)).input);
    if (!check.ok && check.error.code !== 'no_reads' && check.error.code !== 'no_plates') {
      throw new AppError(`analysis_${check.error.code}`, `These settings cannot be used: ${check.error.message}`, 422);
    }
    await writeAudit(tx, { actorId: user.id, teamId: study.teamId, entity: 'analysis-settings', entityId: studyId, action: 'update', before: current?.settings ?? {}, after: settings });
  });
  return getAnalysis(db, user, studyId);
}

/** Excludes wells of one or several plates of the study with one reason, in one transaction. */
export async function excludeWells(db: Db, user: CurrentUser, studyId: string, input: ExclusionCreate) {
  await db.transaction(async (tx) => {
    const study = await loadEditableStudy(tx, user, studyId);
    const byPlate = new Map<string, string[]>();
    for (const { plateId, well } of input.wells) {
      const list = byPlate.get(plateId) ?? [];
      if (!list.includes(well)) list.push(well);
      byPlate.set(plateId, list);
    }
    let added = 0;
    for (const [plateId, wells] of byPlate) {
      const plate = await loadVisible(tx, plates, plateId, user, 'That plate');
      if (plate.studyId !== studyId) throw badRequest('That plate belongs to another study.', { plateId: 'Pick a plate of this study.' });
      const mapped = (plate.map as { wells: Record<string, unknown> }).wells;
      const unmapped = wells.filter((w) => !(w in mapped));
      if (unmapped.length) {
        const where = byPlate.size > 1 ? ` of ${plate.name}` : '';
        throw badRequest(`${unmapped.join(', ')}${where} ${unmapped.length === 1 ? 'has' : 'have'} no role in the plate map.`, { wells: unmapped.join(', ') });
      }
      const activeAlready = new Set(
        (await tx.select().from(exclusions).where(and(eq(exclusions.plateId, plateId), inArray(exclusions.well, wells)))).filter((e) => !e.liftedAt).map((e) => e.well),
      );
      const toAdd = wells.filter((w) => !activeAlready.has(w));
      if (toAdd.length === 0) continue;
      const rows = await tx
        .insert(exclusions)
        .values(toAdd.map((well) => ({ teamId: study.teamId, studyId, plateId, well, reason: input.reason, createdBy: user.id })))
        .returning();
      added += rows.length;
      for (const row of rows) {
        await writeAudit(tx, { actorId: user.id, teamId: study.teamId, entity: 'exclusion', entityId: row.id, action: 'exclude', after: { studyId, plateId: row.plateId, plateName: plate.name, well: row.well, reason: row.reason } });
      }
    }
    if (added === 0) throw conflict('Those wells are already excluded.', 'already_excluded');
  });
  return getAnalysis(db, user, studyId);
}

export async function liftExclusion(db: Db, user: CurrentUser, exclusionId: string, reason: string) {
  const studyId = await db.transaction(async (tx) => {
    const exclusion = await loadVisible(tx, exclusions, exclusionId, user, 'That exclusion');
    await loadEditableStudy(tx, user, exclusion.studyId);
    if (exclusion.liftedAt) throw conflict('This well is already included again.', 'already_included');
    await tx.update(exclusions).set({ liftedAt: new Date(), liftedBy: user.id, liftReason: reason }).where(eq(exclusions.id, exclusionId));
    await writeAudit(tx, {
      actorId: user.id,
      teamId: exclusion.teamId,
      entity: 'exclusion',
      entityId: exclusionId,
      action: 'include',
      before: { well: exclusion.well, reason: exclusion.reason },
      after: { well: exclusion.well, liftReason: reason },
    });
    return exclusion.studyId;
  });
  return getAnalysis(db, user, studyId);
}
