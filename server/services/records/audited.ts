// Team-scoped records: loading with access checks, and writes that carry their audit row in the
// same transaction. Every resource service builds on these few functions.
import { eq } from 'drizzle-orm';
import type { AnyPgColumn, PgTable } from 'drizzle-orm/pg-core';
import { assertTeamAccess } from '../../auth/authorize';
import type { DbOrTx } from '../../db/client';
import { notFound } from '../../errors';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';

type RecordTable = PgTable & { id: AnyPgColumn; teamId: AnyPgColumn };
type Row = { id: string; teamId: string } & Record<string, unknown>;

/** The row, if it exists and the user's teams may see it; otherwise 404 (existence does not leak). */
export function visible<T extends { teamId: string } | undefined>(row: T, user: CurrentUser, what: string): NonNullable<T> {
  if (!row) throw notFound(what);
  assertTeamAccess(user, row.teamId, what);
  return row as NonNullable<T>;
}

export async function loadVisible<T extends RecordTable>(db: DbOrTx, table: T, id: string, user: CurrentUser, what: string) {
  const [row] = (await db.select().from(table as PgTable).where(eq(table.id, id))) as Row[];
  return visible(row, user, what) as T['$inferSelect'];
}

export async function insertAudited<T extends RecordTable>(
  tx: DbOrTx,
  actor: CurrentUser,
  entity: string,
  table: T,
  values: T['$inferInsert'],
): Promise<T['$inferSelect']> {
  const [row] = (await tx.insert(table).values(values).returning()) as unknown as Row[];
  await writeAudit(tx, { actorId: actor.id, teamId: row.teamId, entity, entityId: row.id, action: 'create', after: row });
  return row as T['$inferSelect'];
}

export async function updateAudited<T extends RecordTable>(
  tx: DbOrTx,
  actor: CurrentUser,
  entity: string,
  table: T,
  before: Row,
  change: Partial<T['$inferInsert']>,
): Promise<T['$inferSelect']> {
  const withTime = 'updatedAt' in table ? { ...change, updatedAt: new Date() } : change;
  const [row] = (await tx.update(table).set(withTime).where(eq(table.id, before.id)).returning()) as unknown as Row[];
  await writeAudit(tx, { actorId: actor.id, teamId: row.teamId, entity, entityId: row.id, action: 'update', before, after: row });
  return row as T['$inferSelect'];
}

export async function deleteAudited<T extends RecordTable>(tx: DbOrTx, actor: CurrentUser, entity: string, table: T, before: Row) {
  await tx.delete(table).where(eq(table.id, before.id));
  await writeAudit(tx, { actorId: actor.id, teamId: before.teamId, entity, entityId: before.id, action: 'delete', before });
}

/**
 * The team ids a list may show: the asked-for team if readable, else all readable teams;
 * null means every team (admins); an empty list means nothing.
 */
export function listScope(user: CurrentUser, teamId?: string): string[] | null {
  const readable = user.role === 'admin' ? null : user.teamIds;
  if (!teamId) return readable;
  return readable === null || readable.includes(teamId) ? [teamId] : [];
}

/** Rows as the client receives them (Dates as ISO strings). */
export const asJson = <T>(value: unknown) => JSON.parse(JSON.stringify(value)) as T;
