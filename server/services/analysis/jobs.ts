// Bootstrap intervals for a whole study run as a background job (pg-boss): the page stays usable
// and shows progress from the job row. Profiles are resampled one at a time, yielding between
// them, so the server keeps answering while a job runs.
import { desc, eq } from 'drizzle-orm';
import { bootstrapProfile, type AnalysisResult } from '../../../shared/analysis';
import type { AppContext } from '../../context';
import type { Db } from '../../db/client';
import { analysisJobs, analysisRuns, studies } from '../../db/schema';
import { conflict } from '../../errors';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';
import { loadVisible } from '../records/audited';
import { assertEditable } from '../records/studies';
import { getAnalysis, jobView, type BootstrapStore } from './analysis';
import { buildAnalysisInput, hashAnalysisInput } from './input';

export const bootstrapQueue = 'study-bootstrap';

export async function startBootstrap(ctx: AppContext, user: CurrentUser, studyId: string, resamples: number) {
  const analysis = await getAnalysis(ctx.db, user, studyId);
  const study = await loadVisible(ctx.db, studies, studyId, user, 'That study');
  assertEditable(study);
  const running = await ctx.db
    .select()
    .from(analysisJobs)
    .where(eq(analysisJobs.studyId, studyId))
    .orderBy(desc(analysisJobs.createdAt))
    .limit(1);
  if (running[0] && (running[0].state === 'queued' || running[0].state === 'running')) {
    throw conflict('A bootstrap for this study is already running; wait for it to finish.', 'job_running');
  }
  const fitted = analysis.result.profiles.filter((p) => p.fit).length;
  if (fitted === 0) throw conflict('No profile has a fit yet, so there is nothing to bootstrap.', 'nothing_to_do');
  const job = await ctx.db.transaction(async (tx) => {
    const [row] = await tx
      .insert(analysisJobs)
      .values({ teamId: study.teamId, studyId, kind: 'bootstrap', inputHash: analysis.inputHash, total: fitted * resamples, options: { resamples }, requestedBy: user.id })
      .returning();
    await writeAudit(tx, { actorId: user.id, teamId: study.teamId, entity: 'analysis-job', entityId: row.id, action: 'start', after: { studyId, kind: 'bootstrap', resamples } });
    return row;
  });
  await ctx.jobs.send(bootstrapQueue, { jobId: job.id });
  return jobView(job, analysis.inputHash);
}

export async function getJob(db: Db, user: CurrentUser, jobId: string) {
  const job = await loadVisible(db, analysisJobs, jobId, user, 'That job');
  const run = await db.query.analysisRuns.findFirst({ where: eq(analysisRuns.studyId, job.studyId) });
  return jobView(job, run?.inputHash ?? null);
}

const yieldToEventLoop = () => new Promise<void>((resolve) => setImmediate(resolve));

/** The worker: resamples each fitted profile, reports progress, stores the intervals with their input hash. */
export async function runBootstrapJob(db: Db, jobId: string) {
  const job = await db.query.analysisJobs.findFirst({ where: eq(analysisJobs.id, jobId) });
  if (!job || job.state !== 'queued') return;
  await db.update(analysisJobs).set({ state: 'running', startedAt: new Date() }).where(eq(analysisJobs.id, jobId));
  try {
    const study = await db.query.studies.findFirst({ where: eq(studies.id, job.studyId) });
    const run = await db.query.analysisRuns.findFirst({ where: eq(analysisRuns.studyId, job.studyId) });
    if (!study || !run) throw new Error('The study or its analysis is gone.');
    const { input } = await buildAnalysisInput(db, study);
    if (hashAnalysisInput(input) !== job.inputHash || run.inputHash !== job.inputHash) {
      throw new Error('The study changed after the bootstrap was started; start it again.');
    }
    const result = run.result as AnalysisResult;
    const resamples = (job.options as { resamples: number }).resamples;
    const store: BootstrapStore = { resamples, profiles: {} };
    let done = 0;
    for (const [index, profile] of result.profiles.entries()) {
      if (!profile.fit) continue;
      const boot = bootstrapProfile(profile, { resamples, seed: 1 + index });
      if (boot.ok) store.profiles[profile.variantId] = { fit: boot.value.fit, bootstrap: boot.value.bootstrap };
      done += resamples;
      await db.update(analysisJobs).set({ done }).where(eq(analysisJobs.id, jobId));
      await yieldToEventLoop();
    }
    await db.transaction(async (tx) => {
      await tx.update(analysisRuns).set({ bootstrap: store, bootstrapHash: job.inputHash, bootstrapAt: new Date() }).where(eq(analysisRuns.studyId, job.studyId));
      await tx.update(analysisJobs).set({ state: 'done', done: job.total, finishedAt: new Date() }).where(eq(analysisJobs.id, jobId));
    });
  } catch (error) {
    await db
      .update(analysisJobs)
      .set({ state: 'failed', error: error instanceof Error ? error.message : String(error), finishedAt: new Date() })
      .where(eq(analysisJobs.id, jobId));
  }
}
