// The buffer series designer over HTTP: proposals within one pH unit of every point at the assay
// temperature, recipes equal to the science core's, overrides, saving with a study, xlsx export.
import { eq } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bufferPKas, makeRecipe } from '../../shared/chemistry';
import { expandPHRange } from '../../shared/schemas/buffer-series';
import { bufferSeries, studies } from '../../server/db/schema';
import { seedBuiltInBuffers } from '../../server/services/buffers/library';
import { startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { createStudyWorld } from './helpers/records';
import { signIn } from './helpers/session';

let t: TestApp;
let teamId: string;
let scientistId: string;
let scientist: Awaited<ReturnType<typeof signIn>>;
let viewer: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await startTestApp();
  await seedBuiltInBuffers(t.db);
  teamId = (await createTeam(t.db)).id;
  const s = await createUser(t.db, { role: 'scientist', teamIds: [teamId] });
  scientistId = s.id;
  scientist = await signIn(t, s.email, s.password);
  const v = await createUser(t.db, { role: 'viewer', teamIds: [teamId] });
  viewer = await signIn(t, v.email, v.password);
});
afterAll(() => t?.close());

const request = (overrides: object = {}) => ({
  pHPoints: expandPHRange(3, 10, 0.5),
  assayTemperatureC: 37,
  bufferConcMm: 50,
  volumeMl: 100,
  ...overrides,
});

type Point = { pH: number; proposal: { systemId: string; pKapp: number } | null; recipe: { ionicStrength: number; components: { id: string; moles: number }[] } | null };

describe('buffer series designer', () => {
  it('when a series runs from pH 3 to 10 at 37 °C, then every proposed system lies within one unit of its point at 37 °C', async () => {
    const res = await scientist.agent.post('/api/buffer-series/design').set('X-CSRF-Token', scientist.csrf).send(request()).expect(200);
    const points: Point[] = res.body.points;
    expect(points.map((p) => p.pH)).toEqual(expandPHRange(3, 10, 0.5));
    for (const p of points) {
      expect(p.proposal, `pH ${p.pH}`).not.toBeNull();
      // Independent check through the chemistry core: the system's pK″ at 37 °C and the recipe's I.
      const pk = bufferPKas({ system: p.proposal!.systemId, temperatureC: 37, ionicStrength: p.recipe!.ionicStrength });
      expect(pk.ok).toBe(true);
      if (!pk.ok) continue;
      const nearest = Math.min(...pk.value.steps.map((s) => Math.abs(s.pKapp - p.pH)));
      expect(nearest, `pH ${p.pH} ${p.proposal!.systemId}`).toBeLessThanOrEqual(1);
    }
    expect(res.body.cautions.join(' ')).toMatch(/eye protection/);
  });

  it('when a point is designed, then its recipe is the one the science core computes', async () => {
    const res = await scientist.agent.post('/api/buffer-series/design').set('X-CSRF-Token', scientist.csrf).send(request({ pHPoints: [7.5] })).expect(200);
    const point: Point = res.body.points[0];
    const direct = makeRecipe({ system: point.proposal!.systemId, pH: 7.5, temperatureC: 37, totalConc: 0.05, volume: 0.1, method: 'titrate' });
    expect(direct.ok).toBe(true);
    if (!direct.ok) return;
    expect(point.recipe!.ionicStrength).toBeCloseTo(direct.value.ionicStrength, 10);
    expect(point.recipe!.components.map((c) => [c.id, c.moles])).toEqual(direct.value.components.map((c) => [c.id, c.moles]));
  });

  it('when the scientist overrides a point, then that point uses the chosen system; a system far from the point is refused', async () => {
    const first = await scientist.agent.post('/api/buffer-series/design').set('X-CSRF-Token', scientist.csrf).send(request({ pHPoints: [6.5] })).expect(200);
    const proposed = first.body.points[0].proposal.systemId;
    const alternative = first.body.points[0].alternatives.find((a: { systemId: string }) => a.systemId !== proposed).systemId;
    const res = await scientist.agent.post('/api/buffer-series/design').set('X-CSRF-Token', scientist.csrf).send(request({ pHPoints: [6.5], overrides: { '6.50': alternative } })).expect(200);
    expect(res.body.points[0].proposal.systemId).toBe(alternative);
    expect(res.body.overridden).toEqual(['6.50']);
    expect(res.body.points[0].alternatives.map((a: { systemId: string }) => a.systemId)).toContain(proposed);
    const far = await scientist.agent.post('/api/buffer-series/design').set('X-CSRF-Token', scientist.csrf).send(request({ pHPoints: [6.5], overrides: { '6.50': 'caps' } }));
    expect(far.status).toBe(400);
    expect(far.body.error.fields.overrides).toBeDefined();
  });

  it.each([
    [{ pHPoints: [15] }, 'pHPoints.0'],
    [{ assayTemperatureC: 150 }, 'assayTemperatureC'],
    [{ bufferConcMm: -5 }, 'bufferConcMm'],
    [{ pHPoints: [] }, 'pHPoints'],
  ])('when the request has %o, then the field is named and nothing is saved', async (change, field) => {
    const before = await t.db.$count(bufferSeries);
    const res = await scientist.agent.post('/api/buffer-series').set('X-CSRF-Token', scientist.csrf).send({ teamId, name: 'bad', input: request(change) });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain(`input.${field}`);
    expect(await t.db.$count(bufferSeries)).toBe(before);
  });

  it('when a series is saved with a study, then the study points at it, viewers cannot save, and the xlsx holds the recipes and cautions', async () => {
    const { study } = await createStudyWorld(t.db, teamId, scientistId);
    await viewer.agent.post('/api/buffer-series').set('X-CSRF-Token', viewer.csrf).send({ teamId, name: 'v', input: request() }).expect(403);
    const saved = await scientist.agent
      .post('/api/buffer-series')
      .set('X-CSRF-Token', scientist.csrf)
      .send({ teamId, name: 'pH 2.5–8 at 37 °C', input: request({ pHPoints: expandPHRange(2.5, 8, 0.5) }), studyId: study.id })
      .expect(201);
    const [row] = await t.db.select().from(studies).where(eq(studies.id, study.id));
    expect(row.bufferSeriesId).toBe(saved.body.id);
    const file = await viewer.agent.get(`/api/buffer-series/${saved.body.id}/recipes.xlsx`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(file.status).toBe(200);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(file.body as Parameters<typeof book.xlsx.load>[0]);
    const recipes = book.getWorksheet('Recipes')!;
    expect(recipes.getRow(2).getCell(1).value).toBe(2.5);
    expect(recipes.rowCount).toBeGreaterThanOrEqual(1 + 12);
    const cautions = book.getWorksheet('Cautions')!.getColumn(1).values.join(' ');
    expect(cautions).toMatch(/eye protection/);
    const updated = await scientist.agent.patch(`/api/buffer-series/${saved.body.id}`).set('X-CSRF-Token', scientist.csrf).send({ name: 'renamed', version: 1 }).expect(200);
    expect(updated.body.version).toBe(2);
    const stale = await scientist.agent.patch(`/api/buffer-series/${saved.body.id}`).set('X-CSRF-Token', scientist.csrf).send({ name: 'stale', version: 1 }).expect(409);
    expect(stale.body.error).toMatchObject({ code: 'stale_version', currentVersion: 2 });
  });
});
