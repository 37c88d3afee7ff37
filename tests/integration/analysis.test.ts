// Analysis over HTTP on the real database, with the demo seed's generated study: every well follows
// invented "true" bell-curve parameters with noise added (server/db/seed/demo-reads.ts, generated).
// Rates, blanks and fits run on the server; exclusions refit at once and are audited; approval
// locks every mutating route of the study; the bootstrap runs as a pg-boss job.
import fs from 'node:fs';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StudyAnalysis } from '../../shared/schemas/analysis';
import { analysisJobs, auditLog, plates, reads, studies } from '../../server/db/schema';
import { seedDemo } from '../../server/db/seed';
import { demoTruth } from '../../server/db/seed/demo-reads';
import { latestMail, linkIn, startTestApp, type TestApp } from './helpers/app';
import { signIn } from './helpers/session';

let t: TestApp;
let scientist: Awaited<ReturnType<typeof signIn>>;
let lead: Awaited<ReturnType<typeof signIn>>;
let kineticStudyId: string;

beforeAll(async () => {
  t = await startTestApp();
  await seedDemo(t.db);
  scientist = await signIn(t, 'scientist@example.org', 'fennel-ridge-demo');
  lead = await signIn(t, 'lead@example.org', 'fennel-ridge-demo');
  const [study] = await t.db.select().from(studies).where(eq(studies.name, 'FR1 variants, kinetic pH profile (demo)'));
  kineticStudyId = study.id;
}, 180_000);
afterAll(() => t?.close());

type Who = typeof scientist;
const send = (who: Who, method: 'post' | 'put' | 'patch' | 'delete', path: string, body?: object) =>
  who.agent[method](path).set('X-CSRF-Token', who.csrf).send(body);

