// Invitations: an admin or a lead invites by e-mail; the single-use link is valid for 72 hours;
// accepting sets name and password and creates the account (and its team membership).
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import { roleLabels, type Role } from '../../../shared/permissions';
import type { InvitationView } from '../../../shared/schemas/api-types';
import type { AcceptInvitationInput } from '../../../shared/schemas/auth';
import { hashPassword } from '../../auth/passwords';
import { hashToken, newToken } from '../../auth/tokens';
import type { Db } from '../../db/client';
import { invitations, teamMembers, teams, users } from '../../db/schema';
import { AppError, badRequest, conflict, forbidden, notFound } from '../../errors';
import type { CurrentUser } from '../../types';
import { invitationMail } from '../../mail/templates';
import type { Mail } from '../../mail/mailer';
import { writeAudit } from '../audit/write-audit';

const invalidInvitation = () =>
  new AppError('invalid_link', 'This invitation link is not valid any more (used or expired). Ask for a new one.', 404);

export const invitationLifetimeMs = 72 * 60 * 60 * 1000;

const rolesALeadMayInvite: Role[] = ['lead', 'scientist', 'viewer'];

export async function createInvitation(
  db: Db,
  actor: CurrentUser,
  input: { email: string; role: Role; teamId: string | null },
  appUrl: string,
): Promise<{ mail: Mail; expiresAt: Date }> {
  if (actor.role !== 'admin') {
    if (!rolesALeadMayInvite.includes(input.role)) throw forbidden('A lead may invite leads, scientists and viewers.');
    if (!input.teamId) throw badRequest('Choose one of your teams.', { teamId: 'Choose one of your teams.' });
    if (!actor.teamIds.includes(input.teamId)) throw notFound('That team');
  }
  const team = input.teamId ? await db.query.teams.findFirst({ where: eq(teams.id, input.teamId) }) : null;
  if (input.teamId && !team) throw notFound('That team');
  const existing = await db.query.users.findFirst({ where: sql`lower(${users.email}) = ${input.email}` });
  if (existing) throw conflict('Someone with this e-mail already has an account.', 'email_taken');

  const token = newToken();
  const expiresAt = new Date(Date.now() + invitationLifetimeMs);
  await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(invitations)
      .values({ email: input.email, role: input.role, teamId: input.teamId, tokenHash: hashToken(token), invitedBy: actor.id, expiresAt })
      .returning();
    await writeAudit(tx, {
      actorId: actor.id,
      teamId: input.teamId,
      entity: 'invitation',
      entityId: row.id,
      action: 'create',
      after: { email: row.email, role: row.role, teamId: row.teamId, expiresAt: row.expiresAt },
    });
  });
  const mail = invitationMail({
    to: input.email,
    inviter: actor.name,
    roleLabel: roleLabels[input.role].toLowerCase(),
    teamName: team?.name ?? null,
    link: `${appUrl}/invitation/${token}`,
  });
  return { mail, expiresAt };
}

async function findOpenInvitation(db: Db, token: string) {
  const row = await db.query.invitations.findFirst({
    where: and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date())),
  });
  if (!row) throw invalidInvitation();
  return row;
}

export async function viewInvitation(db: Db, token: string): Promise<InvitationView> {
  const row = await findOpenInvitation(db, token);
  const team = row.teamId ? await db.query.teams.findFirst({ where: eq(teams.id, row.teamId) }) : null;
  return { email: row.email, role: row.role, teamName: team?.name ?? null, expiresAt: row.expiresAt.toISOString() };
}

export async function acceptInvitation(db: Db, token: string, input: AcceptInvitationInput) {
  const invitation = await findOpenInvitation(db, token);
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (tx) => {
    // Claim the invitation first: a second, concurrent use finds nothing to claim.
    const claimed = await tx
      .update(invitations)
      .set({ acceptedAt: new Date() })
      .where(and(eq(invitations.id, invitation.id), isNull(invitations.acceptedAt)))
      .returning();
    if (claimed.length === 0) throw invalidInvitation();
    const taken = await tx.query.users.findFirst({ where: sql`lower(${users.email}) = ${invitation.email}` });
    if (taken) throw conflict('Someone with this e-mail already has an account.', 'email_taken');
    const [user] = await tx
      .insert(users)
      .values({ email: invitation.email, name: input.name, passwordHash, role: invitation.role })
      .returning();
    if (invitation.teamId) await tx.insert(teamMembers).values({ teamId: invitation.teamId, userId: user.id });
    await writeAudit(tx, {
      actorId: user.id,
      teamId: invitation.teamId,
      entity: 'user',
      entityId: user.id,
      action: 'accept-invitation',
      after: { email: user.email, name: user.name, role: user.role, teamId: invitation.teamId },
    });
    return user;
  });
}
