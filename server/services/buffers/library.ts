// The buffer library: the built-in systems of shared/chemistry (seeded into the database, read-only)
// and a lab's own systems, which admins add with their values and sources.
import { asc, eq, sql } from 'drizzle-orm';
import { bufferLibrary, bufferPKas, bufferSystemSchema, findBufferSystem, validateBufferSystem, type BufferSystem } from '../../../shared/chemistry';
import { parseWith } from '../../validate';
import type { BufferDetail, BufferSummary } from '../../../shared/schemas/buffers-types';
import type { Db, DbOrTx } from '../../db/client';
import { bufferSeries, bufferSystems } from '../../db/schema';
import { badRequest, conflict, forbidden, notFound } from '../../errors';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';

type Row = typeof bufferSystems.$inferSelect;

function summary(row: Row): BufferSummary {
  const system = row.data as BufferSystem;
  // pKa at 37 °C (I = 0) beside the 25 °C value: the temperature most assays run at.
  const at37 = bufferPKas({ system: system.id, temperatureC: 37, library: row.builtIn ? [] : [system] });
  return {
    id: row.slug,
    name: row.name,
    aliases: system.aliases,
    builtIn: row.builtIn,
    designerDefault: system.designerDefault,
    steps: system.ionizations.map((ion, i) => ({
      label: ion.label,
      pKa25: ion.pKa25,
      zAcid: ion.zAcid,
      dpKadT: ion.dpKadT,
      pKa37: at37.ok ? Number(at37.value.steps[i].pKa.toFixed(3)) : null,
    })),
  };
}

/** Lab-added systems, for the chemistry functions' `library` argument. */
export async function labSystems(db: DbOrTx): Promise<BufferSystem[]> {
  const rows = await db.select().from(bufferSystems).where(eq(bufferSystems.builtIn, false));
  return rows.map((r) => r.data as BufferSystem);
}

export async function listBuffers(db: Db): Promise<BufferSummary[]> {
  const rows = await db.select().from(bufferSystems).orderBy(asc(bufferSystems.name));
  return rows.map(summary).sort((a, b) => a.steps[0].pKa25 - b.steps[0].pKa25 || a.name.localeCompare(b.name));
}

async function loadRow(db: DbOrTx, slug: string) {
  const row = await db.query.bufferSystems.findFirst({ where: eq(bufferSystems.slug, slug) });
  if (!row) throw notFound('That buffer system');
  return row;
}

export async function getBuffer(db: DbOrTx, slug: string): Promise<BufferDetail> {
  const row = await loadRow(db, slug);
  return { ...summary(row), system: row.data as BufferSystem, createdAt: row.createdAt.toISOString(), updatedAt: row.updatedAt.toISOString() };
}

/** Checked against shared/chemistry's schema; each problem is named on its field. */
function validated(candidate: unknown): BufferSystem {
  const parsed = parseWith(bufferSystemSchema, candidate, 'buffer system');
  const result = validateBufferSystem(parsed);
  if (!result.ok) throw badRequest(result.error.message);
  return result.value;
}

export async function createBuffer(db: Db, actor: CurrentUser, candidate: unknown) {
  const system = validated(candidate);
  return db.transaction(async (tx) => {
    const clash = findBufferSystem(system.id, await labSystems(tx)) ?? findBufferSystem(system.name, await labSystems(tx));
    if (clash) throw conflict(`A buffer system "${clash.name}" (${clash.id}) exists already; choose another id and name.`, 'name_taken');
    const [row] = await tx.insert(bufferSystems).values({ slug: system.id, name: system.name, builtIn: false, data: system, createdBy: actor.id }).returning();
    await writeAudit(tx, { actorId: actor.id, entity: 'buffer-system', entityId: row.slug, action: 'create', after: system });
    return getBuffer(tx, row.slug);
  });
}

export async function updateBuffer(db: Db, actor: CurrentUser, slug: string, candidate: unknown) {
  const system = validated(candidate);
  return db.transaction(async (tx) => {
    const before = await loadRow(tx, slug);
    if (before.builtIn) throw forbidden('Built-in buffer systems come with their published sources and cannot be edited; add a lab system instead.');
    if (system.id !== slug) throw badRequest('The id of a buffer system cannot change.', { id: 'Keep the id.' });
    await tx.update(bufferSystems).set({ name: system.name, data: system, updatedAt: new Date() }).where(eq(bufferSystems.slug, slug));
    await writeAudit(tx, { actorId: actor.id, entity: 'buffer-system', entityId: slug, action: 'update', before: before.data, after: system });
    return getBuffer(tx, slug);
  });
}

export async function deleteBuffer(db: Db, actor: CurrentUser, slug: string) {
  await db.transaction(async (tx) => {
    const before = await loadRow(tx, slug);
    if (before.builtIn) throw forbidden('Built-in buffer systems cannot be deleted.');
    const used = await tx.$count(bufferSeries, sql`${bufferSeries.design}::text like ${`%"systemId":"${slug}"%`}`);
    if (used > 0) throw conflict(`This buffer system is used by ${used} saved series.`, 'in_use');
    await tx.delete(bufferSystems).where(eq(bufferSystems.slug, slug));
    await writeAudit(tx, { actorId: actor.id, entity: 'buffer-system', entityId: slug, action: 'delete', before: before.data });
  });
}

/** Seeds (and keeps current) the built-in systems from shared/chemistry's library. */
export async function seedBuiltInBuffers(db: Db) {
  for (const system of bufferLibrary) {
    await db
      .insert(bufferSystems)
      .values({ slug: system.id, name: system.name, builtIn: true, data: system })
      .onConflictDoUpdate({ target: bufferSystems.slug, set: { name: system.name, data: system, builtIn: true }, where: eq(bufferSystems.builtIn, true) });
  }
}
