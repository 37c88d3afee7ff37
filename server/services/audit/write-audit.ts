// Every mutation writes one audit row in the same transaction as the change itself.
import type { DbOrTx } from '../../db/client';
import { auditLog } from '../../db/schema';

export type AuditEvent = {
  actorId: string | null;
  teamId?: string | null;
  entity: string;
  entityId?: string | null;
  action: string;
  before?: unknown;
  after?: unknown;
};

const secretKeys = new Set(['passwordHash', 'tokenHash', 'password', 'token']);

/** Drops secrets and turns Dates into ISO strings so the JSON is safe to show to admins. */
function redact(value: unknown): unknown {
  if (value === undefined || value === null) return null;
  return JSON.parse(JSON.stringify(value, (key, v) => (secretKeys.has(key) ? undefined : v)));
}

export async function writeAudit(tx: DbOrTx, event: AuditEvent) {
  await tx.insert(auditLog).values({
    actorId: event.actorId,
    teamId: event.teamId ?? null,
    entity: event.entity,
    entityId: event.entityId ?? null,
    action: event.action,
    before: redact(event.before),
    after: redact(event.after),
  });
}
