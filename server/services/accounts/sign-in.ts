import { eq, sql } from 'drizzle-orm';
import type { Db, DbOrTx } from '../../db/client';
import { sessions, users } from '../../db/schema';
import { AppError, badRequest } from '../../errors';
import { burnTime, checkPassword, hashPassword } from '../../auth/passwords';
import { writeAudit } from '../audit/write-audit';

const wrongCredentials = () => new AppError('invalid_credentials', 'E-mail or password is not correct.', 401);

/** Generic failure whatever was wrong: unknown address, wrong password, or deactivated account. */
export async function verifyCredentials(db: Db, email: string, password: string) {
  const user = await db.query.users.findFirst({ where: sql`lower(${users.email}) = ${email.toLowerCase()}` });
  if (!user) {
    await burnTime(password);
    throw wrongCredentials();
  }
  const ok = await checkPassword(password, user.passwordHash);
  if (!ok || !user.active) throw wrongCredentials();
  await db.transaction(async (tx) => {
    await tx.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, user.id));
    await writeAudit(tx, { actorId: user.id, entity: 'user', entityId: user.id, action: 'sign-in' });
  });
  return user;
}

export async function changePassword(db: Db, userId: string, currentPassword: string, newPassword: string) {
  const user = await db.query.users.findFirst({ where: eq(users.id, userId) });
  if (!user || !(await checkPassword(currentPassword, user.passwordHash))) {
    throw badRequest('The current password is not correct.', { currentPassword: 'Not correct.' });
  }
  const passwordHash = await hashPassword(newPassword);
  await db.transaction(async (tx) => {
    await tx.update(users).set({ passwordHash }).where(eq(users.id, userId));
    await writeAudit(tx, { actorId: userId, entity: 'user', entityId: userId, action: 'change-password' });
  });
}

/** Ends every open session of a user (deactivation, password reset). */
export async function endSessionsOf(db: DbOrTx, userId: string) {
  await db.delete(sessions).where(sql`${sessions.sess}->>'userId' = ${userId}`);
}
