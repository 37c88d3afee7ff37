// Enzymes, variants, preparations, assays and studies over HTTP on the real database:
// CRUD, team scoping, read-only viewers, audit rows, field errors that save nothing.
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditLog, enzymes, studies, variants } from '../../server/db/schema';
import { startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { createStudyWorld } from './helpers/records';
import { signIn } from './helpers/session';

let t: TestApp;
let teamId: string;
let scientist: Awaited<ReturnType<typeof signIn>>;
let viewer: Awaited<ReturnType<typeof signIn>>;
let outsider: Awaited<ReturnType<typeof signIn>>;
let scientistId: string;

beforeAll(async () => {
  t = await startTestApp();
  teamId = (await createTeam(t.db)).id;
  const other = await createTeam(t.db);
  const s = await createUser(t.db, { role: 'scientist', teamIds: [teamId] });
  scientistId = s.id;
  scientist = await signIn(t, s.email, s.password);
  const v = await createUser(t.db, { role: 'viewer', teamIds: [teamId] });
  viewer = await signIn(t, v.email, v.password);
  const o = await createUser(t.db, { role: 'lead', teamIds: [other.id] });
  outsider = await signIn(t, o.email, o.password);
});
afterAll(() => t?.close());

type Agent = typeof scientist;
const send = (who: Agent, method: 'post' | 'patch' | 'delete', path: string, body?: object) =>
  who.agent[method](path).set('X-CSRF-Token', who.csrf).send(body);

const validAssay = () => ({
  teamId,
  name: 'Phosphate release, end-point',
  substrate: 'generated phytate analogue',
  substrateMm: 2.5,
  readMode: 'endpoint',
  detection: 'absorbance',
  wavelengthNm: 405,
  quantitation: 'extinction',
  extinctionCoefficient: 18300,
  pathLengthCm: 0.56,
  wellVolumeUl: 200,
  temperatureC: 37,
  chromophorePka: 7.15,
});

describe('enzymes, variants and preparations', () => {
  it('when a scientist registers an enzyme with a parent and a variant and a preparation, then the detail shows them and each write is audited', async () => {
    const enzyme = await send(scientist, 'post', '/api/enzymes', { teamId, name: 'FR1 test phytase', organism: 'generated' }).expect(201);
    const wt = await send(scientist, 'post', `/api/enzymes/${enzyme.body.id}/variants`, { name: 'FR1-WT', isParent: true }).expect(201);
    const v = await send(scientist, 'post', `/api/enzymes/${enzyme.body.id}/variants`, { name: 'FR1-A', mutations: 's110a / d92n' }).expect(201);
    expect(v.body.mutations).toBe('D92N/S110A');
    const prep = await send(scientist, 'post', `/api/variants/${v.body.id}/preparations`, { lot: 'P-001', proteinMgPerMl: 1.8, preparedOn: '2026-11-20' });
    expect(prep.status).toBe(201);

    const detail = await scientist.agent.get(`/api/enzymes/${enzyme.body.id}`).expect(200);
    expect(detail.body.variants.map((x: { name: string }) => x.name)).toEqual(['FR1-WT', 'FR1-A']);
    expect(detail.body.variants[1].preparations[0]).toMatchObject({ lot: 'P-001', proteinMgPerMl: 1.8, preparedOn: '2026-11-20' });

    const audit = await t.db.select().from(auditLog).where(and(eq(auditLog.teamId, teamId), eq(auditLog.action, 'create')));
    const entities = audit.map((a) => `${a.entity}:${a.entityId}`);
    for (const [entity, id] of [['enzyme', enzyme.body.id], ['variant', wt.body.id], ['variant', v.body.id], ['preparation', prep.body.id]]) {
      expect(entities).toContain(`${entity}:${id}`);
    }
    const list = await viewer.agent.get('/api/enzymes').expect(200);
    expect(list.body.find((e: { id: string }) => e.id === enzyme.body.id)).toMatchObject({ variantCount: 2 });
  });

  it.each([
    ['D92', 'is not a substitution'],
    ['D92N/D92A', 'Position 92 appears twice'],
    ['D92D', 'changes nothing'],
    ['X92N', 'is not a substitution'],
  ])('when the mutation list is "%s", then it is refused with a field error and nothing is saved', async (mutations, message) => {
    const enzyme = await send(scientist, 'post', '/api/enzymes', { teamId, name: `Bad list ${mutations}` }).expect(201);
    const res = await send(scientist, 'post', `/api/enzymes/${enzyme.body.id}/variants`, { name: 'bad', mutations });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.mutations).toContain(message);
    expect(await t.db.$count(variants, eq(variants.enzymeId, enzyme.body.id))).toBe(0);
  });

  it('when a second parent is added, then it is refused', async () => {
    const enzyme = await send(scientist, 'post', '/api/enzymes', { teamId, name: 'Two parents' }).expect(201);
    await send(scientist, 'post', `/api/enzymes/${enzyme.body.id}/variants`, { name: 'WT', isParent: true }).expect(201);
    const res = await send(scientist, 'post', `/api/enzymes/${enzyme.body.id}/variants`, { name: 'WT2', isParent: true });
    expect(res.status).toBe(409);
  });

  it('when a viewer tries to write, then it is refused; when another team looks, then nothing is there', async () => {
    const enzyme = await send(scientist, 'post', '/api/enzymes', { teamId, name: 'Private enzyme' }).expect(201);
    await send(viewer, 'post', '/api/enzymes', { teamId, name: 'Viewer enzyme' }).expect(403);
    await send(viewer, 'patch', `/api/enzymes/${enzyme.body.id}`, { name: 'renamed' }).expect(403);
    await viewer.agent.get(`/api/enzymes/${enzyme.body.id}`).expect(200);
    await outsider.agent.get(`/api/enzymes/${enzyme.body.id}`).expect(404);
    const list = await outsider.agent.get('/api/enzymes').expect(200);
    expect(list.body.map((e: { id: string }) => e.id)).not.toContain(enzyme.body.id);
    const filtered = await outsider.agent.get('/api/enzymes').query({ teamId }).expect(200);
    expect(filtered.body).toEqual([]);
    await send(outsider, 'post', '/api/enzymes', { teamId, name: 'Intruder' }).expect(404);
    expect(await t.db.$count(enzymes, eq(enzymes.name, 'Intruder'))).toBe(0);
  });

  it.each([
    [{ lot: 'x', proteinMgPerMl: -1, preparedOn: '2026-01-01' }, 'proteinMgPerMl'],
    [{ lot: 'x', proteinMgPerMl: 1, preparedOn: '01/02/2026' }, 'preparedOn'],
    [{ lot: '', proteinMgPerMl: 1, preparedOn: '2026-01-01' }, 'lot'],
  ])('when a preparation has a bad field, then that field is named', async (input, field) => {
    const enzyme = await send(scientist, 'post', '/api/enzymes', { teamId, name: `Prep check ${field}` }).expect(201);
    const v = await send(scientist, 'post', `/api/enzymes/${enzyme.body.id}/variants`, { name: 'V', mutations: 'A1G' }).expect(201);
    const res = await send(scientist, 'post', `/api/variants/${v.body.id}/preparations`, input);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain(field);
  });
});

