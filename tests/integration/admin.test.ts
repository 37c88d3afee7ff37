// Teams, the audit log, the outbox, and bad input everywhere (never a 500).
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditLog, teamMembers } from '../../server/db/schema';
import { startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { signIn } from './helpers/session';

let t: TestApp;
let admin: Awaited<ReturnType<typeof signIn>>;
beforeAll(async () => {
  t = await startTestApp();
  const user = await createUser(t.db, { role: 'admin' });
  admin = await signIn(t, user.email, user.password);
});
afterAll(() => t?.close());

const post = (path: string, body: unknown) => admin.agent.post(path).set('X-CSRF-Token', admin.csrf).send(body as object);

describe('teams', () => {
  it('when an admin creates a team and adds a member, then the member sees it and the audit log has both rows', async () => {
    const created = await post('/api/teams', { name: `Kinetics ${Date.now()}`, description: 'made by a test' }).expect(201);
    const member = await createUser(t.db, { role: 'viewer' });
    await post(`/api/teams/${created.body.id}/members`, { userId: member.id }).expect(204);
    const dup = await post(`/api/teams/${created.body.id}/members`, { userId: member.id });
    expect(dup.status).toBe(409);

    const seen = await signIn(t, member.email, member.password);
    const teams = await seen.agent.get('/api/teams').expect(200);
    expect(teams.body.map((x: { id: string }) => x.id)).toEqual([created.body.id]);

    const rows = await t.db.select().from(auditLog).where(eq(auditLog.teamId, created.body.id));
    expect(rows.map((r) => `${r.entity}:${r.action}`).sort()).toEqual(['team-member:add', 'team:create']);
    expect(rows.find((r) => r.entity === 'team')?.after).toMatchObject({ name: created.body.name });
  });

  it('when a member is removed, then they no longer see the team', async () => {
    const team = await createTeam(t.db);
    const member = await createUser(t.db, { teamIds: [team.id] });
    await admin.agent.delete(`/api/teams/${team.id}/members/${member.id}`).set('X-CSRF-Token', admin.csrf).expect(204);
    const left = await t.db.select().from(teamMembers).where(and(eq(teamMembers.teamId, team.id), eq(teamMembers.userId, member.id)));
    expect(left).toHaveLength(0);
    const seen = await signIn(t, member.email, member.password);
    await seen.agent.get(`/api/teams/${team.id}`).expect(404);
  });

  it('when two teams have the same name, then the second is refused', async () => {
    const name = `Same ${Date.now()}`;
    await post('/api/teams', { name }).expect(201);
    const res = await post('/api/teams', { name });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('name_taken');
  });
});

describe('audit log and outbox', () => {
  it('when an admin filters the audit log by entity and action, then only those rows come back, newest first, without secrets', async () => {
    const user = await createUser(t.db);
    await admin.agent.patch(`/api/users/${user.id}`).set('X-CSRF-Token', admin.csrf).send({ role: 'lead' }).expect(200);
    const res = await admin.agent.get('/api/audit').query({ entity: 'user', action: 'update', entityId: user.id }).expect(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items[0]).toMatchObject({ entity: 'user', action: 'update', before: { role: 'scientist' }, after: { role: 'lead' } });
    const all = await admin.agent.get('/api/audit').query({ limit: 500 }).expect(200);
    expect(JSON.stringify(all.body)).not.toMatch(/passwordHash|\$2[aby]\$/);
    const ids = all.body.items.map((i: { id: number }) => i.id);
    expect(ids).toEqual([...ids].sort((a, b) => b - a));
  });

  it('when mail is sent, then an admin reads it in the outbox with its link', async () => {
    const user = await createUser(t.db);
    await request(t.app).post('/api/auth/password-reset').send({ email: user.email }).expect(202);
    const list = await admin.agent.get('/api/outbox').query({ to: user.email }).expect(200);
    expect(list.body.total).toBe(1);
    const message = await admin.agent.get(`/api/outbox/${list.body.items[0].id}`).expect(200);
    expect(message.body.subject).toBe('Reset your Bellwether password');
    expect(message.body.text).toContain('http://bellwether.test/reset-password/');
  });
});

describe('bad input gets a clear 4xx in the one error shape, never a 500', () => {
  const cases: [string, () => request.Test, number, string?][] = [
    ['malformed JSON', () => admin.agent.post('/api/teams').set('X-CSRF-Token', admin.csrf).set('Content-Type', 'application/json').send('{"name": '), 400, 'malformed_json'],
    ['a missing field', () => post('/api/teams', {}), 400, 'bad_request'],
    ['a wrong type', () => post('/api/teams', { name: 42 }), 400, 'bad_request'],
    ['an over-long string', () => post('/api/teams', { name: 'x'.repeat(81) }), 400, 'bad_request'],
    ['an array as body', () => post('/api/teams', [1, 2]), 400, 'bad_request'],
    ['an unknown role', () => admin.agent.patch(`/api/users/${crypto.randomUUID()}`).set('X-CSRF-Token', admin.csrf).send({ role: 'boss' }), 400],
    ['an unknown id', () => admin.agent.patch(`/api/users/${crypto.randomUUID()}`).set('X-CSRF-Token', admin.csrf).send({ role: 'viewer' }), 404, 'not_found'],
    ['a malformed id', () => admin.agent.get('/api/teams/not-a-uuid'), 400],
    ['an unknown route', () => admin.agent.get('/api/nothing-here'), 404, 'not_found'],
    ['a bad query value', () => admin.agent.get('/api/audit').query({ limit: 'many' }), 400],
    ['a bad date filter', () => admin.agent.get('/api/audit').query({ from: 'yesterday' }), 400],
    ['a body over 1 MB', () => post('/api/teams', { name: 'x', description: 'y'.repeat(1_100_000) }), 413, 'too_large'],
    ['a malformed e-mail', () => request(t.app).post('/api/auth/sign-in').send({ email: 'not-an-address', password: 'x' }), 400],
    ['a malformed token', () => request(t.app).get('/api/invitations/short'), 400],
  ];
  it.each(cases)('%s', async (_name, make, status, code) => {
    const res = await make();
    expect(res.status, JSON.stringify(res.body)).toBe(status);
    expect(res.body.error.message).toEqual(expect.any(String));
    if (code) expect(res.body.error.code).toBe(code);
  });

  it('names the offending field', async () => {
    const res = await post('/api/teams', { name: '' });
    expect(res.body.error.fields).toEqual({ name: 'Team name is required.' });
  });
});
