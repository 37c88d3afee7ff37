// Every API route × every kind of caller → the expected status. The routes are read from the
// Express app itself, so a new route without a rule here fails this test.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiRouteList } from '../../server/app';
import { eq } from 'drizzle-orm';
import { analysisJobs, bufferSeries, comparisons, exclusions, mailMessages, plates, plateTemplates, readerFiles, reads, studies } from '../../server/db/schema';
import { seedBuiltInBuffers } from '../../server/services/buffers/library';
import { startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { createPreparation, createStudyWorld } from './helpers/records';
import { writeSession } from './helpers/session';

const personas = ['anonymous', 'viewer', 'scientist', 'lead', 'admin', 'outsider'] as const;
type Persona = (typeof personas)[number];

// Columns: anonymous viewer scientist lead admin outsider (outsider = a lead of another team).
// 'ok' = allowed through: any status below 500 except 401, 403 and 404. Bodies are empty, so an
// allowed mutation usually answers 400 (validation), which shows it got past the access checks.
const rules: Record<string, string> = {
  'GET /api/health': 'ok ok ok ok ok ok',
  'POST /api/auth/sign-in': '400 400 400 400 400 400',
  'POST /api/auth/sign-out': '401 ok ok ok ok ok',
  'GET /api/me': '401 ok ok ok ok ok',
  'POST /api/me/password': '401 400 400 400 400 400',
  'POST /api/auth/password-reset': '400 400 400 400 400 400',
  'POST /api/auth/password-reset/complete': '400 400 400 400 400 400',
  'POST /api/invitations': '401 403 403 400 400 400',
  'GET /api/invitations/:token': '404 404 404 404 404 404',
  'POST /api/invitations/:token/accept': '400 400 400 400 400 400',
  'GET /api/users': '401 403 403 403 ok 403',
  'PATCH /api/users/:id': '401 403 403 403 400 403',
  'GET /api/teams': '401 ok ok ok ok ok',
  'GET /api/teams/:id': '401 ok ok ok ok 404',
  'POST /api/teams': '401 403 403 403 400 403',
  'POST /api/teams/:id/members': '401 403 403 403 400 403',
  'DELETE /api/teams/:id/members/:userId': '401 403 403 403 204 403',
  'GET /api/audit': '401 403 403 403 ok 403',
  'GET /api/outbox': '401 403 403 403 ok 403',
  'GET /api/outbox/:id': '401 403 403 403 ok 403',
  // Records of team A. Mutations of an approved study answer 409 to those allowed through.
  'GET /api/enzymes': '401 ok ok ok ok ok',
  'POST /api/enzymes': '401 403 400 400 400 400',
  'GET /api/enzymes/:id': '401 ok ok ok ok 404',
  'PATCH /api/enzymes/:id': '401 403 ok ok ok 404',
  'DELETE /api/enzymes/:id': '401 403 409 409 409 404',
  'POST /api/enzymes/:id/variants': '401 403 400 400 400 400',
  'PATCH /api/variants/:id': '401 403 ok ok ok 404',
  'DELETE /api/variants/:id': '401 403 409 409 409 404',
  'POST /api/variants/:id/preparations': '401 403 400 400 400 400',
  'PATCH /api/preparations/:id': '401 403 ok ok ok 404',
  'DELETE /api/preparations/:id': '401 403 204 204 204 404',
  'GET /api/assays': '401 ok ok ok ok ok',
  'POST /api/assays': '401 403 400 400 400 400',
  'GET /api/assays/:id': '401 ok ok ok ok 404',
  'PATCH /api/assays/:id': '401 403 ok ok ok 404',
  'DELETE /api/assays/:id': '401 403 409 409 409 404',
  'GET /api/studies': '401 ok ok ok ok ok',
  'POST /api/studies': '401 403 400 400 400 400',
  'GET /api/studies/:id': '401 ok ok ok ok 404',
  'PATCH /api/studies/:id': '401 403 409 409 409 404',
  'DELETE /api/studies/:id': '401 403 409 409 409 404',
  'GET /api/studies/:id/plates': '401 ok ok ok ok 404',
  'POST /api/studies/:id/plates': '401 403 400 400 400 400',
  'GET /api/plates/:id': '401 ok ok ok ok 404',
  'PATCH /api/plates/:id': '401 403 400 400 400 400',
  'PUT /api/plates/:id/map': '401 403 400 400 400 400',
  'POST /api/plates/:id/copy': '401 403 400 400 400 400',
  'DELETE /api/plates/:id': '401 403 409 409 409 404',
  'POST /api/plates/:id/reads/preview': '401 403 400 400 400 400',
  'POST /api/plates/:id/reads': '401 403 400 400 400 400',
  'GET /api/plates/:id/reads': '401 ok ok ok ok 404',
  'GET /api/reads/:id': '401 ok ok ok ok 404',
  'DELETE /api/reads/:id': '401 403 409 409 409 404',
  'GET /api/reader-files/:id/raw': '401 ok ok ok ok 404',
  'GET /api/plate-templates': '401 ok ok ok ok ok',
  'POST /api/plate-templates': '401 403 400 400 400 400',
  'DELETE /api/plate-templates/:id': '401 403 204 204 204 404',
  // Review steps on the approved study of team A: only unlock fits its status.
  'POST /api/studies/:id/submit': '401 403 409 409 409 404',
  'POST /api/studies/:id/withdraw': '401 403 409 409 409 404',
  'POST /api/studies/:id/approve': '401 403 403 409 409 404',
  'POST /api/studies/:id/return': '401 403 403 400 400 400',
  'POST /api/studies/:id/unlock': '401 403 403 403 400 403',
  'GET /api/studies/:id/history': '401 ok ok ok ok 404',
  'POST /api/studies/:id/comments': '401 403 400 400 400 400',
  'GET /api/buffers': '401 ok ok ok ok ok',
  'GET /api/buffers/:id': '401 ok ok ok ok ok',
  'POST /api/buffers': '401 403 403 403 400 403',
  'PUT /api/buffers/:id': '401 403 403 403 400 403',
  'DELETE /api/buffers/:id': '401 403 403 403 403 403',
  'POST /api/buffer-series/design': '401 400 400 400 400 400',
  'GET /api/buffer-series': '401 ok ok ok ok ok',
  'POST /api/buffer-series': '401 403 400 400 400 400',
  'GET /api/buffer-series/:id': '401 ok ok ok ok 404',
  'PATCH /api/buffer-series/:id': '401 403 400 400 400 400',
  'DELETE /api/buffer-series/:id': '401 403 409 409 409 404',
  'GET /api/buffer-series/:id/recipes.xlsx': '401 ok ok ok ok 404',
  // Analysis of the approved study (it has no reads, so the analysis itself answers 422).
  'GET /api/studies/:id/analysis': '401 ok ok ok ok 404',
  'PUT /api/studies/:id/analysis/settings': '401 403 400 400 400 400',
  'POST /api/studies/:id/exclusions': '401 403 400 400 400 400',
  'POST /api/exclusions/:id/lift': '401 403 400 400 400 400',
  'POST /api/studies/:id/analysis/recompute': '401 ok ok ok ok 404',
  'POST /api/studies/:id/analysis/bootstrap': '401 403 ok ok ok 404',
  'GET /api/analysis-jobs/:id': '401 ok ok ok ok 404',
  'GET /api/home': '401 ok ok ok ok ok',
  'GET /api/comparisons/profiles': '401 ok ok ok ok ok',
  'POST /api/comparisons/preview': '401 400 400 400 400 400',
  'GET /api/comparisons': '401 ok ok ok ok ok',
  'POST /api/comparisons': '401 403 400 400 400 400',
  'GET /api/comparisons/:id': '401 ok ok ok ok 404',
  'PUT /api/comparisons/:id': '401 403 400 400 400 400',
  'DELETE /api/comparisons/:id': '401 403 204 204 204 404',
  'GET /api/comparisons/:id/export.xlsx': '401 ok ok ok ok 404',
  'GET /api/comparisons/:id/export.csv': '401 ok ok ok ok 404',
  'GET /api/studies/:id/export.xlsx': '401 ok ok ok ok 404',
  'GET /api/studies/:id/export.csv': '401 ok ok ok ok 404',
};

const newComparison = async () => {
  const [row] = await t.db
    .insert(comparisons)
    .values({ teamId: world.study.teamId, name: 'C', entries: [{ studyId: world.study.id, variantId: world.parent.id }], referenceKey: `${world.study.id}:${world.parent.id}`, createdBy: world.study.ownerId })
    .returning();
  return row.id;
};

/** Routes that destroy their target get a fresh one for every caller. */
const freshTarget: Record<string, () => Promise<Record<string, string>>> = {
  'DELETE /api/comparisons/:id': async () => ({ id: await newComparison() }),
  'DELETE /api/preparations/:id': async () => ({ id: (await createPreparation(t.db, world.variant)).id }),
  'DELETE /api/plate-templates/:id': async () => {
    const [tpl] = await t.db.insert(plateTemplates).values({ teamId: world.study.teamId, name: 'T', format: 96, map: { wells: {} }, createdBy: world.study.ownerId }).returning();
    return { id: tpl.id };
  },
};

let t: TestApp;
const sessionOf: Partial<Record<Persona, () => Promise<{ cookie: string; csrf: string }>>> = {};
const ids: Record<string, string> = {};
let world: Awaited<ReturnType<typeof createStudyWorld>>;

beforeAll(async () => {
  t = await startTestApp({ loginLimits: { perAccount: 1000, perAddress: 1000, windowMinutes: 15 } });
  const teamA = await createTeam(t.db);
  const teamB = await createTeam(t.db);
  const people = {
    viewer: await createUser(t.db, { role: 'viewer', teamIds: [teamA.id] }),
    scientist: await createUser(t.db, { role: 'scientist', teamIds: [teamA.id] }),
    lead: await createUser(t.db, { role: 'lead', teamIds: [teamA.id] }),
    admin: await createUser(t.db, { role: 'admin' }),
    outsider: await createUser(t.db, { role: 'lead', teamIds: [teamB.id] }),
  };
  for (const [persona, user] of Object.entries(people)) {
    sessionOf[persona as Persona] = () => writeSession(t.db, t.config.sessionSecret, user.id);
  }
  const spare = await createUser(t.db, { role: 'scientist', teamIds: [teamA.id] });
  const [mail] = await t.db
    .insert(mailMessages)
    .values({ recipients: ['someone@example.org'], subject: 'test', raw: 'Subject: test\r\n\r\nbody' })
    .returning();
  Object.assign(ids, { id: teamA.id, userId: spare.id, token: 'x'.repeat(43), mail: mail.id, user: people.viewer.id });
  world = await createStudyWorld(t.db, teamA.id, people.scientist.id, { status: 'approved' });
  const prep = await createPreparation(t.db, world.variant);
  Object.assign(ids, {
    enzymes: world.enzyme.id,
    variants: world.variant.id,
    preparations: prep.id,
    assays: world.assay.id,
    studies: world.study.id,
  });
  const [series] = await t.db
    .insert(bufferSeries)
    .values({ teamId: teamA.id, name: 'S', input: { volumeMl: 10 }, design: { points: [], cautions: [], warnings: [], overridden: [], makeTemperatureC: 25, assayTemperatureC: 37 }, createdBy: people.scientist.id })
    .returning();
  await t.db.update(studies).set({ bufferSeriesId: series.id }).where(eq(studies.id, world.study.id));
  ids['buffer-series'] = series.id;

  const [plate] = await t.db
    .insert(plates)
    .values({ teamId: teamA.id, studyId: world.study.id, name: 'P', format: 96, map: { wells: {} }, createdBy: people.scientist.id })
    .returning();
  const [file] = await t.db
    .insert(readerFiles)
    .values({ teamId: teamA.id, plateId: plate.id, fileName: 'r.csv', sizeBytes: 3, sha256: 'x', contentType: 'text/csv', content: Buffer.from('a,b'), uploadedBy: people.scientist.id })
    .returning();
  const [read] = await t.db
    .insert(reads)
    .values({ teamId: teamA.id, plateId: plate.id, fileId: file.id, blockIndex: 0, kind: 'endpoint', label: 'r', sheet: 's', location: 'A1:M9' })
    .returning();
  Object.assign(ids, { plates: plate.id, 'reader-files': file.id, reads: read.id, buffers: 'tris' });
  const [exclusion] = await t.db
    .insert(exclusions)
    .values({ teamId: teamA.id, studyId: world.study.id, plateId: plate.id, well: 'A1', reason: 'matrix', createdBy: people.scientist.id })
    .returning();
  const [job] = await t.db
    .insert(analysisJobs)
    .values({ teamId: teamA.id, studyId: world.study.id, kind: 'bootstrap', state: 'done', requestedBy: people.scientist.id })
    .returning();
  Object.assign(ids, { exclusions: exclusion.id, 'analysis-jobs': job.id, comparisons: await newComparison() });
  await seedBuiltInBuffers(t.db);
});

afterAll(() => t?.close());

/** Fills a route's parameters: `:id` means the record of the route's own resource. */
function concretePath(path: string, extra: Record<string, string> = {}) {
  const resource = path.split('/')[2];
  const own = extra.id ?? { users: ids.user, outbox: ids.mail, teams: ids.id }[resource] ?? ids[resource];
  return path.replace(':id', own).replace(':userId', ids.userId).replace(':token', ids.token);
}

describe('role matrix', () => {
  it('has a rule for every route the app serves, and no rule for a route that does not exist', () => {
    const served = apiRouteList(t.app).map((r) => `${r.method} ${r.path}`).sort();
    expect(served).toEqual(Object.keys(rules).sort());
  });

  for (const [route, rule] of Object.entries(rules)) {
    const expected = rule.split(/\s+/);
    it.each(personas.map((p, i) => [p, expected[i]] as const))(`${route} as %s → %s`, async (persona, want) => {
      const [method, path] = route.split(' ');
      const extra = (await freshTarget[route]?.()) ?? {};
      let req = request(t.app)[method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete'](concretePath(path, extra));
      const make = sessionOf[persona];
      if (make) {
        const s = await make();
        req = req.set('Cookie', s.cookie).set('X-CSRF-Token', s.csrf);
      }
      if (method !== 'GET') req = req.send({});
      const res = await req;
      if (want === 'ok') {
        expect(res.status, JSON.stringify(res.body)).toBeLessThan(500);
        expect([401, 403, 404]).not.toContain(res.status);
      } else {
        expect(res.status, JSON.stringify(res.body)).toBe(Number(want));
      }
      if (res.status >= 400) {
        expect(res.body.error.code).toEqual(expect.any(String));
        expect(res.body.error.message).toEqual(expect.any(String));
      }
    });
  }
});
