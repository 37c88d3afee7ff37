// Password reset by e-mail: a single-use link valid for one hour. The request's answer is the
// same whether or not the address exists.
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import { hashPassword } from '../../auth/passwords';
import { hashToken, newToken } from '../../auth/tokens';
import type { Db } from '../../db/client';
import { passwordResets, users } from '../../db/schema';
import { AppError } from '../../errors';
import type { Mail } from '../../mail/mailer';
import { passwordResetMail } from '../../mail/templates';
import { writeAudit } from '../audit/write-audit';
import { endSessionsOf } from './sign-in';

export const resetLifetimeMs = 60 * 60 * 1000;

export async function requestPasswordReset(db: Db, email: string, appUrl: string): Promise<Mail | null> {
  const user = await db.query.users.findFirst({ where: sql`lower(${users.email}) = ${email}` });
  if (!user || !user.active) return null;
  const token = newToken();
  await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(passwordResets)
      .values({ userId: user.id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + resetLifetimeMs) })
      .returning();
    await writeAudit(tx, { actorId: null, entity: 'password-reset', entityId: row.id, action: 'request', after: { userId: user.id } });
  });
  return passwordResetMail({ to: user.email, link: `${appUrl}/reset-password/${token}` });
}

const invalidLink = () =>
  new AppError('invalid_link', 'This reset link is not valid any more. Ask for a new one from the sign-in page.', 400);

export async function resetPassword(db: Db, token: string, newPassword: string) {
  const passwordHash = await hashPassword(newPassword);
  await db.transaction(async (tx) => {
    const [reset] = await tx
      .update(passwordResets)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())))
      .returning();
    if (!reset) throw invalidLink();
    const user = await tx.query.users.findFirst({ where: eq(users.id, reset.userId) });
    if (!user || !user.active) throw invalidLink();
    await tx.update(users).set({ passwordHash }).where(eq(users.id, user.id));
    await endSessionsOf(tx, user.id);
    await writeAudit(tx, { actorId: user.id, entity: 'user', entityId: user.id, action: 'reset-password' });
  });
}
