// Plates, plate maps and reader files over HTTP on the real database, with the generated reader
// fixtures of tests/fixtures/readers (made by make-fixtures.ts; generated data).
import fs from 'node:fs';
import path from 'node:path';
import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditLog, readerFiles, reads, studies, wellRecords } from '../../server/db/schema';
import { parseReaderFile } from '../../server/import';
import { startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { createStudyWorld } from './helpers/records';
import { signIn } from './helpers/session';

const fixture = (name: string) => path.resolve('tests/fixtures/readers', name);

let t: TestApp;
let teamId: string;
let scientistId: string;
let scientist: Awaited<ReturnType<typeof signIn>>;
let viewer: Awaited<ReturnType<typeof signIn>>;
let outsider: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await startTestApp();
  teamId = (await createTeam(t.db)).id;
  const s = await createUser(t.db, { role: 'scientist', teamIds: [teamId] });
  scientistId = s.id;
  scientist = await signIn(t, s.email, s.password);
  const v = await createUser(t.db, { role: 'viewer', teamIds: [teamId] });
  viewer = await signIn(t, v.email, v.password);
  const o = await createUser(t.db, { role: 'scientist', teamIds: [(await createTeam(t.db)).id] });
  outsider = await signIn(t, o.email, o.password);
});
afterAll(() => t?.close());

async function newPlate(format: 96 | 384 = 96) {
  const world = await createStudyWorld(t.db, teamId, scientistId);
  const res = await scientist.agent.post(`/api/studies/${world.study.id}/plates`).set('X-CSRF-Token', scientist.csrf).send({ name: 'Plate 1', format }).expect(201);
  return { world, plate: res.body as { id: string; version: number } };
}

