// The real Express app in-process, on this test file's own database, with the local fake SMTP
// server on a free port (its messages land in mail_messages, as in development).
import { desc } from 'drizzle-orm';
import { createApp } from '../../../server/app';
import type { AppConfig } from '../../../server/context';
import { createDb, type Db } from '../../../server/db/client';
import { mailMessages } from '../../../server/db/schema';
import { startFakeSmtp } from '../../../server/mail/fake-smtp';
import { createMailer } from '../../../server/mail/mailer';
import { createAppJobs } from '../../../server/jobs/app-jobs';

export const testSessionSecret = 'test-session-secret-that-is-long-enough-0123456789';

export type TestApp = Awaited<ReturnType<typeof startTestApp>>;

export async function startTestApp(overrides: Partial<AppConfig> = {}) {
  const url = process.env.BW_TEST_DATABASE_URL;
  if (!url) throw new Error('BW_TEST_DATABASE_URL is not set: run through the integration project.');
  const { pool, db } = createDb(url, 5);
  const smtp = await startFakeSmtp(db, 0);
  const mailer = createMailer({ host: '127.0.0.1', port: smtp.port }, 'Bellwether <bellwether@test.invalid>');
  const config: AppConfig = {
    appUrl: 'http://bellwether.test',
    sessionSecret: testSessionSecret,
    sessionIdleMinutes: 60,
    trustProxy: false,
    loginLimits: { perAccount: 5, perAddress: 100, windowMinutes: 15 },
    clientDir: null,
    pruneSessions: false,
    ...overrides,
  };
  // A server-side failure (500) reaches console.error, which fails the test.
  const log = { info: () => {}, warn: (m: string) => console.error(m) };
  const jobs = createAppJobs(url, db, log);
  const app = createApp({ db, pool, mailer, log, config, jobs });
  return {
    app,
    db,
    pool,
    config,
    async close() {
      await jobs.stop();
      mailer.close();
      await smtp.close();
      await pool.end();
    },
  };
}

export async function latestMail(db: Db) {
  const [message] = await db.select().from(mailMessages).orderBy(desc(mailMessages.receivedAt)).limit(1);
  return message;
}

/** The first http(s) link of a message's text. */
export function linkIn(text: string): string {
  const match = /https?:\/\/\S+/.exec(text);
  if (!match) throw new Error(`No link in message:\n${text}`);
  return match[0];
}