describe('partial updates', () => {
  it('when a PATCH sends one field, then the fields it left out keep their stored values', async () => {
    const enzyme = await send(scientist, 'post', '/api/enzymes', { teamId, name: 'Keep fields', organism: 'generated organism', notes: 'keep me' }).expect(201);
    const renamed = await send(scientist, 'patch', `/api/enzymes/${enzyme.body.id}`, { name: 'Kept fields' }).expect(200);
    expect(renamed.body).toMatchObject({ name: 'Kept fields', organism: 'generated organism', notes: 'keep me' });
    const assay = await send(scientist, 'post', '/api/assays', { ...validAssay(), name: 'Keep assay', stopSolution: '0.5 M NaOH' }).expect(201);
    const edited = await send(scientist, 'patch', `/api/assays/${assay.body.id}`, { name: 'Kept assay' }).expect(200);
    expect(edited.body).toMatchObject({ stopSolution: '0.5 M NaOH', chromophorePka: 7.15, extinctionCoefficient: 18300 });
    const wrong = await send(scientist, 'patch', `/api/assays/${assay.body.id}`, { extinctionCoefficient: null });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.extinctionCoefficient).toBeDefined();
  });
});

describe('assays', () => {
  it('when an end-point assay reads an ionising chromophore without a stop solution, then its page carries the caution', async () => {
    const created = await send(scientist, 'post', '/api/assays', validAssay()).expect(201);
    const detail = await scientist.agent.get(`/api/assays/${created.body.id}`).expect(200);
    expect(detail.body.cautions.join(' ')).toMatch(/stop the reaction with strong base/);
    const stopped = await send(scientist, 'patch', `/api/assays/${created.body.id}`, { stopSolution: '0.5 M NaOH', substrateRegime: 'saturating' }).expect(200);
    expect(stopped.body.stopSolution).toBe('0.5 M NaOH');
    const after = await scientist.agent.get(`/api/assays/${created.body.id}`).expect(200);
    expect(after.body.cautions).toEqual([]);
  });

  it.each([
    [{ temperatureC: 150 }, 'temperatureC'],
    [{ temperatureC: -1 }, 'temperatureC'],
    [{ substrateMm: -2 }, 'substrateMm'],
    [{ wavelengthNm: 50 }, 'wavelengthNm'],
    [{ extinctionCoefficient: null }, 'extinctionCoefficient'],
    [{ detection: 'fluorescence' }, 'quantitation'],
    [{ readMode: 'sometimes' }, 'readMode'],
  ])('when an assay has %o, then the field is named and nothing is saved', async (change, field) => {
    const res = await send(scientist, 'post', '/api/assays', { ...validAssay(), name: `bad ${field}`, ...change });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain(field);
  });
});