describe('analysis of the generated kinetic study', () => {
  it('when the study is analysed, then every variant is fitted and the true pKa values lie within the 95 % intervals', async () => {
    const res = await scientist.agent.get(`/api/studies/${kineticStudyId}/analysis`).expect(200);
    const analysis = res.body as StudyAnalysis;
    expect(analysis.result.profiles).toHaveLength(5);
    let inside = 0;
    let checked = 0;
    for (const profile of analysis.result.profiles) {
      const truth = demoTruth[profile.name];
      expect(profile.fit, profile.name).not.toBeNull();
      for (const [name, value] of [['pKa1', truth.pKa1], ['pKa2', truth.pKa2]] as const) {
        const ci = profile.fit!.parameters[name]?.ci95;
        if (!ci) continue;
        checked += 1;
        if (ci[0] <= value && value <= ci[1]) inside += 1;
      }
    }
    // Ten 95 % intervals: all ten inside is the usual outcome; one miss is within chance (generated data, fixed seeds).
    expect(checked).toBeGreaterThanOrEqual(8);
    expect(inside).toBeGreaterThanOrEqual(checked - 1);
    expect(analysis.result.units.activity).toBeTruthy();
    // The demo series adds enzyme (in 20 mM Tris pH 7.5) and substrate to each well: the predicted pH is reported per point.
    expect(analysis.wellPh).toHaveLength(12);
    expect(analysis.wellPh.every((w) => w.predicted !== null && Math.abs(w.predicted - w.pH) < 1)).toBe(true);
    // A second read of the unchanged study reuses the stored result (same hash and time).
    const again = await scientist.agent.get(`/api/studies/${kineticStudyId}/analysis`).expect(200);
    expect(again.body.inputHash).toBe(analysis.inputHash);
    expect(again.body.computedAt).toBe(analysis.computedAt);
  });

  it('when a well is excluded with a reason, then the fit changes, the reason shows, and the audit log has it', async () => {
    const before = (await scientist.agent.get(`/api/studies/${kineticStudyId}/analysis`).expect(200)).body as StudyAnalysis;
    const [plate] = await t.db.select().from(plates).where(eq(plates.studyId, kineticStudyId)).orderBy(plates.createdAt).limit(1);
    const wt = before.result.profiles.find((p) => p.name === 'FR1-WT')!;
    const res = await send(scientist, 'post', `/api/studies/${kineticStudyId}/exclusions`, { plateId: plate.id, wells: ['A6'], reason: 'Bubble seen in the well at the first read.' }).expect(201);
    const after = res.body as StudyAnalysis;
    const wtAfter = after.result.profiles.find((p) => p.name === 'FR1-WT')!;
    expect(after.inputHash).not.toBe(before.inputHash);
    expect(wtAfter.fit!.ssr).not.toBe(wt.fit!.ssr);
    const row = after.result.wells.find((w) => w.plateId === plate.id && w.well === 'A6')!;
    expect(row).toMatchObject({ excluded: true, exclusion: { reason: 'Bubble seen in the well at the first read.' } });
    expect(after.exclusions).toContainEqual(expect.objectContaining({ well: 'A6', reason: 'Bubble seen in the well at the first read.' }));
    const audits = await t.db.select().from(auditLog).where(and(eq(auditLog.entity, 'exclusion'), eq(auditLog.action, 'exclude')));
    expect(audits.map((a) => a.after)).toContainEqual(expect.objectContaining({ well: 'A6', reason: 'Bubble seen in the well at the first read.'}));

    const noReason = await send(scientist, 'post', `/api/studies/${kineticStudyId}/exclusions`, { plateId: plate.id, wells: ['A7'], reason: '' });
    expect(noReason.status).toBe(400);
    const a6 = after.exclusions.find((e) => e.well === 'A6' && !e.liftedAt)!;
    const lifted = await send(scientist, 'post', `/api/exclusions/${a6.id}/lift`, { reason: 'Bubble was on the lid, not in the well.' }).expect(200);
    expect((lifted.body as StudyAnalysis).inputHash).toBe(before.inputHash);
  });

  it('when wells of two plates are excluded in one request, then all are kept or, if one is wrong, none', async () => {
    const twoPlates = await t.db.select().from(plates).where(eq(plates.studyId, kineticStudyId)).orderBy(plates.createdAt).limit(2);
    const [first, second] = twoPlates;
    const activeOn = async () =>
      ((await scientist.agent.get(`/api/studies/${kineticStudyId}/analysis`).expect(200)).body as StudyAnalysis).exclusions.filter((e) => !e.liftedAt);
    const before = await activeOn();
    const reason = 'Plate sealed late; evaporation suspected in the edge wells.';
    // A9 of the first plate is mapped; P24 does not exist on a 96-well map: nothing may be kept.
    const refused = await send(scientist, 'post', `/api/studies/${kineticStudyId}/exclusions`, {
      wells: [{ plateId: first.id, well: 'A9' }, { plateId: second.id, well: 'P24' }],
      reason,
    });
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toBe(`P24 of ${second.name} has no role in the plate map.`);
    expect(await activeOn()).toHaveLength(before.length);

    const res = await send(scientist, 'post', `/api/studies/${kineticStudyId}/exclusions`, {
      wells: [{ plateId: first.id, well: 'A9' }, { plateId: second.id, well: 'A9' }],
      reason,
    }).expect(201);
    const added = (res.body as StudyAnalysis).exclusions.filter((e) => !e.liftedAt && e.reason === reason);
    expect(added.map((e) => [e.plateId, e.well]).sort()).toEqual([[first.id, 'A9'], [second.id, 'A9']].sort());
    for (const e of added) await send(scientist, 'post', `/api/exclusions/${e.id}/lift`, { reason: 'Seal was in time after all.' }).expect(200);
  });

  it('when a window is set for one well, then that well uses it and the others keep the automatic window', async () => {
    const current = (await scientist.agent.get(`/api/studies/${kineticStudyId}/analysis`).expect(200)).body as StudyAnalysis;
    const [plate] = await t.db.select().from(plates).where(eq(plates.studyId, kineticStudyId)).orderBy(plates.createdAt).limit(1);
    const settings = { ...current.settings, rateWindows: { well: { [`${plate.id}:B5`]: { startS: 40, endS: 200 } } } };
    const res = await send(scientist, 'put', `/api/studies/${kineticStudyId}/analysis/settings`, { version: current.settingsVersion, settings }).expect(200);
    const rows = (res.body as StudyAnalysis).result.wells.filter((w) => w.plateId === plate.id);
    expect(rows.find((w) => w.well === 'B5')!.window).toMatchObject({ startS: 40, endS: 200, source: 'well' });
    expect(rows.find((w) => w.well === 'B6')!.window?.source).toBe('automatic');
    const stale = await send(scientist, 'put', `/api/studies/${kineticStudyId}/analysis/settings`, { version: current.settingsVersion, settings });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: 'stale_version', currentVersion: current.settingsVersion + 1 });
    expect((res.body as StudyAnalysis).plateReads[plate.id]).toEqual(expect.any(String));
    expect((res.body as StudyAnalysis).assay.readMode).toBe('kinetic');

    // A setting the engine cannot use (an end-point read for a kinetic assay) is refused and not kept.
    const endpoint = await scientist.agent
      .post(`/api/plates/${plate.id}/reads`)
      .set('X-CSRF-Token', scientist.csrf)
      .field('selection', JSON.stringify([{ type: 'endpoint', blockIndex: 0 }]))
      .attach('file', fs.readFileSync('tests/fixtures/readers/endpoint-96-single.xlsx'), 'endpoint.xlsx')
      .expect(201);
    const latest = (res.body as StudyAnalysis).settingsVersion;
    const wrongRead = await send(scientist, 'put', `/api/studies/${kineticStudyId}/analysis/settings`, { version: latest, settings: { ...settings, plateReads: { [plate.id]: endpoint.body.readIds[0] } } });
    expect(wrongRead.status).toBe(422);
    const after = (await scientist.agent.get(`/api/studies/${kineticStudyId}/analysis`).expect(200)).body as StudyAnalysis;
    expect(after.settingsVersion).toBe(latest);
  });

  it('when the bootstrap runs in the background, then its progress finishes and the intervals appear', async () => {
    const started = await send(scientist, 'post', `/api/studies/${kineticStudyId}/analysis/bootstrap`, { resamples: 200 }).expect(202);
    expect(['queued', 'running', 'done']).toContain(started.body.state);
    let job = started.body;
    for (let i = 0; i < 120 && job.state !== 'done' && job.state !== 'failed'; i += 1) {
      await new Promise((r) => setTimeout(r, 500));
      job = (await scientist.agent.get(`/api/analysis-jobs/${started.body.id}`).expect(200)).body;
    }
    expect(job.state).toBe('done');
    expect(job.done).toBe(job.total);
    const analysis = (await scientist.agent.get(`/api/studies/${kineticStudyId}/analysis`).expect(200)).body as StudyAnalysis;
    expect(analysis.bootstrap).toMatchObject({ current: true, resamples: 200 });
    expect(analysis.result.profiles[0].fit!.pHopt.boot95).not.toBeNull();
  });
});

