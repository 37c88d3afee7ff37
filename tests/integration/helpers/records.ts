// Factories for the science records (rows written directly; the routes are tested elsewhere).
import { randomBytes } from 'node:crypto';
import type { Db } from '../../../server/db/client';
import { assays, enzymes, preparations, studies, studyVariants, variants } from '../../../server/db/schema';

const tag = () => randomBytes(3).toString('hex');

export async function createEnzyme(db: Db, teamId: string, createdBy: string, overrides: Partial<typeof enzymes.$inferInsert> = {}) {
  const [enzyme] = await db.insert(enzymes).values({ teamId, createdBy, name: `Enzyme ${tag()}`, ...overrides }).returning();
  return enzyme;
}

export async function createVariant(db: Db, enzyme: { id: string; teamId: string }, overrides: Partial<typeof variants.$inferInsert> = {}) {
  const [variant] = await db
    .insert(variants)
    .values({ enzymeId: enzyme.id, teamId: enzyme.teamId, name: `V-${tag()}`, mutations: 'D92N', ...overrides })
    .returning();
  return variant;
}

export async function createPreparation(db: Db, variant: { id: string; teamId: string }) {
  const [prep] = await db
    .insert(preparations)
    .values({ variantId: variant.id, teamId: variant.teamId, lot: `L-${tag()}`, proteinMgPerMl: 1.2, preparedOn: '2026-11-02' })
    .returning();
  return prep;
}

export async function createAssay(db: Db, teamId: string, createdBy: string, overrides: Partial<typeof assays.$inferInsert> = {}) {
  const [assay] = await db
    .insert(assays)
    .values({
      teamId,
      createdBy,
      name: `Assay ${tag()}`,
      substrate: 'generated substrate',
      substrateMm: 5,
      readMode: 'kinetic',
      detection: 'absorbance',
      wavelengthNm: 405,
      quantitation: 'extinction',
      extinctionCoefficient: 18300,
      pathLengthCm: 0.56,
      wellVolumeUl: 200,
      temperatureC: 37,
      ...overrides,
    })
    .returning();
  return assay;
}

/** An enzyme with a parent and one variant, an assay, and a study over both variants. */
export async function createStudyWorld(db: Db, teamId: string, ownerId: string, overrides: Partial<typeof studies.$inferInsert> = {}) {
  const enzyme = await createEnzyme(db, teamId, ownerId);
  const parent = await createVariant(db, enzyme, { name: 'WT', mutations: '', isParent: true });
  const variant = await createVariant(db, enzyme);
  const assay = await createAssay(db, teamId, ownerId);
  const [study] = await db
    .insert(studies)
    .values({ teamId, name: `Study ${tag()}`, enzymeId: enzyme.id, referenceVariantId: parent.id, assayId: assay.id, ownerId, ...overrides })
    .returning();
  await db.insert(studyVariants).values([
    { studyId: study.id, variantId: parent.id, position: 0 },
    { studyId: study.id, variantId: variant.id, position: 1 },
  ]);
  return { enzyme, parent, variant, assay, study };
}
