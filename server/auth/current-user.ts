// Loads the signed-in user for each request and refuses sessions of deactivated users.
import { eq } from 'drizzle-orm';
import type { NextFunction, Request, Response } from 'express';
import type { Db } from '../db/client';
import { teamMembers, users } from '../db/schema';
import type { CurrentUser } from '../types';

export async function findCurrentUser(db: Db, userId: string): Promise<CurrentUser | null> {
  const user = await db.query.users.findFirst({ where: eq(users.id, userId) });
  if (!user || !user.active) return null;
  const memberships = await db
    .select({ teamId: teamMembers.teamId })
    .from(teamMembers)
    .where(eq(teamMembers.userId, userId));
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    teamIds: memberships.map((m) => m.teamId),
  };
}

export function loadCurrentUser(db: Db) {
  return async (req: Request, _res: Response, next: NextFunction) => {
    const userId = req.session?.userId;
    if (!userId) return next();
    const user = await findCurrentUser(db, userId);
    if (!user) {
      await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
      return next();
    }
    req.user = user;
    next();
  };
}
