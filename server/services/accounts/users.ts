// The admin's view of accounts: list, change role, deactivate (which also ends open sessions).
import { and, asc, eq, ne } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { UserSummary } from '../../../shared/schemas/api-types';
import type { Db } from '../../db/client';
import { teamMembers, teams, users } from '../../db/schema';
import { conflict, notFound } from '../../errors';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';
import { endSessionsOf } from './sign-in';

export async function listUsers(db: Db): Promise<UserSummary[]> {
  const rows = await db.query.users.findMany({ orderBy: [asc(users.name)] });
  const memberships = await db
    .select({ userId: teamMembers.userId, id: teams.id, name: teams.name })
    .from(teamMembers)
    .innerJoin(teams, eq(teams.id, teamMembers.teamId))
    .orderBy(asc(teams.name));
  return rows.map((u) => ({
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    active: u.active,
    createdAt: u.createdAt.toISOString(),
    lastSignInAt: u.lastSignInAt?.toISOString() ?? null,
    teams: memberships.filter((m) => m.userId === u.id).map(({ id, name }) => ({ id, name })),
  }));
}

export async function updateUser(db: Db, actor: CurrentUser, userId: string, change: { role?: Role; active?: boolean }) {
  return db.transaction(async (tx) => {
    const before = await tx.query.users.findFirst({ where: eq(users.id, userId) });
    if (!before) throw notFound('That user');
    const losesAdmin = before.role === 'admin' && before.active && (change.active === false || (change.role && change.role !== 'admin'));
    if (losesAdmin) {
      const otherAdmins = await tx.$count(users, and(eq(users.role, 'admin'), eq(users.active, true), ne(users.id, userId)));
      if (otherAdmins === 0) throw conflict('This is the last active admin; make someone else admin first.', 'last_admin');
    }
    const [after] = await tx.update(users).set(change).where(eq(users.id, userId)).returning();
    if (change.active === false) await endSessionsOf(tx, userId);
    await writeAudit(tx, {
      actorId: actor.id,
      entity: 'user',
      entityId: userId,
      action: change.active === false ? 'deactivate' : change.active === true ? 'reactivate' : 'update',
      before: { role: before.role, active: before.active },
      after: { role: after.role, active: after.active },
    });
    return after;
  });
}
