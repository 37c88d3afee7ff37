// The demo seed: everything the README promises is there, and a second run duplicates nothing.
import { getTableName, is, sql } from 'drizzle-orm';
import { PgTable } from 'drizzle-orm/pg-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as schema from '../../server/db/schema';
import { seedDemo } from '../../server/db/seed';
import { startTestApp, type TestApp } from './helpers/app';
import { signIn } from './helpers/session';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t?.close());

const tables = (Object.values(schema) as unknown[]).filter((v): v is PgTable => is(v, PgTable));

async function counts() {
  const result: Record<string, number> = {};
  for (const table of tables) {
    const name = getTableName(table);
    if (name === 'audit_log' || name === 'session') continue;
    const rows = await t.db.execute(sql.raw(`select count(*)::int as n from "${name}"`));
    result[name] = (rows.rows[0] as { n: number }).n;
  }
  return result;
}

describe('demo seed', () => {
  it('when the seed runs twice, then the second run adds nothing; the demo accounts sign in and see the demo enzyme', async () => {
    await seedDemo(t.db);
    const first = await counts();
    await seedDemo(t.db);
    expect(await counts()).toEqual(first);
    expect(first.users).toBe(5);
    expect(first.enzymes).toBe(1);
    expect(first.variants).toBe(5);
    expect(first.assays).toBe(2);
    expect(first.buffer_series).toBe(1);
    expect(first.studies).toBe(3);
    expect(first.plates).toBe(7);
    expect(first.reader_files).toBe(7);
    expect(first.well_records).toBe(7 * 96);
    expect(first.exclusions).toBe(1);
    expect(first.comparisons).toBe(1);
    expect(first.analysis_runs).toBe(3);
    const scientist = await signIn(t, 'scientist@example.org', 'fennel-ridge-demo');
    const enzymes = await scientist.agent.get('/api/enzymes').expect(200);
    expect(enzymes.body.map((e: { name: string }) => e.name)).toEqual(['FR1 phytase']);
    const series = await scientist.agent.get('/api/buffer-series').expect(200);
    expect(series.body[0].input.pHPoints[0]).toBe(2.5);
    const studies = await scientist.agent.get('/api/studies').expect(200);
    expect(studies.body.map((x: { status: string }) => x.status).sort()).toEqual(['approved', 'draft', 'in_review']);
  });
});
