// Demo records for the invented scenario (Fennel Ridge Enzymology, phytase FR1). Everything here is
// generated for the demo: the variants' mutation lists, lots, concentrations and assays are made up.
// Written through the services, so the demo rows are validated and audited like real ones.
import { and, eq, sql } from 'drizzle-orm';
import { expandPHRange } from '../../../shared/schemas/buffer-series';
import { createAssay } from '../../services/records/assays';
import { createEnzyme, createPreparation, createVariant } from '../../services/records/enzymes';
import { saveSeries } from '../../services/buffers/series';
import type { CurrentUser } from '../../types';
import type { Db } from '../client';
import { assays, bufferSeries, enzymes, teamMembers, teams, users, variants } from '../schema';
import { demoTeam } from './demo-people';

export const demoEnzymeName = 'FR1 phytase';

export const demoVariants = [
  { name: 'FR1-WT', mutations: '', isParent: true, notes: 'Parent enzyme (demo, generated).' },
  { name: 'FR1-D92N', mutations: 'D92N', isParent: false, notes: 'Designed to shift the acid limb (demo, generated).' },
  { name: 'FR1-E228Q', mutations: 'E228Q', isParent: false, notes: 'Surface charge change (demo, generated).' },
  { name: 'FR1-D92N/S110A', mutations: 'D92N/S110A', isParent: false, notes: 'Double variant (demo, generated).' },
  { name: 'FR1-K301E', mutations: 'K301E', isParent: false, notes: 'Control mutation far from the active site (demo, generated).' },
];

export const demoAssays = {
  endpoint: {
    name: 'FR1 end-point, chromogenic phosphate ester (demo)',
    substrate: '4-nitrophenyl phosphate (demo conditions)',
    substrateMm: 5,
    kmMm: null,
    substrateRegime: 'saturating' as const,
    readMode: 'endpoint' as const,
    detection: 'absorbance' as const,
    wavelengthNm: 405,
    emissionNm: null,
    quantitation: 'extinction' as const,
    extinctionCoefficient: 18300,
    extinctionUnit: 'M-1cm-1' as const,
    pathLengthCm: 0.56,
    wellVolumeUl: 200,
    temperatureC: 37,
    stopSolution: '0.5 M NaOH, 100 µL per well',
    chromophorePka: 7.15,
    notes: 'Generated demo assay. The phenolate is read after stopping with strong base, so one extinction coefficient serves every pH point.',
  },
  kinetic: {
    name: 'FR1 kinetic, continuous chromogenic release (demo)',
    substrate: 'chromogenic phytate analogue (invented for the demo)',
    substrateMm: 2,
    kmMm: 0.1,
    substrateRegime: 'saturating' as const,
    readMode: 'kinetic' as const,
    detection: 'absorbance' as const,
    wavelengthNm: 410,
    emissionNm: null,
    quantitation: 'extinction' as const,
    extinctionCoefficient: 9500,
    extinctionUnit: 'M-1cm-1' as const,
    pathLengthCm: 0.56,
    wellVolumeUl: 200,
    temperatureC: 37,
    stopSolution: '',
    chromophorePka: null,
    notes: 'Generated demo assay: an invented product whose absorbance at 410 nm does not depend on pH.',
  },
};

async function demoActor(db: Db): Promise<{ actor: CurrentUser; teamId: string } | null> {
  const team = await db.query.teams.findFirst({ where: eq(teams.name, demoTeam.name) });
  const user = await db.query.users.findFirst({ where: sql`lower(${users.email}) = 'scientist@example.org'` });
  if (!team || !user) return null;
  const memberships = await db.select({ teamId: teamMembers.teamId }).from(teamMembers).where(eq(teamMembers.userId, user.id));
  return {
    teamId: team.id,
    actor: { id: user.id, email: user.email, name: user.name, role: user.role, teamIds: memberships.map((m) => m.teamId) },
  };
}

export async function seedDemoRecords(db: Db) {
  const who = await demoActor(db);
  if (!who) return;
  const { actor, teamId } = who;
  let enzyme = await db.query.enzymes.findFirst({ where: and(eq(enzymes.teamId, teamId), eq(enzymes.name, demoEnzymeName)) });
  if (!enzyme) {
    enzyme = await createEnzyme(db, actor, {
      teamId,
      name: demoEnzymeName,
      organism: 'invented for the demo',
      notes: 'Fennel Ridge Enzymology (fictional) is engineering FR1 to stay active at stomach-like pH. All demo data are generated.',
    });
  }
  const existing = await db.select().from(variants).where(eq(variants.enzymeId, enzyme.id));
  for (const [i, v] of demoVariants.entries()) {
    if (existing.some((e) => e.name === v.name)) continue;
    const created = await createVariant(db, actor, enzyme.id, v);
    await createPreparation(db, actor, created.id, {
      lot: `FR-P-${String(101 + i)}`,
      proteinMgPerMl: [1.2, 0.9, 1.5, 0.8, 1.1][i],
      preparedOn: `2026-11-${String(10 + i).padStart(2, '0')}`,
      storageBuffer: '20 mM Tris pH 7.5, 100 mM NaCl (demo)',
      notes: 'Generated demo preparation.',
    });
  }
  for (const assay of Object.values(demoAssays)) {
    const found = await db.query.assays.findFirst({ where: and(eq(assays.teamId, teamId), eq(assays.name, assay.name)) });
    if (!found) await createAssay(db, actor, { ...assay, teamId });
  }
  const seriesName = 'FR1 pH 2.5–8.0 at 37 °C (demo)';
  if (!(await db.query.bufferSeries.findFirst({ where: and(eq(bufferSeries.teamId, teamId), eq(bufferSeries.name, seriesName)) }))) {
    await saveSeries(db, actor, {
      teamId,
      name: seriesName,
      studyId: null,
      input: {
        pHPoints: expandPHRange(2.5, 8, 0.5),
        assayTemperatureC: 37,
        makeTemperatureC: 25,
        bufferConcMm: 50,
        volumeMl: 50,
        targetIonicStrengthM: 0.15,
        salt: 'NaCl',
        method: 'titrate',
        systems: null,
        overlap: true,
        overrides: {},
        well: {
          bufferVolumeUl: 160,
          additions: [
            { label: 'Enzyme in storage buffer', volumeUl: 20, buffer: { systemId: 'tris', concMm: 20, pH: 7.5 } },
            { label: 'Substrate in water', volumeUl: 20, buffer: null },
          ],
        },
      },
    });
  }
}
