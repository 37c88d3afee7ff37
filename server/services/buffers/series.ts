// Buffer series: the designer's proposal for every pH point (shared/chemistry designSeries), the
// scientist's overrides, and saved series that studies and plate maps reuse.
import { and, asc, desc, eq, inArray, type SQL } from 'drizzle-orm';
import { designSeries, makeRecipe, type BufferSystem, type SeriesInput } from '../../../shared/chemistry';
import { phKey, type DesignedSeries, type SeriesDetail, type SeriesRequest, type SeriesSummary } from '../../../shared/schemas/buffer-series';
import type { Db } from '../../db/client';
import { bufferSeries, studies, teams, users } from '../../db/schema';
import { badRequest, conflict, staleVersion } from '../../errors';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';
import { asJson, deleteAudited, insertAudited, listScope, loadVisible, visible } from '../records/audited';
import { assertEditable } from '../records/studies';
import { labSystems } from './library';

export type { DesignedSeries };

function additionParts(request: SeriesRequest, library: BufferSystem[]): SeriesInput['well'] {
  if (!request.well) return undefined;
  const additions = request.well.additions.map((a) => {
    if (!a.buffer) return { label: a.label, volume: a.volumeUl * 1e-6, composition: { buffers: [], ions: {} } };
    const recipe = makeRecipe({
      system: a.buffer.systemId,
      pH: a.buffer.pH,
      temperatureC: request.assayTemperatureC,
      totalConc: a.buffer.concMm / 1000,
      volume: 1e-3,
      library,
    });
    if (!recipe.ok) throw badRequest(`${a.label}: ${recipe.error.message}`, { [`well.additions`]: recipe.error.message });
    return { label: a.label, volume: a.volumeUl * 1e-6, composition: recipe.value.composition };
  });
  return { bufferVolume: request.well.bufferVolumeUl * 1e-6, additions };
}

/** Designs the series the request describes, then applies the scientist's overrides point by point. */
export function designFromRequest(request: SeriesRequest, library: BufferSystem[]): DesignedSeries {
  const common: Omit<SeriesInput, 'pHPoints'> = {
    assayTemperatureC: request.assayTemperatureC,
    makeTemperatureC: request.makeTemperatureC,
    totalConc: request.bufferConcMm / 1000,
    volume: request.volumeMl / 1000,
    targetIonicStrength: request.targetIonicStrengthM ?? undefined,
    salt: request.salt,
    method: request.method,
    systems: request.systems ?? undefined,
    library,
    overlap: request.overlap,
    well: additionParts(request, library),
  };
  const designed = designSeries({ ...common, pHPoints: request.pHPoints });
  if (!designed.ok) throw badRequest(designed.error.message);
  const series = designed.value;
  const overridden: string[] = [];
  for (const [key, systemId] of Object.entries(request.overrides)) {
    const index = series.points.findIndex((p) => phKey(p.pH) === key);
    if (index < 0) throw badRequest(`The override for pH ${key} matches no point of the series.`, { overrides: `No point at pH ${key}.` });
    if (series.points[index].proposal?.systemId === systemId) continue;
    const single = designSeries({ ...common, pHPoints: [series.points[index].pH], systems: [systemId], overlap: false });
    const point = single.ok ? single.value.points[0] : null;
    if (!point?.proposal) {
      const why = single.ok ? point?.warnings.join(' ') : single.error.message;
      throw badRequest(`${systemId} cannot serve pH ${key} at ${request.assayTemperatureC} °C. ${why ?? ''}`.trim(), { overrides: `Pick a system within one pH unit of ${key}.` });
    }
    const original = series.points[index];
    // Keep the designer's own proposal among the alternatives, so the choice can be undone;
    // an overlap point in the very system now chosen says nothing new and is dropped.
    const alternatives = [...(original.proposal ? [original.proposal] : []), ...original.alternatives].filter((c) => c.systemId !== systemId);
    const overlap = original.overlap && original.overlap.systemId !== systemId ? original.overlap : null;
    series.points[index] = { ...point, alternatives, overlap };
    overridden.push(key);
  }
  return { ...series, overridden };
}

export async function designPreview(db: Db, request: SeriesRequest) {
  return designFromRequest(request, await labSystems(db));
}

