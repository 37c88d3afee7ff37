// Factories: each test makes the rows it needs. Passwords hash at bcrypt cost 10 (the minimum
// the product allows) and the default one only once per file, to keep tests quick.
import { randomBytes } from 'node:crypto';
import type { Role } from '../../../shared/permissions';
import { hashPassword } from '../../../server/auth/passwords';
import type { Db } from '../../../server/db/client';
import { teamMembers, teams, users } from '../../../server/db/schema';

export const defaultPassword = 'correct-horse-battery';
let defaultHash: Promise<string> | null = null;

const unique = () => randomBytes(4).toString('hex');

export async function createTeam(db: Db, overrides: Partial<typeof teams.$inferInsert> = {}) {
  const [team] = await db
    .insert(teams)
    .values({ name: `Team ${unique()}`, description: 'made by a test', ...overrides })
    .returning();
  return team;
}

export async function createUser(
  db: Db,
  overrides: { role?: Role; email?: string; name?: string; password?: string; active?: boolean; teamIds?: string[] } = {},
) {
  const { teamIds = [], password, ...rest } = overrides;
  defaultHash ??= hashPassword(defaultPassword, 10);
  const passwordHash = password ? await hashPassword(password, 10) : await defaultHash;
  const tag = unique();
  const [user] = await db
    .insert(users)
    .values({ email: `person-${tag}@example.org`, name: `Person ${tag}`, role: 'scientist', passwordHash, ...rest })
    .returning();
  for (const teamId of teamIds) await db.insert(teamMembers).values({ teamId, userId: user.id });
  return { ...user, password: password ?? defaultPassword };
}
