// The home page: what each person should look at first, with counts.
import { desc, eq, inArray } from 'drizzle-orm';
import { can } from '../../../shared/permissions';
import type { HomeView } from '../../../shared/schemas/home';
import type { Db } from '../../db/client';
import { plates, readerFiles, studies, users } from '../../db/schema';
import type { CurrentUser } from '../../types';
import { asJson, listScope } from '../records/audited';
import { listStudies } from '../records/studies';

export async function homeView(db: Db, user: CurrentUser): Promise<HomeView> {
  const scope = listScope(user);
  const all = await listStudies(db, user, {});
  const mine = all.filter((s) => s.ownerId === user.id && (s.status === 'draft' || s.status === 'returned'));
  const review = can(user.role, 'studies:review') ? all.filter((s) => s.status === 'in_review' && s.ownerId !== user.id) : [];
  const approved = all.filter((s) => s.status === 'approved').slice(0, 10);
  const uploads =
    scope?.length === 0
      ? []
      : await db
          .select({ id: readerFiles.id, fileName: readerFiles.fileName, uploadedAt: readerFiles.uploadedAt, by: users.name, plateId: plates.id, plateName: plates.name, studyId: studies.id, studyName: studies.name })
          .from(readerFiles)
          .innerJoin(plates, eq(plates.id, readerFiles.plateId))
          .innerJoin(studies, eq(studies.id, plates.studyId))
          .innerJoin(users, eq(users.id, readerFiles.uploadedBy))
          .where(scope ? inArray(readerFiles.teamId, scope) : undefined)
          .orderBy(desc(readerFiles.uploadedAt))
          .limit(10);
  const uploadCount = scope?.length === 0 ? 0 : await db.$count(readerFiles, scope ? inArray(readerFiles.teamId, scope) : undefined);
  return asJson({
    counts: { myDrafts: mine.length, awaitingReview: review.length, approved: all.filter((s) => s.status === 'approved').length, uploads: uploadCount, studies: all.length },
    myDrafts: mine,
    awaitingReview: review,
    recentlyApproved: approved,
    recentUploads: uploads,
  });
}
