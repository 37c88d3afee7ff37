// Starts Bellwether: database (own cluster or DATABASE_URL), migrations, optional demo seed,
// the local fake SMTP server (unless SMTP_URL is set), then the HTTP server. Ctrl-C stops all of it.
//   tsx server/index.ts [--seed] [--api-only]
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { createApp } from './app';
import type { Logger } from './context';
import { createDb } from './db/client';
import { seedDemo } from './db/seed';
import { demoPassword, demoPeople } from './db/seed/demo-people';
import { openDatabase } from './database';
import { readEnv } from './env';
import { startFakeSmtp, type FakeSmtp } from './mail/fake-smtp';
import { createMailer } from './mail/mailer';
import { createAppJobs } from './jobs/app-jobs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const args = new Set(process.argv.slice(2));
const log: Logger = { info: (m) => console.log(m), warn: (m) => console.warn(m) };

function sessionSecret(dataDir: string, fromEnv: string | undefined) {
  if (fromEnv) return fromEnv;
  const file = path.join(dataDir, 'session-secret');
  if (!fs.existsSync(file)) {
    fs.mkdirSync(dataDir, { recursive: true });
    fs.writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600 });
  }
  return fs.readFileSync(file, 'utf8').trim();
}

async function main() {
  const env = readEnv();
  const dataDir = path.resolve(root, env.BELLWETHER_DATA_DIR);
  const appUrl = env.APP_URL ?? `http://localhost:${env.PORT}`;
  const cleanups: (() => Promise<void> | void)[] = [];
  let stopping = false;
  const shutdown = async (code: number) => {
    if (stopping) return;
    stopping = true;
    for (const cleanup of cleanups.reverse()) {
      try {
        await cleanup();
      } catch (error) {
        log.warn(`While stopping: ${error instanceof Error ? error.message : String(error)}`);
      }
    }
    process.exit(code);
  };
  process.on('SIGINT', () => void shutdown(0));
  process.on('SIGTERM', () => void shutdown(0));

  try {
    const database = await openDatabase({ ...env, BELLWETHER_DATA_DIR: dataDir }, log.info);
    cleanups.push(database.stop);
    const { pool, db } = createDb(database.url);
    cleanups.push(() => pool.end());
    if (args.has('--seed')) {
      log.info('Loading the demo data (generated; safe to run again)…');
      await seedDemo(db, log.info);
    }

    let smtp: FakeSmtp | null = null;
    if (!env.SMTP_URL) {
      smtp = await startFakeSmtp(db, env.FAKE_SMTP_PORT);
      cleanups.push(() => smtp?.close());
    }
    const mailer = createMailer(env.SMTP_URL ? { url: env.SMTP_URL } : { host: '127.0.0.1', port: smtp!.port }, env.MAIL_FROM);
    cleanups.push(() => mailer.close());

    const jobs = createAppJobs(database.url, db, log);
    cleanups.push(() => jobs.stop());
    const app = createApp({
      db,
      pool,
      mailer,
      log,
      jobs,
      config: {
        appUrl,
        sessionSecret: sessionSecret(dataDir, env.SESSION_SECRET),
        sessionIdleMinutes: env.SESSION_IDLE_MINUTES,
        trustProxy: env.TRUST_PROXY,
        loginLimits: {
          perAccount: env.LOGIN_MAX_PER_ACCOUNT,
          perAddress: env.LOGIN_MAX_PER_ADDRESS,
          windowMinutes: env.LOGIN_WINDOW_MINUTES,
        },
        clientDir: args.has('--api-only') ? null : path.join(root, 'dist/client'),
        pruneSessions: true,
      },
    });
    const server = app.listen(env.PORT, env.HOST);
    await new Promise<void>((resolve, reject) => {
      server.once('listening', resolve);
      server.once('error', reject);
    });
    cleanups.push(() => new Promise<void>((resolve) => server.close(() => resolve())));
    server.closeIdleConnections?.();

    log.info('');
    log.info(`Bellwether is running on ${appUrl}${args.has('--api-only') ? ' (API only)' : ''}`);
    log.info(`  database: ${database.description}`);
    log.info(`  e-mail:   ${smtp ? `local fake SMTP on 127.0.0.1:${smtp.port}; admins read it under Admin → Outbox` : 'SMTP_URL'}`);
    if (args.has('--seed')) {
      log.info(`  demo accounts (password "${demoPassword}"):`);
      for (const p of demoPeople) log.info(`    ${p.role.padEnd(10)} ${p.email.padEnd(26)} ${p.name}`);
    }
    log.info('Press Ctrl-C to stop.');
  } catch (error) {
    log.warn(`Bellwether could not start: ${error instanceof Error ? error.message : String(error)}`);
    await shutdown(1);
  }
}

void main();