describe('plate maps', () => {
  it('when two people save the same version, then the second gets 409 and the map keeps the first save', async () => {
    const { world, plate } = await newPlate();
    const map = (pH: number) => ({
      replicatesRequired: 2,
      wells: {
        A1: { role: 'sample', variantId: world.parent.id, pH, replicate: 1 },
        A2: { role: 'sample', variantId: world.parent.id, pH, replicate: 2 },
        A3: { role: 'blank', pH },
      },
    });
    const first = await scientist.agent.put(`/api/plates/${plate.id}/map`).set('X-CSRF-Token', scientist.csrf).send({ version: 1, map: map(4.5) });
    expect(first.body).toEqual({ id: plate.id, version: 2 });
    const stale = await scientist.agent.put(`/api/plates/${plate.id}/map`).set('X-CSRF-Token', scientist.csrf).send({ version: 1, map: map(6) });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_version');
    // the answer says which version the map has now
    expect(stale.body.error.currentVersion).toBe(2);
    const detail = await viewer.agent.get(`/api/plates/${plate.id}`).expect(200);
    expect(detail.body.map.wells.A1.pH).toBe(4.5);
    expect(detail.body.version).toBe(2);
    expect(detail.body.checks.map((c: { code: string }) => c.code)).toEqual(['no_role']);
  });

  it('when a map names a well the plate does not have, then it is refused', async () => {
    const { plate } = await newPlate();
    const res = await scientist.agent
      .put(`/api/plates/${plate.id}/map`)
      .set('X-CSRF-Token', scientist.csrf)
      .send({ version: 1, map: { wells: { M1: { role: 'blank', pH: 5 } } } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/"M1" is not a well of a 96-well plate/);
  });

  it('when a map is missing blanks and replicates, then the checks say so', async () => {
    const { world, plate } = await newPlate();
    await scientist.agent
      .put(`/api/plates/${plate.id}/map`)
      .set('X-CSRF-Token', scientist.csrf)
      .send({ version: 1, map: { wells: { B1: { role: 'sample', variantId: world.variant.id, pH: 3 } } } })
      .expect(200);
    const detail = await scientist.agent.get(`/api/plates/${plate.id}`).expect(200);
    const codes = detail.body.checks.map((c: { code: string }) => c.code);
    expect(codes).toEqual(expect.arrayContaining(['too_few_replicates', 'missing_blank']));
  });

  it('when a map is saved as a template and a plate copied, then the new plates start from that map', async () => {
    const { world, plate } = await newPlate();
    const map = { replicatesRequired: 3, wells: { C3: { role: 'blank', pH: 7 } } };
    await scientist.agent.put(`/api/plates/${plate.id}/map`).set('X-CSRF-Token', scientist.csrf).send({ version: 1, map }).expect(200);
    const tpl = await scientist.agent.post('/api/plate-templates').set('X-CSRF-Token', scientist.csrf).send({ teamId, name: 'Blanks', format: 96, map }).expect(201);
    const fromTemplate = await scientist.agent.post(`/api/studies/${world.study.id}/plates`).set('X-CSRF-Token', scientist.csrf).send({ name: 'P2', format: 96, templateId: tpl.body.id }).expect(201);
    expect(fromTemplate.body.map.wells.C3.role).toBe('blank');
    const copy = await scientist.agent.post(`/api/plates/${plate.id}/copy`).set('X-CSRF-Token', scientist.csrf).send({ name: 'P3' }).expect(201);
    expect(copy.body.map.wells.C3.pH).toBe(7);
    const wrongFormat = await scientist.agent.post(`/api/studies/${world.study.id}/plates`).set('X-CSRF-Token', scientist.csrf).send({ name: 'P4', format: 384, templateId: tpl.body.id });
    expect(wrongFormat.status).toBe(400);
  });
});

describe('reader files', () => {
  it('when a scientist uploads a kinetic workbook, then the preview finds it; after confirming, the wells are stored and the raw file comes back byte for byte', async () => {
    const { plate } = await newPlate();
    const bytes = fs.readFileSync(fixture('kinetic-seconds.xlsx'));
    const preview = await scientist.agent.post(`/api/plates/${plate.id}/reads/preview`).set('X-CSRF-Token', scientist.csrf).attach('file', bytes, 'kinetic-seconds.xlsx').expect(200);
    expect(preview.body.blocks.length).toBeGreaterThan(0);
    const block = preview.body.blocks.findIndex((b: { kind: string }) => b.kind === 'kinetic');
    expect(block).toBeGreaterThanOrEqual(0);
    expect(await t.db.$count(readerFiles, eq(readerFiles.plateId, plate.id))).toBe(0);

    const imported = await scientist.agent
      .post(`/api/plates/${plate.id}/reads`)
      .set('X-CSRF-Token', scientist.csrf)
      .field('selection', JSON.stringify([{ type: 'kinetic', blockIndex: block }]))
      .attach('file', bytes, 'kinetic-seconds.xlsx')
      .expect(201);
    const [readId] = imported.body.readIds;
    const read = await viewer.agent.get(`/api/reads/${readId}`).expect(200);
    expect(read.body.kind).toBe('kinetic');
    expect(read.body.timesS.length).toBe(preview.body.blocks[block].timesS.length);
    expect(read.body.wells.length).toBe(96);
    expect(read.body.wells[0].values.length).toBe(read.body.timesS.length);

    const raw = await viewer.agent.get(`/api/reader-files/${imported.body.fileId}/raw`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(Buffer.compare(raw.body as Buffer, bytes)).toBe(0);
    expect(raw.headers['x-content-sha256']).toBe(imported.body.sha256);
    // kept as uploaded, not compressed again (migration 0006): stored out of line, uncompressed
    const stored = await t.db.execute<{ storage: string; compressed: boolean }>(
      sql`select a.attstorage as storage, pg_column_compression(f.content) is not null as compressed
          from pg_attribute a, reader_files f
          where a.attrelid = 'reader_files'::regclass and a.attname = 'content' and f.id = ${imported.body.fileId}`,
    );
    expect(stored.rows[0]).toEqual({ storage: 'e', compressed: false });

    const again = await scientist.agent
      .post(`/api/plates/${plate.id}/reads`)
      .set('X-CSRF-Token', scientist.csrf)
      .field('selection', JSON.stringify([{ type: 'kinetic', blockIndex: block }]))
      .attach('file', bytes, 'kinetic-seconds.xlsx');
    expect(again.status).toBe(409);
    const second = await newPlate();
    const dupPreview = await scientist.agent.post(`/api/plates/${second.plate.id}/reads/preview`).set('X-CSRF-Token', scientist.csrf).attach('file', bytes, 'copy.xlsx').expect(200);
    expect(dupPreview.body.duplicates).toHaveLength(1);
    const audit = await t.db.select().from(auditLog).where(eq(auditLog.entityId, imported.body.fileId));
    expect(audit[0]).toMatchObject({ entity: 'reader-file', action: 'import', actorId: scientistId });
  });

  it('when saturated and empty wells are imported, then they are stored as missing with a flag, never as zero', async () => {
    const { plate } = await newPlate(384);
    const bytes = fs.readFileSync(fixture('endpoint-384-flags.xlsx'));
    const preview = await scientist.agent.post(`/api/plates/${plate.id}/reads/preview`).set('X-CSRF-Token', scientist.csrf).attach('file', bytes, 'flags.xlsx').expect(200);
    const selection = preview.body.blocks.map((b: { index: number }) => ({ type: 'endpoint', blockIndex: b.index }));
    const imported = await scientist.agent.post(`/api/plates/${plate.id}/reads`).set('X-CSRF-Token', scientist.csrf).field('selection', JSON.stringify(selection)).attach('file', bytes, 'flags.xlsx').expect(201);
    const rows = await t.db.select().from(wellRecords).where(eq(wellRecords.readId, imported.body.readIds[0]));
    const flagged = rows.filter((r) => r.flag);
    expect(flagged.length).toBeGreaterThan(0);
    expect(flagged.every((r) => r.value === null)).toBe(true);
    expect(new Set(flagged.map((r) => r.flag))).toEqual(new Set(Object.values(preview.body.blocks[0].flags)));
    const summary = await scientist.agent.get(`/api/plates/${plate.id}/reads`).expect(200);
    expect(summary.body[0].missingCount).toBe(flagged.length);
  });

  it('when a time course with missing points and a plate with flagged wells are imported, then every stored well holds exactly what the parser read', async () => {
    const stored = async (name: string, type: 'kinetic' | 'endpoint') => {
      const { plate } = await newPlate(name.includes('384') ? 384 : 96);
      const bytes = fs.readFileSync(fixture(name));
      const imported = await scientist.agent.post(`/api/plates/${plate.id}/reads`).set('X-CSRF-Token', scientist.csrf).field('selection', JSON.stringify([{ type, blockIndex: 0 }])).attach('file', bytes, name).expect(201);
      const rows = await t.db.select().from(wellRecords).where(eq(wellRecords.readId, imported.body.readIds[0]));
      const parsed = await parseReaderFile(bytes, name);
      if (!parsed.ok) throw new Error(parsed.error.message);
      return { rows: new Map(rows.map((r) => [r.well, r])), block: parsed.value.blocks[0] };
    };

    const kinetic = await stored('kinetic-minutes-a01.xlsx', 'kinetic');
    if (kinetic.block.kind !== 'kinetic') throw new Error('the fixture holds a time course');
    expect(kinetic.rows.size).toBe(Object.keys(kinetic.block.wells).length);
    expect(Object.keys(kinetic.block.detail.points).length).toBeGreaterThan(0);
    for (const [well, values] of Object.entries(kinetic.block.wells)) {
      expect(kinetic.rows.get(well)).toEqual({ readId: expect.any(String), well, value: null, values, flag: kinetic.block.flags[well] ?? null, pointFlags: kinetic.block.detail.points[well] ?? null });
    }

    const endpoint = await stored('endpoint-384-flags.xlsx', 'endpoint');
    if (endpoint.block.kind !== 'endpoint') throw new Error('the fixture holds a plate grid');
    expect(endpoint.rows.size).toBe(384);
    for (const [well, value] of Object.entries(endpoint.block.wells)) {
      expect(endpoint.rows.get(well)).toEqual({ readId: expect.any(String), well, value, values: null, flag: endpoint.block.flags[well] ?? null, pointFlags: null });
    }
  });

  it('when a file holds nothing a reader writes, then the answer says what was looked for and nothing is stored', async () => {
    const { plate } = await newPlate();
    const res = await scientist.agent
      .post(`/api/plates/${plate.id}/reads`)
      .set('X-CSRF-Token', scientist.csrf)
      .field('selection', JSON.stringify([{ type: 'endpoint', blockIndex: 0 }]))
      .attach('file', fs.readFileSync(fixture('nothing-here.csv')), 'nothing-here.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/looked for/);
    expect(await t.db.$count(readerFiles, eq(readerFiles.plateId, plate.id))).toBe(0);
  });

  it('when the selection does not fit the file, then nothing at all is stored', async () => {
    const { plate } = await newPlate();
    const bytes = fs.readFileSync(fixture('endpoint-96-multi.xlsx'));
    const res = await scientist.agent
      .post(`/api/plates/${plate.id}/reads`)
      .set('X-CSRF-Token', scientist.csrf)
      .field('selection', JSON.stringify([{ type: 'endpoint', blockIndex: 0 }, { type: 'endpoint', blockIndex: 99 }]))
      .attach('file', bytes, 'multi.xlsx');
    expect(res.status).toBe(400);
    expect(await t.db.$count(readerFiles, eq(readerFiles.plateId, plate.id))).toBe(0);
    expect(await t.db.$count(reads, eq(reads.plateId, plate.id))).toBe(0);
  });

  it('when an import fails for several reasons at once, then the file is named first, then the plate, then the duplicate, and nothing more is stored', async () => {
    const post = (plateId: string, name: string, bytes: Buffer) =>
      scientist.agent.post(`/api/plates/${plateId}/reads`).set('X-CSRF-Token', scientist.csrf).field('selection', JSON.stringify([{ type: 'kinetic', blockIndex: 0 }])).attach('file', bytes, name);
    const kinetic = fs.readFileSync(fixture('kinetic-seconds.xlsx'));
    const { world, plate } = await newPlate();
    await post(plate.id, 'kinetic-seconds.xlsx', kinetic).expect(201);
    const duplicate = await post(plate.id, 'again.xlsx', kinetic);
    expect(duplicate.status).toBe(409);
    expect(duplicate.body.error.code).toBe('duplicate_file');

    await t.db.update(studies).set({ status: 'approved' }).where(eq(studies.id, world.study.id));
    const unreadable = await post(plate.id, 'nothing-here.csv', fs.readFileSync(fixture('nothing-here.csv')));
    expect(unreadable.status).toBe(400);
    expect(unreadable.body.error.message).toMatch(/looked for/);
    const frozen = await post(plate.id, 'again.xlsx', kinetic);
    expect(frozen.status).toBe(409);
    expect(frozen.body.error.code).toBe('study_locked');
    expect(await t.db.$count(readerFiles, eq(readerFiles.plateId, plate.id))).toBe(1);
    expect(await t.db.$count(reads, eq(reads.plateId, plate.id))).toBe(1);
  });

  it('when several grids are successive reads, then they import as one time course', async () => {
    const { plate } = await newPlate();
    const bytes = fs.readFileSync(fixture('endpoint-96-multi.xlsx'));
    const preview = await scientist.agent.post(`/api/plates/${plate.id}/reads/preview`).set('X-CSRF-Token', scientist.csrf).attach('file', bytes, 'multi.xlsx').expect(200);
    const grids = preview.body.blocks.filter((b: { kind: string; plateFormat: number }) => b.kind === 'endpoint' && b.plateFormat === 96).map((b: { index: number }) => b.index);
    expect(grids.length).toBeGreaterThanOrEqual(2);
    const selection = [{ type: 'grids-as-kinetic', blockIndices: grids, timesS: grids.map((_: number, i: number) => i * 60), wavelengthNm: 405 }];
    const imported = await scientist.agent.post(`/api/plates/${plate.id}/reads`).set('X-CSRF-Token', scientist.csrf).field('selection', JSON.stringify(selection)).attach('file', bytes, 'multi.xlsx').expect(201);
    const read = await scientist.agent.get(`/api/reads/${imported.body.readIds[0]}`).expect(200);
    expect(read.body.kind).toBe('kinetic');
    expect(read.body.wells[0].values).toHaveLength(grids.length);
  });

  it('when a viewer uploads or another team looks, then it is refused', async () => {
    const { plate } = await newPlate();
    const bytes = fs.readFileSync(fixture('endpoint-96-single.xlsx'));
    await viewer.agent.post(`/api/plates/${plate.id}/reads/preview`).set('X-CSRF-Token', viewer.csrf).attach('file', bytes, 'a.xlsx').expect(403);
    await outsider.agent.get(`/api/plates/${plate.id}`).expect(404);
    await outsider.agent.post(`/api/plates/${plate.id}/reads/preview`).set('X-CSRF-Token', outsider.csrf).attach('file', bytes, 'a.xlsx').expect(404);
  });

  it('when the study is approved, then plate changes and uploads get 409', async () => {
    const { world, plate } = await newPlate();
    await t.db.update(studies).set({ status: 'approved' }).where(eq(studies.id, world.study.id));
    await scientist.agent.put(`/api/plates/${plate.id}/map`).set('X-CSRF-Token', scientist.csrf).send({ version: 1, map: { wells: {} } }).expect(409);
    await scientist.agent.post(`/api/plates/${plate.id}/reads/preview`).set('X-CSRF-Token', scientist.csrf).attach('file', fs.readFileSync(fixture('endpoint-96-single.xlsx')), 'a.xlsx').expect(409);
  });
});
