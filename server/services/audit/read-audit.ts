import { and, count, desc, eq, gte, lte, type SQL } from 'drizzle-orm';
import type { z } from 'zod';
import type { AuditEntry, Page } from '../../../shared/schemas/api-types';
import type { auditQuerySchema } from '../../../shared/schemas/admin';
import type { Db } from '../../db/client';
import { auditLog, users } from '../../db/schema';

export async function readAudit(db: Db, q: z.output<typeof auditQuerySchema>): Promise<Page<AuditEntry>> {
  const conditions: SQL[] = [];
  if (q.entity) conditions.push(eq(auditLog.entity, q.entity));
  if (q.action) conditions.push(eq(auditLog.action, q.action));
  if (q.actorId) conditions.push(eq(auditLog.actorId, q.actorId));
  if (q.teamId) conditions.push(eq(auditLog.teamId, q.teamId));
  if (q.entityId) conditions.push(eq(auditLog.entityId, q.entityId));
  if (q.from) conditions.push(gte(auditLog.at, new Date(q.from)));
  if (q.to) conditions.push(lte(auditLog.at, new Date(q.to)));
  const where = conditions.length > 0 ? and(...conditions) : undefined;
  const rows = await db
    .select({ entry: auditLog, actorName: users.name })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(where)
    .orderBy(desc(auditLog.id))
    .limit(q.limit)
    .offset(q.offset);
  const [{ total }] = await db.select({ total: count() }).from(auditLog).where(where);
  return {
    total,
    items: rows.map(({ entry, actorName }) => ({
      id: entry.id,
      at: entry.at.toISOString(),
      actor: entry.actorId ? { id: entry.actorId, name: actorName ?? '(removed user)' } : null,
      teamId: entry.teamId,
      entity: entry.entity,
      entityId: entry.entityId,
      action: entry.action,
      before: entry.before,
      after: entry.after,
    })),
  };
}
