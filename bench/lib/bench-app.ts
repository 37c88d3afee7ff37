// The real app in-process for the upload benchmark: a seeded world (team, scientist, enzyme,
// kinetic assay, study) on the benchmark's database, and a signed-in HTTP agent that posts files.
// GENERATED DATA: every record here is invented for the benchmark.
import type { Server } from 'node:http';
import request from 'supertest';
import { createApp } from '../../server/app';
import { hashPassword } from '../../server/auth/passwords';
import { createDb, type Db } from '../../server/db/client';
import {
  assays,
  enzymes,
  plates,
  studies,
  studyVariants,
  teamMembers,
  teams,
  users,
  variants,
} from '../../server/db/schema';
import { createJobQueue } from '../../server/jobs/queue';
import { createMailer } from '../../server/mail/mailer';

export type BenchWorld = { teamId: string; userId: string; studyId: string };

const email = 'bench@example.org';
const password = 'bench-password';

export async function seedBenchWorld(db: Db): Promise<BenchWorld> {
  const [team] = await db.insert(teams).values({ name: 'Bench team' }).returning();
  const [user] = await db
    .insert(users)
    .values({ email, name: 'Bench', role: 'scientist', passwordHash: await hashPassword(password, 10) })
    .returning();
  await db.insert(teamMembers).values({ teamId: team.id, userId: user.id });
  const [enzyme] = await db
    .insert(enzymes)
    .values({ teamId: team.id, name: 'Bench enzyme', createdBy: user.id })
    .returning();
  const [variant] = await db
    .insert(variants)
    .values({ teamId: team.id, enzymeId: enzyme.id, name: 'WT', isParent: true })
    .returning();
  const [assay] = await db
    .insert(assays)
    .values({
      teamId: team.id,
      name: 'Bench assay',
      substrate: 's',
      substrateMm: 1,
      readMode: 'kinetic',
      detection: 'absorbance',
      wavelengthNm: 405,
      quantitation: 'extinction',
      extinctionCoefficient: 18000,
      pathLengthCm: 0.5,
      wellVolumeUl: 200,
      temperatureC: 37,
      createdBy: user.id,
    })
    .returning();
  const [study] = await db
    .insert(studies)
    .values({
      teamId: team.id,
      name: 'Bench study',
      enzymeId: enzyme.id,
      referenceVariantId: variant.id,
      assayId: assay.id,
      ownerId: user.id,
    })
    .returning();
  await db.insert(studyVariants).values({ studyId: study.id, variantId: variant.id });
  return { teamId: team.id, userId: user.id, studyId: study.id };
}

/** The app listening on `url`'s database, signed in as the bench scientist; `upload` posts the file to a plate. */
export async function startBenchApp(url: string, world: BenchWorld) {
  const { pool, db } = createDb(url);
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
  // Listening once, as server/index.ts does (supertest would otherwise start a server per request).
  const server = await new Promise<Server>((resolve) => {
    const listening = app.listen(0, '127.0.0.1', () => resolve(listening));
  });
  const agent = request.agent(server);
  const signIn = await agent.post('/api/auth/sign-in').send({ email, password });
  const csrf = signIn.body.csrfToken as string;
  let count = 0;
  return {
    /** A fresh plate (not timed), so no upload is refused as a duplicate of an earlier one. */
    async newPlate(): Promise<string> {
      count += 1;
      const [plate] = await db
        .insert(plates)
        .values({
          teamId: world.teamId,
          studyId: world.studyId,
          name: `P${count}`,
          format: 384,
          map: { wells: {} },
          createdBy: world.userId,
        })
        .returning({ id: plates.id });
      return plate.id;
    },
    async upload(plateId: string, bytes: Buffer, selection: string): Promise<void> {
      const res = await agent
        .post(`/api/plates/${plateId}/reads`)
        .set('X-CSRF-Token', csrf)
        .field('selection', selection)
        .attach('file', bytes, `bench-${count}.xlsx`);
      if (res.status !== 201) throw new Error(`upload answered ${res.status}: ${JSON.stringify(res.body)}`);
    },
    async close() {
      await new Promise((resolve) => server.close(resolve));
      await pool.end();
    },
  };
}
