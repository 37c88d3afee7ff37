// Comparisons and exports over HTTP, on the demo seed's generated studies (server/db/seed, every
// number generated with known "true" parameters): FR1-D92N has a true acid shift of −0.7 pH against
// FR1-WT; FR1-E228Q differs by 0.02, within error.
import { eq } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ComparisonView } from '../../shared/schemas/comparisons';
import { studies, studyVariants, variants } from '../../server/db/schema';
import { seedDemo } from '../../server/db/seed';
import { startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { signIn } from './helpers/session';

let t: TestApp;
let lead: Awaited<ReturnType<typeof signIn>>;
let scientist: Awaited<ReturnType<typeof signIn>>;
let viewer: Awaited<ReturnType<typeof signIn>>;
let outsider: Awaited<ReturnType<typeof signIn>>;
let kinetic: typeof studies.$inferSelect;
let endpoint: typeof studies.$inferSelect;
const variantId: Record<string, string> = {};

type Parser = Parameters<ReturnType<ReturnType<typeof request>['get']>['parse']>[0];
const binary: Parser = (res, done) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  t = await startTestApp();
  await seedDemo(t.db);
  lead = await signIn(t, 'lead@example.org', 'fennel-ridge-demo');
  scientist = await signIn(t, 'scientist@example.org', 'fennel-ridge-demo');
  viewer = await signIn(t, 'viewer@example.org', 'fennel-ridge-demo');
  const o = await createUser(t.db, { role: 'lead', teamIds: [(await createTeam(t.db)).id] });
  outsider = await signIn(t, o.email, o.password);
  [kinetic] = await t.db.select().from(studies).where(eq(studies.name, 'FR1 variants, kinetic pH profile (demo)'));
  [endpoint] = await t.db.select().from(studies).where(eq(studies.name, 'FR1 end-point profile, approved round (demo)'));
  for (const v of await t.db.select({ id: variants.id, name: variants.name }).from(studyVariants).innerJoin(variants, eq(variants.id, studyVariants.variantId)).where(eq(studyVariants.studyId, kinetic.id))) {
    variantId[v.name] = v.id;
  }
  await scientist.agent.post(`/api/studies/${kinetic.id}/submit`).set('X-CSRF-Token', scientist.csrf).send({}).expect(200);
  await lead.agent.post(`/api/studies/${kinetic.id}/approve`).set('X-CSRF-Token', lead.csrf).send({}).expect(200);
}, 180_000);
afterAll(() => t?.close());

const entry = (study: { id: string }, name: string) => ({ studyId: study.id, variantId: variantId[name] });

