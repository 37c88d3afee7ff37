// Accounts end to end over HTTP on the real database: invitations, sign-in, reset, deactivation,
// sessions, CSRF, throttling. E-mails go through the local fake SMTP server into mail_messages.
import { eq, sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditLog, invitations, passwordResets, sessions, signInLimits, users } from '../../server/db/schema';
import { latestMail, linkIn, startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { signIn } from './helpers/session';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t?.close());

const tokenFrom = (link: string) => link.split('/').at(-1)!;

describe('invitations', () => {
  it('when a lead invites someone into their team, then the e-mailed link lets them set a password and sign in', async () => {
    const team = await createTeam(t.db);
    const lead = await createUser(t.db, { role: 'lead', teamIds: [team.id] });
    const { agent, csrf } = await signIn(t, lead.email, lead.password);
    const email = `new-${Date.now()}@example.org`;

    const invited = await agent.post('/api/invitations').set('X-CSRF-Token', csrf).send({ email, role: 'scientist', teamId: team.id });
    expect(invited.status).toBe(201);
    expect(invited.body.mailSent).toBe(true);

    const mail = await latestMail(t.db);
    expect(mail.recipients).toEqual([email]);
    const link = linkIn(mail.text);
    expect(link).toMatch(/^http:\/\/bellwether\.test\/invitation\/[A-Za-z0-9_-]{43}$/);
    const token = tokenFrom(link);

    const view = await request(t.app).get(`/api/invitations/${token}`);
    expect(view.body).toMatchObject({ email, role: 'scientist', teamName: team.name });

    const accepted = await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: 'Ada New', password: 'a-long-new-password' });
    expect(accepted.status).toBe(201);

    const me = await signIn(t, email, 'a-long-new-password');
    expect(me.res.body).toMatchObject({ name: 'Ada New', role: 'scientist', teams: [{ id: team.id, name: team.name }] });

    const again = await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: 'Someone Else', password: 'another-password-1' });
    expect(again.status).toBe(404);
    expect(again.body.error.code).toBe('invalid_link');
  });

  it('when an invitation is older than 72 hours, then its link no longer works', async () => {
    const admin = await createUser(t.db, { role: 'admin' });
    const { agent, csrf } = await signIn(t, admin.email, admin.password);
    const email = `late-${Date.now()}@example.org`;
    await agent.post('/api/invitations').set('X-CSRF-Token', csrf).send({ email, role: 'viewer' }).expect(201);
    const token = tokenFrom(linkIn((await latestMail(t.db)).text));
    const [row] = await t.db.select().from(invitations).where(eq(invitations.email, email));
    expect(row.expiresAt.getTime() - row.createdAt.getTime()).toBeCloseTo(72 * 3600_000, -4);
    await t.db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.id, row.id));
    await request(t.app).get(`/api/invitations/${token}`).expect(404);
    await request(t.app).post(`/api/invitations/${token}/accept`).send({ name: 'Late', password: 'long-enough-pw' }).expect(404);
  });

  it('when a lead invites an admin or into a team that is not theirs, then it is refused', async () => {
    const mine = await createTeam(t.db);
    const other = await createTeam(t.db);
    const lead = await createUser(t.db, { role: 'lead', teamIds: [mine.id] });
    const { agent, csrf } = await signIn(t, lead.email, lead.password);
    await agent.post('/api/invitations').set('X-CSRF-Token', csrf).send({ email: 'x1@example.org', role: 'admin', teamId: mine.id }).expect(403);
    await agent.post('/api/invitations').set('X-CSRF-Token', csrf).send({ email: 'x2@example.org', role: 'viewer', teamId: other.id }).expect(404);
    const none = await agent.post('/api/invitations').set('X-CSRF-Token', csrf).send({ email: 'x3@example.org', role: 'viewer' });
    expect(none.status).toBe(400);
    expect(none.body.error.fields.teamId).toBeDefined();
  });

  it('when the address already has an account, then the invitation is refused with 409', async () => {
    const admin = await createUser(t.db, { role: 'admin' });
    const existing = await createUser(t.db);
    const { agent, csrf } = await signIn(t, admin.email, admin.password);
    const res = await agent.post('/api/invitations').set('X-CSRF-Token', csrf).send({ email: existing.email.toUpperCase(), role: 'viewer' });
    expect(res.status).toBe(409);
  });
});

