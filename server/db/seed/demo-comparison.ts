// A saved comparison for the demo (all data generated): in the approved end-point round, FR1-D92N
// carries a real acid shift (its generated truth moves pKa1 by −0.7), FR1-E228Q an apparent one within error.
import { and, eq } from 'drizzle-orm';
import { saveComparison } from '../../services/comparisons/comparisons';
import type { Db } from '../client';
import { comparisons, studies, studyVariants, variants } from '../schema';
import { demoPerson } from './demo-studies';

export const demoComparisonName = 'FR1 acid-limb shortlist (demo)';

export async function seedDemoComparison(db: Db) {
  const [study] = await db.select().from(studies).where(and(eq(studies.name, 'FR1 end-point profile, approved round (demo)'), eq(studies.status, 'approved')));
  if (!study) return;
  if (await db.query.comparisons.findFirst({ where: and(eq(comparisons.teamId, study.teamId), eq(comparisons.name, demoComparisonName)) })) return;
  const included = await db.select({ id: variants.id, name: variants.name }).from(studyVariants).innerJoin(variants, eq(variants.id, studyVariants.variantId)).where(eq(studyVariants.studyId, study.id));
  const id = (name: string) => included.find((v) => v.name === name)?.id;
  const names = ['FR1-WT', 'FR1-D92N', 'FR1-E228Q'];
  if (names.some((n) => !id(n))) return;
  const lead = await demoPerson(db, 'lead@example.org');
  await saveComparison(db, lead, {
    teamId: study.teamId,
    name: demoComparisonName,
    notes: 'Generated demo data. D92N moves the acid limb; the small shift of E228Q is within error.',
    entries: names.map((n) => ({ studyId: study.id, variantId: id(n)! })),
    referenceKey: `${study.id}:${id('FR1-WT')}`,
    includeUnapproved: false,
    globalFit: null,
  });
}
