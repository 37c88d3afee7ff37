// Teams: admins create them and manage members; every later record belongs to one team.
import { asc, eq, inArray, and } from 'drizzle-orm';
import type { TeamSummary } from '../../../shared/schemas/api-types';
import type { TeamCreateInput } from '../../../shared/schemas/teams';
import type { Db } from '../../db/client';
import { teamMembers, teams, users } from '../../db/schema';
import { conflict, notFound } from '../../errors';
import type { CurrentUser } from '../../types';
import { assertTeamAccess, readableTeamIds } from '../../auth/authorize';
import { writeAudit } from '../audit/write-audit';

async function withMembers(db: Db, rows: (typeof teams.$inferSelect)[]): Promise<TeamSummary[]> {
  if (rows.length === 0) return [];
  const members = await db
    .select({ teamId: teamMembers.teamId, id: users.id, name: users.name, email: users.email, role: users.role })
    .from(teamMembers)
    .innerJoin(users, eq(users.id, teamMembers.userId))
    .where(inArray(teamMembers.teamId, rows.map((r) => r.id)))
    .orderBy(asc(users.name));
  return rows.map((t) => ({
    id: t.id,
    name: t.name,
    description: t.description,
    createdAt: t.createdAt.toISOString(),
    members: members.filter((m) => m.teamId === t.id).map(({ teamId: _t, ...m }) => m),
  }));
}

export async function listTeams(db: Db, user: CurrentUser) {
  const ids = readableTeamIds(user);
  if (ids && ids.length === 0) return [];
  const rows = await db.query.teams.findMany({
    where: ids ? inArray(teams.id, ids) : undefined,
    orderBy: [asc(teams.name)],
  });
  return withMembers(db, rows);
}

export async function getTeam(db: Db, user: CurrentUser, teamId: string) {
  assertTeamAccess(user, teamId, 'That team');
  const row = await db.query.teams.findFirst({ where: eq(teams.id, teamId) });
  if (!row) throw notFound('That team');
  return (await withMembers(db, [row]))[0];
}

export async function createTeam(db: Db, actor: CurrentUser, input: Required<TeamCreateInput>) {
  return db.transaction(async (tx) => {
    const clash = await tx.query.teams.findFirst({ where: eq(teams.name, input.name) });
    if (clash) throw conflict(`A team named "${input.name}" exists already.`, 'name_taken');
    const [team] = await tx.insert(teams).values(input).returning();
    await writeAudit(tx, { actorId: actor.id, teamId: team.id, entity: 'team', entityId: team.id, action: 'create', after: team });
    return team;
  });
}

export async function addMember(db: Db, actor: CurrentUser, teamId: string, userId: string) {
  await db.transaction(async (tx) => {
    const team = await tx.query.teams.findFirst({ where: eq(teams.id, teamId) });
    if (!team) throw notFound('That team');
    const user = await tx.query.users.findFirst({ where: eq(users.id, userId) });
    if (!user) throw notFound('That user');
    const added = await tx.insert(teamMembers).values({ teamId, userId }).onConflictDoNothing().returning();
    if (added.length === 0) throw conflict(`${user.name} is already a member of ${team.name}.`, 'already_member');
    await writeAudit(tx, { actorId: actor.id, teamId, entity: 'team-member', entityId: userId, action: 'add', after: { teamId, userId } });
  });
}

export async function removeMember(db: Db, actor: CurrentUser, teamId: string, userId: string) {
  await db.transaction(async (tx) => {
    const removed = await tx
      .delete(teamMembers)
      .where(and(eq(teamMembers.teamId, teamId), eq(teamMembers.userId, userId)))
      .returning();
    if (removed.length === 0) throw notFound('That membership');
    await writeAudit(tx, { actorId: actor.id, teamId, entity: 'team-member', entityId: userId, action: 'remove', before: { teamId, userId } });
  });
}
