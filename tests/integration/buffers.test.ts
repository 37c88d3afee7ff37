// The buffer library over HTTP: seeded from shared/chemistry, readable by everyone, lab systems
// added only by admins with validated values and sources.
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditLog, bufferSystems } from '../../server/db/schema';
import { seedBuiltInBuffers } from '../../server/services/buffers/library';
import { startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { signIn } from './helpers/session';

let t: TestApp;
let admin: Awaited<ReturnType<typeof signIn>>;
let scientist: Awaited<ReturnType<typeof signIn>>;
let viewer: Awaited<ReturnType<typeof signIn>>;

// A lab's own buffer as a scientist would enter it (values invented for the test, not a real compound).
const labBuffer = {
  id: 'lab-zwitterion-x',
  name: 'Lab zwitterion X',
  ionizations: [
    {
      label: 'pKa',
      pKa25: 6.6,
      zAcid: 0,
      dH: 20,
      dCp: null,
      dpKadT: null,
      usefulRange: [5.6, 7.6],
      sources: { row: 'lab measurement 2026 (test data)', pKa25: 'lab titration (test data)', dH: 'lab calorimetry (test data)' },
      mixFormIds: null,
      titration: { startFormId: 'lab-x-acid', titrant: 'NaOH' },
    },
  ],
  forms: [{ id: 'lab-x-acid', name: 'X free acid', formula: 'C6H13NO4S', formulaWeight: 195.24 }],
};

beforeAll(async () => {
  t = await startTestApp();
  await seedBuiltInBuffers(t.db);
  const team = await createTeam(t.db);
  const a = await createUser(t.db, { role: 'admin' });
  const s = await createUser(t.db, { role: 'scientist', teamIds: [team.id] });
  const v = await createUser(t.db, { role: 'viewer', teamIds: [team.id] });
  admin = await signIn(t, a.email, a.password);
  scientist = await signIn(t, s.email, s.password);
  viewer = await signIn(t, v.email, v.password);
});
afterAll(() => t?.close());

describe('buffer library', () => {
  it('when anyone reads the library, then every seeded system is there with its pKa at 25 °C and 37 °C', async () => {
    const list = await viewer.agent.get('/api/buffers').expect(200);
    expect(list.body.length).toBeGreaterThanOrEqual(25);
    const tris = list.body.find((b: { id: string }) => b.id === 'tris');
    // SCIENCE.md §2.1 check [derived]: Tris pK(37 °C) = 7.753 from 8.072, ΔH 47.45 kJ/mol, ΔCp −59.
    expect(tris.steps[0].pKa25).toBe(8.072);
    expect(tris.steps[0].pKa37).toBeCloseTo(7.753, 3);
    const detail = await viewer.agent.get('/api/buffers/tris').expect(200);
    expect(detail.body.system.ionizations[0].sources.row).toBe('G');
  });

  it('when the seed runs twice, then nothing is duplicated', async () => {
    const before = await t.db.$count(bufferSystems);
    await seedBuiltInBuffers(t.db);
    expect(await t.db.$count(bufferSystems)).toBe(before);
  });

  it('when a scientist adds a buffer, then it is refused; an admin adds it and it is audited', async () => {
    await scientist.agent.post('/api/buffers').set('X-CSRF-Token', scientist.csrf).send(labBuffer).expect(403);
    const created = await admin.agent.post('/api/buffers').set('X-CSRF-Token', admin.csrf).send(labBuffer).expect(201);
    expect(created.body).toMatchObject({ id: 'lab-zwitterion-x', builtIn: false });
    const audit = await t.db.select().from(auditLog).where(eq(auditLog.entityId, 'lab-zwitterion-x'));
    expect(audit[0]).toMatchObject({ entity: 'buffer-system', action: 'create' });
    await admin.agent.post('/api/buffers').set('X-CSRF-Token', admin.csrf).send(labBuffer).expect(409);
  });

  it('when the values are impossible, then the admin gets a message and nothing is saved', async () => {
    const bad = { ...labBuffer, id: 'lab-bad', name: 'Bad', ionizations: [{ ...labBuffer.ionizations[0], pKa25: 19 }] };
    const res = await admin.agent.post('/api/buffers').set('X-CSRF-Token', admin.csrf).send(bad);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/pKa25/);
    expect(Object.keys(res.body.error.fields)).toContain('ionizations.0.pKa25');
    expect(await t.db.$count(bufferSystems, eq(bufferSystems.slug, 'lab-bad'))).toBe(0);
  });

  it('when an admin tries to edit or delete a built-in system, then it is refused', async () => {
    await admin.agent.put('/api/buffers/tris').set('X-CSRF-Token', admin.csrf).send({ ...labBuffer, id: 'tris' }).expect(403);
    await admin.agent.delete('/api/buffers/tris').set('X-CSRF-Token', admin.csrf).expect(403);
  });
});