describe('review locks the analysis', () => {
  it('when the lead approves from the e-mailed link, then every mutating route of the study answers 409', async () => {
    await send(scientist, 'post', `/api/studies/${kineticStudyId}/submit`, { message: 'Ready.' }).expect(200);
    const mail = await latestMail(t.db);
    const link = linkIn(mail.text);
    const linkedId = link.split('/').at(-1)!;
    expect(linkedId).toBe(kineticStudyId);
    await lead.agent.get(`/api/studies/${linkedId}`).expect(200);
    await send(lead, 'post', `/api/studies/${linkedId}/approve`, { comment: 'Approved.' }).expect(200);

    const [plate] = await t.db.select().from(plates).where(eq(plates.studyId, kineticStudyId)).limit(1);
    const [read] = await t.db.select().from(reads).where(eq(reads.plateId, plate.id)).limit(1);
    const s = kineticStudyId;
    const mutations: [string, 'post' | 'put' | 'patch' | 'delete', string, object?][] = [
      ['edit study', 'patch', `/api/studies/${s}`, { notes: 'late' }],
      ['delete study', 'delete', `/api/studies/${s}`],
      ['new plate', 'post', `/api/studies/${s}/plates`, { name: 'P9', format: 96 }],
      ['rename plate', 'patch', `/api/plates/${plate.id}`, { name: 'x' }],
      ['save map', 'put', `/api/plates/${plate.id}/map`, { version: plate.version, map: { wells: {} } }],
      ['copy plate into it', 'post', `/api/plates/${plate.id}/copy`, { name: 'copy' }],
      ['delete plate', 'delete', `/api/plates/${plate.id}`],
      ['delete read', 'delete', `/api/reads/${read.id}`],
      ['analysis settings', 'put', `/api/studies/${s}/analysis/settings`, { version: 2, settings: {} }],
      ['exclude', 'post', `/api/studies/${s}/exclusions`, { plateId: plate.id, wells: ['A1'], reason: 'late' }],
      ['bootstrap', 'post', `/api/studies/${s}/analysis/bootstrap`, { resamples: 100 }],
      ['submit again', 'post', `/api/studies/${s}/submit`, {}],
      ['withdraw', 'post', `/api/studies/${s}/withdraw`, {}],
    ];
    for (const [what, method, path, body] of mutations) {
      const res = await send(scientist, method, path, body);
      expect(res.status, `${what}: ${JSON.stringify(res.body)}`).toBe(409);
    }
    const upload = await scientist.agent
      .post(`/api/plates/${plate.id}/reads/preview`)
      .set('X-CSRF-Token', scientist.csrf)
      .attach('file', Buffer.from('A,1\n'), 'x.csv');
    expect(upload.status).toBe(409);
    // The approved study shows its stored analysis, frozen.
    const analysis = (await lead.agent.get(`/api/studies/${s}/analysis`).expect(200)).body as StudyAnalysis;
    expect(analysis.frozen).toBe(true);
    const compare = await lead.agent.post(`/api/studies/${s}/analysis/recompute`).set('X-CSRF-Token', lead.csrf).expect(200);
    expect(compare.body.sameInputs).toBe(true);
    for (const d of compare.body.differences) {
      for (const p of Object.values(d.parameters) as { relativeDifference: number | null }[]) {
        if (p.relativeDifference !== null) expect(p.relativeDifference).toBeLessThan(1e-9);
      }
    }
    expect(await t.db.$count(analysisJobs)).toBeGreaterThan(0);
  });
});