describe('password reset', () => {
  it('when a reset link is used, then the new password works, the old one fails, and the link cannot be reused', async () => {
    const user = await createUser(t.db);
    const asked = await request(t.app).post('/api/auth/password-reset').send({ email: user.email });
    expect(asked.status).toBe(202);
    const token = tokenFrom(linkIn((await latestMail(t.db)).text));

    await request(t.app).post('/api/auth/password-reset/complete').send({ token, newPassword: 'brand-new-password' }).expect(204);
    await signIn(t, user.email, 'brand-new-password');
    await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password }).expect(401);
    const reused = await request(t.app).post('/api/auth/password-reset/complete').send({ token, newPassword: 'third-password-xx' });
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe('invalid_link');
  });

  it('when the link is older than one hour, then it fails', async () => {
    const user = await createUser(t.db);
    await request(t.app).post('/api/auth/password-reset').send({ email: user.email }).expect(202);
    const token = tokenFrom(linkIn((await latestMail(t.db)).text));
    await t.db.update(passwordResets).set({ expiresAt: new Date(Date.now() - 1) }).where(eq(passwordResets.userId, user.id));
    await request(t.app).post('/api/auth/password-reset/complete').send({ token, newPassword: 'brand-new-password' }).expect(400);
  });

  it('when the address is unknown, then the answer is the same and no e-mail is sent', async () => {
    const user = await createUser(t.db);
    const known = await request(t.app).post('/api/auth/password-reset').send({ email: user.email });
    const before = await latestMail(t.db);
    const unknown = await request(t.app).post('/api/auth/password-reset').send({ email: 'nobody-here@example.org' });
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    expect((await latestMail(t.db)).id).toBe(before.id);
  });

  it('when a password is reset, then open sessions of that account end', async () => {
    const user = await createUser(t.db);
    const { agent } = await signIn(t, user.email, user.password);
    await request(t.app).post('/api/auth/password-reset').send({ email: user.email }).expect(202);
    const token = tokenFrom(linkIn((await latestMail(t.db)).text));
    await request(t.app).post('/api/auth/password-reset/complete').send({ token, newPassword: 'brand-new-password' }).expect(204);
    await agent.get('/api/me').expect(401);
  });
});

