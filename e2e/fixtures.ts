// Playwright fixtures: `loginAs(role)` writes a session for a demo user straight into the
// database (no sign-in form), `db` reaches the same database as the app under test.
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { test as base, expect } from '@playwright/test';
import cookieSignature from 'cookie-signature';
import { desc, sql } from 'drizzle-orm';
import { createDb, type Db } from '../server/db/client';
import { mailMessages, sessions, users } from '../server/db/schema';
import { demoPassword, demoPeople } from '../server/db/seed/demo-people';
import type { Role } from '../shared/permissions';
import { e2eSessionSecret, e2eStateFile } from './state';

export { expect };
export const demo = { password: demoPassword, people: demoPeople };
export const demoUser = (role: Role, index = 0) => demoPeople.filter((p) => p.role === role)[index];

type Fixtures = {
  db: Db;
  loginAs: (role: Role, index?: number) => Promise<void>;
  latestMailTo: (address: string) => Promise<{ subject: string; text: string } | undefined>;
};

export const test = base.extend<Fixtures>({
  // eslint-disable-next-line no-empty-pattern -- Playwright needs the object pattern here
  db: async ({}, use) => {
    const { databaseUrl } = JSON.parse(fs.readFileSync(e2eStateFile, 'utf8')) as { databaseUrl: string };
    const { pool, db } = createDb(databaseUrl, 2);
    await use(db);
    await pool.end();
  },
  loginAs: async ({ db, context, baseURL }, use) => {
    await use(async (role, index = 0) => {
      const person = demoUser(role, index);
      const user = await db.query.users.findFirst({ where: sql`lower(${users.email}) = ${person.email}` });
      if (!user) throw new Error(`demo user ${person.email} is missing`);
      const sid = randomBytes(24).toString('base64url');
      const expire = new Date(Date.now() + 3600_000);
      await db.insert(sessions).values({
        sid,
        expire,
        sess: { cookie: { originalMaxAge: 3600_000, expires: expire.toISOString(), httpOnly: true, path: '/', sameSite: 'lax' }, userId: user.id, csrfToken: randomBytes(32).toString('base64url') },
      });
      await context.addCookies([
        { name: 'bw.sid', value: encodeURIComponent(`s:${cookieSignature.sign(sid, e2eSessionSecret)}`), url: baseURL!, httpOnly: true, sameSite: 'Lax' },
      ]);
    });
  },
  latestMailTo: async ({ db }, use) => {
    await use(async (address) => {
      const [m] = await db
        .select()
        .from(mailMessages)
        .where(sql`${address.toLowerCase()} = any(${mailMessages.recipients})`)
        .orderBy(desc(mailMessages.receivedAt))
        .limit(1);
      return m;
    });
  },
});