export async function listSeries(db: Db, user: CurrentUser, teamId?: string): Promise<SeriesSummary[]> {
  const scope = listScope(user, teamId);
  if (scope?.length === 0) return [];
  const conditions: SQL[] = [];
  if (scope) conditions.push(inArray(bufferSeries.teamId, scope));
  const rows = await db
    .select({ id: bufferSeries.id, teamId: bufferSeries.teamId, teamName: teams.name, name: bufferSeries.name, input: bufferSeries.input, updatedAt: bufferSeries.updatedAt, createdBy: users.name })
    .from(bufferSeries)
    .innerJoin(users, eq(users.id, bufferSeries.createdBy))
    .innerJoin(teams, eq(teams.id, bufferSeries.teamId))
    .where(and(...conditions))
    .orderBy(desc(bufferSeries.updatedAt), asc(bufferSeries.name));
  return asJson<SeriesSummary[]>(rows);
}

export async function getSeries(db: Db, user: CurrentUser, id: string): Promise<SeriesDetail> {
  const row = await loadVisible(db, bufferSeries, id, user, 'That buffer series');
  const usedBy = await db.select({ id: studies.id, name: studies.name, status: studies.status }).from(studies).where(eq(studies.bufferSeriesId, id));
  return asJson<SeriesDetail>({ ...row, usedBy });
}

export async function saveSeries(db: Db, actor: CurrentUser, input: { teamId: string; name: string; input: SeriesRequest; studyId: string | null }) {
  visible({ teamId: input.teamId }, actor, 'That team');
  return db.transaction(async (tx) => {
    const design = designFromRequest(input.input, await labSystems(tx));
    const row = await insertAudited(tx, actor, 'buffer-series', bufferSeries, {
      teamId: input.teamId,
      name: input.name,
      input: input.input,
      design,
      createdBy: actor.id,
    });
    if (input.studyId) {
      const study = await loadVisible(tx, studies, input.studyId, actor, 'That study');
      if (study.teamId !== input.teamId) throw badRequest('The study belongs to another team.', { studyId: 'Pick a study of this team.' });
      assertEditable(study);
      await tx.update(studies).set({ bufferSeriesId: row.id, updatedAt: new Date(), version: study.version + 1 }).where(eq(studies.id, study.id));
      await writeAudit(tx, { actorId: actor.id, teamId: study.teamId, entity: 'study', entityId: study.id, action: 'update', before: { bufferSeriesId: study.bufferSeriesId }, after: { bufferSeriesId: row.id } });
    }
    return row;
  });
}

/** Series used by a study in review or approved are frozen with it. */
async function assertSeriesEditable(tx: Parameters<Parameters<Db['transaction']>[0]>[0], id: string) {
  const locked = await tx.select({ name: studies.name, status: studies.status }).from(studies).where(and(eq(studies.bufferSeriesId, id), inArray(studies.status, ['in_review', 'approved'])));
  if (locked.length) assertEditable(locked[0]);
}

const staleSeries = (current: number) =>
  staleVersion('This series was changed by someone else since you opened it; reload to see their version.', current);

export async function updateSeries(db: Db, actor: CurrentUser, id: string, change: { name?: string; input?: SeriesRequest; version: number }) {
  return db.transaction(async (tx) => {
    const before = await loadVisible(tx, bufferSeries, id, actor, 'That buffer series');
    await assertSeriesEditable(tx, id);
    if (before.version !== change.version) throw staleSeries(before.version);
    const design = change.input ? designFromRequest(change.input, await labSystems(tx)) : before.design;
    const [after] = await tx
      .update(bufferSeries)
      .set({ name: change.name ?? before.name, input: change.input ?? before.input, design, version: before.version + 1, updatedAt: new Date() })
      .where(and(eq(bufferSeries.id, id), eq(bufferSeries.version, change.version)))
      .returning();
    if (!after) {
      const [now] = await tx.select({ version: bufferSeries.version }).from(bufferSeries).where(eq(bufferSeries.id, id));
      throw staleSeries(now?.version ?? before.version);
    }
    await writeAudit(tx, { actorId: actor.id, teamId: after.teamId, entity: 'buffer-series', entityId: id, action: 'update', before: { name: before.name, input: before.input }, after: { name: after.name, input: after.input } });
    return after;
  });
}

export async function deleteSeries(db: Db, actor: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const before = await loadVisible(tx, bufferSeries, id, actor, 'That buffer series');
    const used = await tx.$count(studies, eq(studies.bufferSeriesId, id));
    if (used > 0) throw conflict(`This series is used by ${used} stud${used === 1 ? 'y' : 'ies'}.`, 'in_use');
    await deleteAudited(tx, actor, 'buffer-series', bufferSeries, before);
  });
}