describe('sign-in and sessions', () => {
  it('when signing in, then the cookie is httpOnly, SameSite=Lax, not Secure over http, and the session id rotates', async () => {
    const user = await createUser(t.db);
    const first = await signIn(t, user.email, user.password);
    const cookie = first.res.headers['set-cookie'][0] as string;
    expect(cookie).toMatch(/^bw\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
    const again = await first.agent
      .post('/api/auth/sign-in')
      .set('X-CSRF-Token', first.csrf)
      .send({ email: user.email, password: user.password })
      .expect(200);
    const rotated = again.headers['set-cookie'][0] as string;
    expect(rotated.split(';')[0]).not.toBe(cookie.split(';')[0]);
    // The old session id is gone.
    await request(t.app).get('/api/me').set('Cookie', cookie.split(';')[0]).expect(401);
    expect(again.body.csrfToken).not.toBe(first.csrf);
  });

  it('when behind an https proxy, then the cookie is Secure', async () => {
    const behindProxy = await startTestApp({ trustProxy: true });
    try {
      const user = await createUser(behindProxy.db);
      const res = await request(behindProxy.app)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-Proto', 'https')
        .send({ email: user.email, password: user.password })
        .expect(200);
      expect(res.headers['set-cookie'][0]).toMatch(/; Secure/i);
    } finally {
      await behindProxy.close();
    }
  });

  it('when the password is wrong or the address unknown, then the same generic message comes back', async () => {
    const user = await createUser(t.db);
    const wrong = await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: 'not-it-at-all' });
    const unknown = await request(t.app).post('/api/auth/sign-in').send({ email: 'ghost@example.org', password: 'not-it-at-all' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('when a session has been idle past its expiry, then it no longer signs anyone in', async () => {
    const user = await createUser(t.db);
    const { agent } = await signIn(t, user.email, user.password);
    await agent.get('/api/me').expect(200);
    await t.db.update(sessions).set({ expire: new Date(Date.now() - 1000) }).where(sql`${sessions.sess}->>'userId' = ${user.id}`);
    await agent.get('/api/me').expect(401);
  });

  it('when a user signs out, then the session ends', async () => {
    const user = await createUser(t.db);
    const { agent, csrf } = await signIn(t, user.email, user.password);
    await agent.post('/api/auth/sign-out').set('X-CSRF-Token', csrf).expect(204);
    await agent.get('/api/me').expect(401);
  });

  it('when a user changes their password, then the old one stops working and a wrong current one is refused', async () => {
    const user = await createUser(t.db);
    const { agent, csrf } = await signIn(t, user.email, user.password);
    const bad = await agent.post('/api/me/password').set('X-CSRF-Token', csrf).send({ currentPassword: 'wrong-one', newPassword: 'fresh-password-1' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.currentPassword).toBeDefined();
    await agent.post('/api/me/password').set('X-CSRF-Token', csrf).send({ currentPassword: user.password, newPassword: 'fresh-password-1' }).expect(204);
    await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password }).expect(401);
    await signIn(t, user.email, 'fresh-password-1');
  });

  it('stores passwords as bcrypt hashes of cost 10 or more', async () => {
    const user = await createUser(t.db);
    const { agent, csrf } = await signIn(t, user.email, user.password);
    await agent.post('/api/me/password').set('X-CSRF-Token', csrf).send({ currentPassword: user.password, newPassword: 'fresh-password-2' }).expect(204);
    const [row] = await t.db.select().from(users).where(eq(users.id, user.id));
    const cost = Number(/^\$2[aby]\$(\d+)\$/.exec(row.passwordHash)?.[1]);
    expect(cost).toBeGreaterThanOrEqual(10);
  });
});

describe('deactivation', () => {
  it('when an admin deactivates a user, then the user cannot sign in and loses open sessions', async () => {
    const admin = await createUser(t.db, { role: 'admin' });
    const user = await createUser(t.db);
    const victim = await signIn(t, user.email, user.password);
    await victim.agent.get('/api/me').expect(200);
    const { agent, csrf } = await signIn(t, admin.email, admin.password);
    await agent.patch(`/api/users/${user.id}`).set('X-CSRF-Token', csrf).send({ active: false }).expect(200);
    await victim.agent.get('/api/me').expect(401);
    const refused = await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect(refused.status).toBe(401);
    expect(refused.body.error.message).toBe('E-mail or password is not correct.');
    const [audit] = await t.db.select().from(auditLog).where(eq(auditLog.entityId, user.id)).orderBy(sql`${auditLog.id} desc`).limit(1);
    expect(audit).toMatchObject({ action: 'deactivate', actorId: admin.id, before: { active: true }, after: { active: false } });
  });

  it('when the last active admin would lose the role, then it is refused', async () => {
    const scoped = await startTestApp();
    try {
      await scoped.db.update(users).set({ active: false }).where(eq(users.role, 'admin'));
      const admin = await createUser(scoped.db, { role: 'admin' });
      const { agent, csrf } = await signIn(scoped, admin.email, admin.password);
      const res = await agent.patch(`/api/users/${admin.id}`).set('X-CSRF-Token', csrf).send({ role: 'viewer' });
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('last_admin');
    } finally {
      await scoped.close();
    }
  });
});

describe('CSRF protection', () => {
  it('when a signed-in mutation comes without the token, with a wrong one, or from another origin, then it is refused', async () => {
    const admin = await createUser(t.db, { role: 'admin' });
    const { agent, csrf } = await signIn(t, admin.email, admin.password);
    const missing = await agent.post('/api/teams').send({ name: 'No token team' });
    expect(missing.status).toBe(403);
    expect(missing.body.error.code).toBe('csrf_failed');
    await agent.post('/api/teams').set('X-CSRF-Token', `${csrf}x`).send({ name: 'Wrong token team' }).expect(403);
    await agent.post('/api/teams').set('X-CSRF-Token', csrf).set('Origin', 'http://evil.example').send({ name: 'Evil team' }).expect(403);
    await agent.post('/api/teams').set('X-CSRF-Token', csrf).send({ name: `Token team ${Date.now()}` }).expect(201);
  });
});

describe('throttling', () => {
  it('when an account has 5 failed sign-ins, then the next attempt is refused with 429 even with the right password', async () => {
    const user = await createUser(t.db);
    for (let i = 0; i < 5; i += 1) {
      await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: 'wrong-password' }).expect(401);
    }
    const blocked = await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
  });

  it('when one address fails across many accounts, then it is throttled too', async () => {
    // the counts live in the database this file's apps share: start from none
    await t.db.delete(signInLimits);
    const tight = await startTestApp({ loginLimits: { perAccount: 100, perAddress: 3, windowMinutes: 15 } });
    try {
      for (let i = 0; i < 3; i += 1) {
        await request(tight.app).post('/api/auth/sign-in').send({ email: `n${i}@example.org`, password: 'wrong-password' }).expect(401);
      }
      await request(tight.app).post('/api/auth/sign-in').send({ email: 'n9@example.org', password: 'wrong-password' }).expect(429);
    } finally {
      await tight.close();
    }
  });

  it('when the app restarts, then the failed sign-ins counted before still count', async () => {
    await t.db.delete(signInLimits);
    const user = await createUser(t.db);
    const before = await startTestApp();
    try {
      for (let i = 0; i < 5; i += 1) {
        await request(before.app).post('/api/auth/sign-in').send({ email: user.email, password: 'wrong-password' }).expect(401);
      }
    } finally {
      await before.close();
    }
    const after = await startTestApp();
    try {
      const blocked = await request(after.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
      expect(blocked.status).toBe(429);
      expect(blocked.headers['ratelimit']).toMatch(/r=0/);
    } finally {
      await after.close();
    }
    // a successful sign-in is taken back off the count (once its answer has gone out)
    const other = await createUser(t.db);
    await request(t.app).post('/api/auth/sign-in').send({ email: other.email, password: other.password }).expect(200);
    const hits = async () =>
      (await t.db.select().from(signInLimits).where(eq(signInLimits.key, `sign-in:account:${other.email.toLowerCase()}`)))[0]?.hits;
    await expect.poll(hits, { timeout: 2000 }).toBe(0);
  });
});
