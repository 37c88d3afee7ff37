// The app as browser tests see it: the built client and the API on E2E_PORT, a throwaway
// PostgreSQL cluster (removed on exit) with migrations and the demo seed, and the fake SMTP server.
// It writes test-results/e2e-server.json so fixtures can reach the same database.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { createApp } from '../server/app';
import { createDb, runMigrations } from '../server/db/client';
import { createDatabaseIfMissing, freePort, removeCluster, startCluster } from '../server/db/postgres';
import { seedDemo } from '../server/db/seed';
import { startFakeSmtp } from '../server/mail/fake-smtp';
import { createMailer } from '../server/mail/mailer';
import { createAppJobs } from '../server/jobs/app-jobs';
import { e2eSessionSecret, e2eStateFile } from './state';

const port = Number(process.env.E2E_PORT ?? 3100);
const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bellwether-e2e-pg-'));
const cluster = startCluster({ dataDir, port: await freePort(), throwaway: true, log: () => {} });
let closing: (() => Promise<void>) | null = null;

/** Playwright waits 20 s after SIGTERM before it kills this process: the cluster must go before. */
const CLOSE_WITHIN_MS = 8_000;

async function stop() {
  try {
    // an analysis job still running, or a request still open, must not keep the cluster alive
    await Promise.race([closing?.(), new Promise((resolve) => setTimeout(resolve, CLOSE_WITHIN_MS).unref())]);
  } finally {
    cluster.stop();
    removeCluster(dataDir);
    fs.rmSync(e2eStateFile, { force: true });
    process.exit(0);
  }
}
process.on('SIGTERM', () => void stop());
process.on('SIGINT', () => void stop());

try {
  await createDatabaseIfMissing(cluster.adminUrl('postgres'), 'bellwether');
  const url = cluster.adminUrl('bellwether');
  await runMigrations(url);
  const { pool, db } = createDb(url);
  await seedDemo(db);
  const smtp = await startFakeSmtp(db, 0);
  const mailer = createMailer({ host: '127.0.0.1', port: smtp.port }, 'Bellwether <bellwether@localhost>');
  const log = { info: () => {}, warn: (m: string) => console.error(m) };
  const jobs = createAppJobs(url, db, log);
  const app = createApp({
    db,
    pool,
    mailer,
    jobs,
    log,
    config: {
      appUrl: `http://localhost:${port}`,
      sessionSecret: e2eSessionSecret,
      sessionIdleMinutes: 120,
      trustProxy: false,
      loginLimits: { perAccount: 50, perAddress: 1000, windowMinutes: 15 },
      clientDir: path.resolve('dist/client'),
      pruneSessions: false,
    },
  });
  const server = app.listen(port, '127.0.0.1');
  fs.mkdirSync(path.dirname(e2eStateFile), { recursive: true });
  fs.writeFileSync(e2eStateFile, JSON.stringify({ databaseUrl: url }));
  closing = async () => {
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeAllConnections();
    await closed;
    await jobs.stop();
    mailer.close();
    await smtp.close();
    await pool.end();
  };
} catch (error) {
  console.error(error);
  await stop();
}