describe('studies', () => {
  it('when a scientist creates a study, then it lists with its variants, and edits bump its version', async () => {
    const enzyme = await send(scientist, 'post', '/api/enzymes', { teamId, name: 'Study enzyme' }).expect(201);
    const wt = await send(scientist, 'post', `/api/enzymes/${enzyme.body.id}/variants`, { name: 'WT', isParent: true }).expect(201);
    const v = await send(scientist, 'post', `/api/enzymes/${enzyme.body.id}/variants`, { name: 'V1', mutations: 'E35Q' }).expect(201);
    const assay = await send(scientist, 'post', '/api/assays', { ...validAssay(), name: 'Study assay' }).expect(201);
    const study = await send(scientist, 'post', '/api/studies', {
      teamId,
      name: 'pH profile 1',
      enzymeId: enzyme.body.id,
      variantIds: [wt.body.id, v.body.id],
      referenceVariantId: wt.body.id,
      assayId: assay.body.id,
    }).expect(201);
    expect(study.body).toMatchObject({ status: 'draft', ownerId: scientistId, version: 1 });
    const detail = await viewer.agent.get(`/api/studies/${study.body.id}`).expect(200);
    expect(detail.body.variants.map((x: { name: string }) => x.name)).toEqual(['WT', 'V1']);
    expect(detail.body).toMatchObject({ enzymeName: 'Study enzyme', assayName: 'Study assay', variantCount: 2, assayReadMode: 'endpoint', assayQuantitation: 'extinction' });
    const edited = await send(scientist, 'patch', `/api/studies/${study.body.id}`, { notes: 'first plate Monday' }).expect(200);
    expect(edited.body.version).toBe(2);
    await send(scientist, 'patch', `/api/studies/${study.body.id}`, { referenceVariantId: crypto.randomUUID() }).expect(400);
    await send(viewer, 'patch', `/api/studies/${study.body.id}`, { notes: 'viewer' }).expect(403);
  });

  it('when the reference variant is not included or a variant belongs to another enzyme, then it is refused and nothing is saved', async () => {
    const a = await createStudyWorld(t.db, teamId, scientistId);
    const b = await createStudyWorld(t.db, teamId, scientistId);
    const base = { teamId, name: 'Refused study', enzymeId: a.enzyme.id, assayId: a.assay.id };
    const notIncluded = await send(scientist, 'post', '/api/studies', { ...base, variantIds: [a.variant.id], referenceVariantId: a.parent.id });
    expect(notIncluded.status).toBe(400);
    expect(notIncluded.body.error.fields.referenceVariantId).toBeDefined();
    const foreign = await send(scientist, 'post', '/api/studies', { ...base, variantIds: [a.parent.id, b.variant.id], referenceVariantId: a.parent.id });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fields.variantIds).toBeDefined();
    expect(await t.db.$count(studies, eq(studies.name, 'Refused study'))).toBe(0);
  });

  it('when a study is approved, then editing or deleting it gets 409 with a clear message', async () => {
    const { study } = await createStudyWorld(t.db, teamId, scientistId, { status: 'approved' });
    const res = await send(scientist, 'patch', `/api/studies/${study.id}`, { notes: 'late change' });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'study_locked' });
    expect(res.body.error.message).toMatch(/approved and locked/);
    await send(scientist, 'delete', `/api/studies/${study.id}`).expect(409);
  });
});
