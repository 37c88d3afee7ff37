// Sessions for tests: either through the real sign-in route, or written straight into the
// session table (fast, for the role matrix), with the signed cookie express-session expects.
import { randomBytes } from 'node:crypto';
import cookieSignature from 'cookie-signature';
import request from 'supertest';
import type { Db } from '../../../server/db/client';
import { sessions } from '../../../server/db/schema';
import { sessionCookieName } from '../../../server/app';
import type { TestApp } from './app';

export type Session = { cookie: string; csrf: string };

export async function writeSession(db: Db, secret: string, userId: string, idleMinutes = 60): Promise<Session> {
  const sid = randomBytes(24).toString('base64url');
  const csrf = randomBytes(32).toString('base64url');
  const expire = new Date(Date.now() + idleMinutes * 60_000);
  await db.insert(sessions).values({
    sid,
    expire,
    sess: { cookie: { originalMaxAge: idleMinutes * 60_000, expires: expire.toISOString(), httpOnly: true, path: '/', sameSite: 'lax' }, userId, csrfToken: csrf },
  });
  const signed = `s:${cookieSignature.sign(sid, secret)}`;
  return { cookie: `${sessionCookieName}=${encodeURIComponent(signed)}`, csrf };
}

/** Signs in through POST /api/auth/sign-in and returns the agent with its CSRF token. */
export async function signIn(t: TestApp, email: string, password: string) {
  const agent = request.agent(t.app);
  const res = await agent.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, csrf: res.body.csrfToken as string, res };
}
