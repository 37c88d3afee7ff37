// Demo studies with plates and generated reader files, imported through the same services the
// import screen uses: a kinetic study in draft, an end-point study in review, an approved one.
import { and, asc, eq, sql } from 'drizzle-orm';
import type { SeriesDetail } from '../../../shared/schemas/buffer-series';
import type { AppContext } from '../../context';
import { excludeWells, getAnalysis } from '../../services/analysis/analysis';
import { createPlate, saveMap } from '../../services/plates/plates';
import { importReads } from '../../services/plates/reads';
import { createStudy } from '../../services/records/studies';
import { transition } from '../../services/review/review';
import type { CurrentUser } from '../../types';
import type { Db } from '../client';
import { assays, bufferSeries, enzymes, plates, studies, teamMembers, teams, users, variants } from '../schema';
import { demoTeam } from './demo-people';
import { demoAssays, demoEnzymeName } from './demo-records';
import { demoPlateMap, demoTruth, endpointCsv, kineticWorkbook } from './demo-reads';

async function person(db: Db, email: string): Promise<CurrentUser> {
  const user = await db.query.users.findFirst({ where: sql`lower(${users.email}) = ${email}` });
  if (!user) throw new Error(`demo user ${email} missing`);
  const memberships = await db.select({ teamId: teamMembers.teamId }).from(teamMembers).where(eq(teamMembers.userId, user.id));
  return { id: user.id, email: user.email, name: user.name, role: user.role, teamIds: memberships.map((m) => m.teamId) };
}

type DemoStudy = {
  name: string;
  owner: string;
  assay: keyof typeof demoAssays;
  plates: [string, string][];
  finish?: (ctx: AppContext, studyId: string) => Promise<void>;
  outlier?: { plate: number; well: string };
};

export const demoStudies: DemoStudy[] = [
  {
    name: 'FR1 variants, kinetic pH profile (demo)',
    owner: 'scientist@example.org',
    assay: 'kinetic',
    plates: [
      ['FR1-WT', 'FR1-D92N'],
      ['FR1-E228Q', 'FR1-D92N/S110A'],
      ['FR1-K301E', 'FR1-WT'],
    ],
    outlier: { plate: 0, well: 'B6' },
    finish: async (ctx, id) => {
      const owner = await person(ctx.db, 'scientist@example.org');
      const [plate] = await ctx.db.select().from(plates).where(eq(plates.studyId, id)).orderBy(asc(plates.createdAt)).limit(1);
      await excludeWells(ctx.db, owner, id, { wells: [{ plateId: plate.id, well: 'B6' }], reason: 'Trace rises 1.8 times faster than its replicates; a bubble was noted at the first read (demo, generated outlier).' });
    },
  },
  {
    name: 'FR1 end-point screen, round 1 (demo)',
    owner: 'scientist2@example.org',
    assay: 'endpoint',
    plates: [
      ['FR1-WT', 'FR1-D92N'],
      ['FR1-E228Q', 'FR1-WT'],
    ],
    outlier: { plate: 0, well: 'B6' },
    finish: async (ctx, id) => {
      const author = await person(ctx.db, 'scientist2@example.org');
      await transition(ctx, author, id, 'submit', 'Round 1 of the end-point screen; plate 1 has one suspicious well (B6).');
    },
  },
  {
    name: 'FR1 end-point profile, approved round (demo)',
    owner: 'scientist@example.org',
    assay: 'endpoint',
    plates: [
      ['FR1-WT', 'FR1-D92N'],
      ['FR1-E228Q', 'FR1-K301E'],
    ],
    finish: async (ctx, id) => {
      await getAnalysis(ctx.db, await person(ctx.db, 'scientist@example.org'), id);
      await transition(ctx, await person(ctx.db, 'scientist@example.org'), id, 'submit', 'Parent, the acid-limb variant and two controls, end-point read after stopping with base.');
      await transition(ctx, await person(ctx.db, 'lead@example.org'), id, 'approve', 'Fits and QC look sound; D92N moves the acid limb.');
    },
  },
];

export { person as demoPerson };

export async function seedDemoStudies(db: Db) {
  const team = await db.query.teams.findFirst({ where: eq(teams.name, demoTeam.name) });
  const enzyme = team && (await db.query.enzymes.findFirst({ where: and(eq(enzymes.teamId, team.id), eq(enzymes.name, demoEnzymeName)) }));
  const series = team && (await db.query.bufferSeries.findFirst({ where: eq(bufferSeries.teamId, team.id) }));
  if (!team || !enzyme || !series) return;
  const design = series.design as SeriesDetail['design'];
  const pHs = design.points.map((p) => p.pH);
  const buffers = design.points.map((p) => p.proposal?.systemId ?? null);
  const vs = await db.select().from(variants).where(eq(variants.enzymeId, enzyme.id));
  const idOf = (name: string) => vs.find((v) => v.name === name)!.id;
  const truthOf = (id: string) => demoTruth[vs.find((v) => v.id === id)?.name ?? ''];
  // Review steps need only the database and the app's address (mail is not sent while seeding).
  const ctx = { db, config: { appUrl: 'http://localhost:3000' } } as AppContext;

  for (const [s, demo] of demoStudies.entries()) {
    if (await db.query.studies.findFirst({ where: and(eq(studies.teamId, team.id), eq(studies.name, demo.name)) })) continue;
    const owner = await person(db, demo.owner);
    const assay = await db.query.assays.findFirst({ where: and(eq(assays.teamId, team.id), eq(assays.name, demoAssays[demo.assay].name)) });
    if (!assay) continue;
    const included = [...new Set(demo.plates.flat())];
    const study = await createStudy(db, owner, {
      teamId: team.id,
      name: demo.name,
      enzymeId: enzyme.id,
      variantIds: included.map(idOf),
      referenceVariantId: idOf('FR1-WT'),
      assayId: assay.id,
      bufferSeriesId: series.id,
      notes: 'Demo study: every number in it is generated.',
    });
    for (const [p, pair] of demo.plates.entries()) {
      const plateName = `Plate ${p + 1} (${pair.join(', ')})`;
      const plate = await createPlate(db, owner, study.id, { name: plateName, format: 96, templateId: null, copyFromPlateId: null });
      const map = demoPlateMap(pHs, buffers, [idOf(pair[0]), idOf(pair[1])]);
      await saveMap(db, owner, plate.id, plate.version, map);
      const seed = 1000 * (s + 1) + p;
      if (demo.assay === 'kinetic') {
        const outlier = demo.outlier?.plate === p ? demo.outlier.well : undefined;
        const bytes = await kineticWorkbook(plateName, map, truthOf, seed, outlier);
        await importReads(db, owner, plate.id, { bytes, fileName: `demo-kinetic-plate-${p + 1}.xlsx` }, [{ type: 'kinetic', blockIndex: 0, wavelengthNm: 410 }], 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
      } else {
        const outlier = demo.outlier?.plate === p ? demo.outlier.well : undefined;
        const bytes = endpointCsv('Absorbance 405 nm after stop', map, truthOf, seed, outlier);
        await importReads(db, owner, plate.id, { bytes, fileName: `demo-endpoint-plate-${p + 1}.csv` }, [{ type: 'endpoint', blockIndex: 0, wavelengthNm: 405 }], 'text/csv');
      }
    }
    await demo.finish?.(ctx, study.id);
    await getAnalysis(db, owner, study.id);
  }
}
