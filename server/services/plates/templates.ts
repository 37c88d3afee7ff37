import { and, asc, eq, inArray, type SQL } from 'drizzle-orm';
import type { PlateMap } from '../../../shared/plate-map/schema';
import type { PlateTemplate } from '../../../shared/schemas/plates-types';
import type { Db } from '../../db/client';
import { plateTemplates } from '../../db/schema';
import type { CurrentUser } from '../../types';
import { asJson, deleteAudited, insertAudited, listScope, loadVisible, visible } from '../records/audited';
import { validMap } from './plates';

export async function listTemplates(db: Db, user: CurrentUser, filter: { teamId?: string; format?: number }): Promise<PlateTemplate[]> {
  const scope = listScope(user, filter.teamId);
  if (scope?.length === 0) return [];
  const conditions: SQL[] = [];
  if (scope) conditions.push(inArray(plateTemplates.teamId, scope));
  if (filter.format) conditions.push(eq(plateTemplates.format, filter.format));
  return asJson(await db.select().from(plateTemplates).where(and(...conditions)).orderBy(asc(plateTemplates.name)));
}

export async function createTemplate(db: Db, actor: CurrentUser, input: { teamId: string; name: string; format: 96 | 384; map: PlateMap }) {
  visible({ teamId: input.teamId }, actor, 'That team');
  const map = validMap(input.format, input.map);
  return db.transaction((tx) => insertAudited(tx, actor, 'plate-template', plateTemplates, { ...input, map, createdBy: actor.id }));
}

export async function deleteTemplate(db: Db, actor: CurrentUser, id: string) {
  await db.transaction(async (tx) => {
    const before = await loadVisible(tx, plateTemplates, id, actor, 'That template');
    await deleteAudited(tx, actor, 'plate-template', plateTemplates, before);
  });
}