describe('comparison of variants', () => {
  it('when a lead compares three variants, then the real acid shift is marked with an interval holding the truth and the small one is not', async () => {
    const res = await lead.agent
      .post('/api/comparisons/preview')
      .set('X-CSRF-Token', lead.csrf)
      .send({ teamId: kinetic.teamId, entries: [entry(kinetic, 'FR1-WT'), entry(kinetic, 'FR1-D92N'), entry(kinetic, 'FR1-E228Q')], referenceKey: `${kinetic.id}:${variantId['FR1-WT']}` })
      .expect(200);
    const view = res.body as ComparisonView;
    const d92n = view.result.rows.find((r) => r.variantName === 'FR1-D92N')!;
    const e228q = view.result.rows.find((r) => r.variantName === 'FR1-E228Q')!;
    expect(d92n.differences.pKa1!.clear).toBe(true);
    expect(d92n.differences.pKa1!.ci95![0]).toBeLessThanOrEqual(-0.7);
    expect(d92n.differences.pKa1!.ci95![1]).toBeGreaterThanOrEqual(-0.7);
    expect(e228q.differences.pKa1!.clear).toBe(false);
    expect(view.curves).toHaveLength(3);
    expect(view.provenance.every((p) => p.approvedBy === 'Daniel Osei')).toBe(true);
    expect(view.provenance[0].rawFiles.map((f) => f.sha256)).toEqual([expect.stringMatching(/^[0-9a-f]{64}$/), expect.stringMatching(/^[0-9a-f]{64}$/), expect.stringMatching(/^[0-9a-f]{64}$/)]);
  });

  it('when a study is not approved, then it is refused unless asked for, and then marked', async () => {
    const [draft] = await t.db.select().from(studies).where(eq(studies.name, 'FR1 end-point screen, round 1 (demo)'));
    const [wt] = await t.db.select().from(variants).where(eq(variants.name, 'FR1-WT'));
    const body = { teamId: kinetic.teamId, entries: [entry(kinetic, 'FR1-WT'), { studyId: draft.id, variantId: wt.id }], referenceKey: `${kinetic.id}:${variantId['FR1-WT']}` };
    const refused = await lead.agent.post('/api/comparisons/preview').set('X-CSRF-Token', lead.csrf).send(body);
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(/not approved/);
    const asked = await lead.agent.post('/api/comparisons/preview').set('X-CSRF-Token', lead.csrf).send({ ...body, includeUnapproved: true }).expect(200);
    const row = (asked.body as ComparisonView).result.rows.find((r) => r.studyId === draft.id)!;
    expect(row.approved).toBe(false);
    // The end-point screen uses another assay than the kinetic reference: not directly comparable.
    expect(row.comparability.join(' ')).toMatch(/Another assay/);
  });

  it('when a shared pKa1 is fitted globally, then the F-test says sharing is not supported for the shifted variant', async () => {
    const res = await lead.agent
      .post('/api/comparisons/preview')
      .set('X-CSRF-Token', lead.csrf)
      .send({ teamId: kinetic.teamId, entries: [entry(kinetic, 'FR1-WT'), entry(kinetic, 'FR1-D92N')], referenceKey: `${kinetic.id}:${variantId['FR1-WT']}`, globalFit: { model: 'bell', shared: ['pKa1'] } })
      .expect(200);
    const global = (res.body as ComparisonView).globalFit as { comparison: { preferred: string; pValue: number } };
    expect(global.comparison.preferred).toBe('separate');
    expect(global.comparison.pValue).toBeLessThan(0.05);
  });

  it('when a comparison is saved, then a viewer of the team opens it, cannot change it, and another team gets 404', async () => {
    const saved = await lead.agent
      .post('/api/comparisons')
      .set('X-CSRF-Token', lead.csrf)
      .send({ name: 'Round 1 shortlist', teamId: kinetic.teamId, entries: [entry(kinetic, 'FR1-WT'), entry(kinetic, 'FR1-D92N')], referenceKey: `${kinetic.id}:${variantId['FR1-WT']}` })
      .expect(201);
    const seen = await viewer.agent.get(`/api/comparisons/${saved.body.id}`).expect(200);
    expect(seen.body.view.result.rows).toHaveLength(2);
    expect(seen.body.createdByName).toBe('Daniel Osei');
    const list = await viewer.agent.get('/api/comparisons').expect(200);
    const listed = list.body.find((c: { id: string }) => c.id === saved.body.id);
    expect(Object.values(listed.labels)).toEqual(['FR1-WT — FR1 variants, kinetic pH profile (demo)', 'FR1-D92N — FR1 variants, kinetic pH profile (demo)']);
    await viewer.agent.delete(`/api/comparisons/${saved.body.id}`).set('X-CSRF-Token', viewer.csrf).expect(403);
    await outsider.agent.get(`/api/comparisons/${saved.body.id}`).expect(404);

    const file = await viewer.agent.get(`/api/comparisons/${saved.body.id}/export.xlsx`).buffer(true).parse(binary).expect(200);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(file.body as Parameters<typeof book.xlsx.load>[0]);
    const sheet = book.getWorksheet('Comparison')!;
    const header = (sheet.getRow(1).values as unknown[]).slice(1);
    const col = (name: string) => header.indexOf(name) + 1;
    const d92nRow = sheet.getRows(2, sheet.rowCount - 1)!.find((r) => r.getCell(col('variant')).value === 'FR1-D92N' && r.getCell(col('quantity')).value === 'apparent pKa1')!;
    const apiRow = seen.body.view.result.rows.find((r: { variantName: string }) => r.variantName === 'FR1-D92N');
    expect(d92nRow.getCell(col('value')).value).toBeCloseTo(apiRow.metrics.pKa1.value, 5);
    expect(d92nRow.getCell(col('vs_reference_value')).value).toBeCloseTo(apiRow.differences.pKa1.value, 5);
    const csv = await viewer.agent.get(`/api/comparisons/${saved.body.id}/export.csv`).expect(200);
    expect(csv.text).toContain('apparent pKa1');
  });

  it('when two people save the same version of a comparison, then the second gets 409 with the version it has now', async () => {
    const input = { name: 'Round 1 pair', teamId: kinetic.teamId, entries: [entry(kinetic, 'FR1-WT'), entry(kinetic, 'FR1-D92N')], referenceKey: `${kinetic.id}:${variantId['FR1-WT']}` };
    const saved = await lead.agent.post('/api/comparisons').set('X-CSRF-Token', lead.csrf).send(input).expect(201);
    const version = (await lead.agent.get(`/api/comparisons/${saved.body.id}`).expect(200)).body.version as number;
    await lead.agent.put(`/api/comparisons/${saved.body.id}`).set('X-CSRF-Token', lead.csrf).send({ ...input, name: 'first', version }).expect(200);
    const stale = await lead.agent.put(`/api/comparisons/${saved.body.id}`).set('X-CSRF-Token', lead.csrf).send({ ...input, name: 'second', version });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: 'stale_version', currentVersion: version + 1 });
    expect((await lead.agent.get(`/api/comparisons/${saved.body.id}`).expect(200)).body.name).toBe('first');
  });
});

describe('study exports', () => {
  it('when a study is exported, then the workbook holds the API parameters, the wells, the plate maps and the raw-file hashes', async () => {
    const analysis = (await viewer.agent.get(`/api/studies/${kinetic.id}/analysis`).expect(200)).body;
    const file = await viewer.agent.get(`/api/studies/${kinetic.id}/export.xlsx`).buffer(true).parse(binary).expect(200);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(file.body as Parameters<typeof book.xlsx.load>[0]);
    expect(book.worksheets.map((w) => w.name)).toEqual(['Summary', 'Parameters', 'Points', 'Wells', 'Plate maps', 'Provenance']);
    const params = book.getWorksheet('Parameters')!;
    const wtOpt = params.getRows(2, params.rowCount - 1)!.find((r) => r.getCell(1).value === 'FR1-WT' && r.getCell(3).value === 'pH optimum')!;
    const apiWt = analysis.result.profiles.find((p: { name: string }) => p.name === 'FR1-WT');
    expect(wtOpt.getCell(4).value).toBeCloseTo(apiWt.fit.pHopt.value, 5);
    expect(book.getWorksheet('Wells')!.rowCount).toBe(1 + analysis.result.wells.length);
    const provenance = book.getWorksheet('Provenance')!.getColumn(2).values.join(' ');
    expect(provenance).toContain(analysis.inputHash);
    expect(provenance).toMatch(/[0-9a-f]{64}/);
    const csv = await viewer.agent.get(`/api/studies/${endpoint.id}/export.csv`).expect(200);
    expect(csv.text.split('\n')[0]).toContain('activity');
  });
});
