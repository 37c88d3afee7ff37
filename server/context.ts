import type { Db } from './db/client';
import type { JobQueue } from './jobs/queue';
import type { Mail, Mailer } from './mail/mailer';

export type AppConfig = {
  /** Public address used in e-mailed links, e.g. http://localhost:3000 */
  appUrl: string;
  sessionSecret: string;
  sessionIdleMinutes: number;
  trustProxy: boolean;
  loginLimits: { perAccount: number; perAddress: number; windowMinutes: number };
  /** Folder of the built client to serve, or null (API only: tests, `npm run dev`). */
  clientDir: string | null;
  /** Prune expired sessions on a timer (off in tests, where the process must exit cleanly). */
  pruneSessions: boolean;
};

export type Logger = { info: (msg: string) => void; warn: (msg: string) => void };

export type AppContext = { db: Db; config: AppConfig; mailer: Mailer; log: Logger; jobs: JobQueue };

/** Sends after the change is committed; a mail failure is reported, never rolls the change back. */
export async function sendAfterCommit(ctx: AppContext, mail: Mail | null): Promise<boolean> {
  if (!mail) return false;
  try {
    await ctx.mailer.send(mail);
    return true;
  } catch (error) {
    ctx.log.warn(`E-mail to ${String(mail.to)} failed: ${error instanceof Error ? error.message : String(error)}`);
    return false;
  }
}
