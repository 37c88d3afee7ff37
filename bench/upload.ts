// Upload-to-stored time of a 384-well kinetic workbook with 120 reads (issue 5 "Speed"): the real
// app in-process on a throwaway PostgreSQL cluster; each run POSTs the file and its selection over
// HTTP to a fresh plate and waits for the 201 (parse, raw file, reads and 384 well records stored in
// one transaction). Beside it, exceljs alone loading the same bytes, and the process's peak memory.
// Targets: under 1.5 s, within 1.5× of exceljs alone, peak memory under 300 MB.
//   npx tsx bench/upload.ts [--runs 5]
// GENERATED DATA: the workbook is invented (bench/lib/kinetic-workbook.ts).
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import ExcelJS from 'exceljs';
import request from 'supertest';
import { createApp } from '../server/app';
import { createDb, runMigrations } from '../server/db/client';
import { createDatabaseIfMissing, freePort, removeCluster, startCluster } from '../server/db/postgres';
import { plates, studies, studyVariants, teamMembers, teams, users, variants, enzymes, assays } from '../server/db/schema';
import { hashPassword } from '../server/auth/passwords';
import { createMailer } from '../server/mail/mailer';
import { createJobQueue } from '../server/jobs/queue';
import { makeWorkbook, READS } from './lib/kinetic-workbook';

const runsAt = process.argv.indexOf('--runs');
const runs = runsAt > 0 ? Number(process.argv[runsAt + 1]) : 5;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bellwether-bench-pg-'));
const cluster = startCluster({ dataDir, port: await freePort(), throwaway: true, log: () => {} });
try {
  await createDatabaseIfMissing(cluster.adminUrl('postgres'), 'bench');
  const url = cluster.adminUrl('bench');
  await runMigrations(url);
  const { pool, db } = createDb(url);
  const [team] = await db.insert(teams).values({ name: 'Bench team' }).returning();
  const [user] = await db.insert(users).values({ email: 'bench@example.org', name: 'Bench', role: 'scientist', passwordHash: await hashPassword('bench-password', 10) }).returning();
  await db.insert(teamMembers).values({ teamId: team.id, userId: user.id });
  const [enzyme] = await db.insert(enzymes).values({ teamId: team.id, name: 'Bench enzyme', createdBy: user.id }).returning();
  const [variant] = await db.insert(variants).values({ teamId: team.id, enzymeId: enzyme.id, name: 'WT', isParent: true }).returning();
  const [assay] = await db
    .insert(assays)
    .values({ teamId: team.id, name: 'Bench assay', substrate: 's', substrateMm: 1, readMode: 'kinetic', detection: 'absorbance', wavelengthNm: 405, quantitation: 'extinction', extinctionCoefficient: 18000, pathLengthCm: 0.5, wellVolumeUl: 200, temperatureC: 37, createdBy: user.id })
    .returning();
  const [study] = await db.insert(studies).values({ teamId: team.id, name: 'Bench study', enzymeId: enzyme.id, referenceVariantId: variant.id, assayId: assay.id, ownerId: user.id }).returning();
  await db.insert(studyVariants).values({ studyId: study.id, variantId: variant.id });

  const app = createApp({
    db,
    pool,
    mailer: createMailer({ host: '127.0.0.1', port: 9 }, 'bench@localhost'),
    jobs: createJobQueue(url, {}, () => {}),
    log: { info: () => {}, warn: (m) => process.stderr.write(`${m}\n`) },
    config: {
      appUrl: 'http://bench.invalid',
      sessionSecret: 'bench-session-secret-0123456789-0123456789',
      sessionIdleMinutes: 60,
      trustProxy: false,
      loginLimits: { perAccount: 100, perAddress: 100, windowMinutes: 15 },
      clientDir: null,
      pruneSessions: false,
    },
  });
  const agent = request.agent(app);
  const signIn = await agent.post('/api/auth/sign-in').send({ email: 'bench@example.org', password: 'bench-password' });
  const csrf = signIn.body.csrfToken as string;
  const bytes = await makeWorkbook();
  const selection = JSON.stringify([{ type: 'kinetic', blockIndex: 0, wavelengthNm: 405 }]);

  const excel: number[] = [];
  const upload: number[] = [];

  for (let i = 0; i < runs + 1; i += 1) {
    const [plate] = await db.insert(plates).values({ teamId: team.id, studyId: study.id, name: `P${i}`, format: 384, map: { wells: {} }, createdBy: user.id }).returning();
    let start = performance.now();
    await new ExcelJS.Workbook().xlsx.load(bytes as unknown as Parameters<ExcelJS.Xlsx['load']>[0]);
    const excelMs = performance.now() - start;

    start = performance.now();
    const res = await agent.post(`/api/plates/${plate.id}/reads`).set('X-CSRF-Token', csrf).field('selection', selection).attach('file', bytes, `bench-${i}.xlsx`);
    const uploadMs = performance.now() - start;
    if (res.status !== 201) throw new Error(`upload answered ${res.status}: ${JSON.stringify(res.body)}`);
    // The first run warms the JIT and the connection pool; it is reported apart.
    if (i === 0) process.stdout.write(`first (cold) run: exceljs ${excelMs.toFixed(0)} ms, upload-to-stored ${uploadMs.toFixed(0)} ms\n`);
    else {
      excel.push(excelMs);

      upload.push(uploadMs);
    }
  }
  const peakMb = process.resourceUsage().maxRSS / 1024;
  const ratio = median(upload) / median(excel);
  process.stdout.write(
    [
      `workbook: 384 wells x ${READS} reads, ${(bytes.length / 1024).toFixed(0)} KiB; ${runs} timed runs`,
      `exceljs load alone      median ${median(excel).toFixed(0)} ms`,
      `upload-to-stored (HTTP) median ${median(upload).toFixed(0)} ms   target < 1500 ms`,
      `ratio upload / exceljs  ${ratio.toFixed(2)}   target <= 1.5`,
      `peak RSS of the whole process (app, database client and benchmark) ${peakMb.toFixed(0)} MB   target < 300 MB`,
      `load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} CPUs`,
    ].join('\n') + '\n',
  );
  await pool.end();
} finally {
  cluster.stop();
  removeCluster(dataDir);
}
