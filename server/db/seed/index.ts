// The demo seed. Idempotent: each step looks for what it would create and skips it when present,
// so a second `npm start` duplicates nothing. Later features add their own steps here.
import { eq, sql } from 'drizzle-orm';
import { hashPassword } from '../../auth/passwords';
import type { Db } from '../client';
import { teamMembers, teams, users } from '../schema';
import { writeAudit } from '../../services/audit/write-audit';
import { seedBuiltInBuffers } from '../../services/buffers/library';
import { demoPassword, demoPeople, demoTeam } from './demo-people';
import { seedDemoRecords } from './demo-records';
import { seedDemoComparison } from './demo-comparison';
import { seedDemoStudies } from './demo-studies';

export type SeedStep = { name: string; run: (db: Db) => Promise<void> };

async function seedPeopleAndTeam(db: Db) {
  const passwordHash = await hashPassword(demoPassword);
  await db.transaction(async (tx) => {
    let team = await tx.query.teams.findFirst({ where: eq(teams.name, demoTeam.name) });
    if (!team) {
      [team] = await tx.insert(teams).values(demoTeam).returning();
      await writeAudit(tx, { actorId: null, teamId: team.id, entity: 'team', entityId: team.id, action: 'seed', after: team });
    }
    for (const person of demoPeople) {
      let user = await tx.query.users.findFirst({ where: sql`lower(${users.email}) = ${person.email}` });
      if (!user) {
        [user] = await tx
          .insert(users)
          .values({ email: person.email, name: person.name, role: person.role, passwordHash })
          .returning();
        await writeAudit(tx, { actorId: null, entity: 'user', entityId: user.id, action: 'seed', after: user });
      }
      if (person.inTeam) await tx.insert(teamMembers).values({ teamId: team.id, userId: user.id }).onConflictDoNothing();
    }
  });
}

export const seedSteps: SeedStep[] = [
  { name: 'people and team', run: seedPeopleAndTeam },
  { name: 'buffer library', run: seedBuiltInBuffers },
  { name: 'enzyme, variants, assays and buffer series', run: seedDemoRecords },
  { name: 'studies, plates and generated reader files', run: seedDemoStudies },
  { name: 'a saved comparison', run: seedDemoComparison },
];

export async function seedDemo(db: Db, log: (line: string) => void = () => {}) {
  for (const step of seedSteps) {
    log(`  seeding ${step.name}`);
    await step.run(db);
  }
}
