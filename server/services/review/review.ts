// Review of a study: a scientist submits it, a lead of its team approves (the study locks) or
// returns it with comments; an admin can unlock an approved study with a reason. Each step is a
// study event (the history), an audit row, and an e-mail to the people concerned.
import { and, asc, eq, inArray } from 'drizzle-orm';
import type { StudyEvent, StudyEventKind } from '../../../shared/schemas/review';
import type { StudyStatus } from '../../../shared/schemas/studies';
import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import { studies, studyEvents, teamMembers, users } from '../../db/schema';
import { conflict, forbidden } from '../../errors';
import type { Mail } from '../../mail/mailer';
import { reviewDecisionMail, reviewRequestMail } from '../../mail/templates';
import type { CurrentUser } from '../../types';
import { writeAudit } from '../audit/write-audit';
import { asJson, loadVisible } from '../records/audited';

type Study = typeof studies.$inferSelect;

const allowedFrom: Record<Exclude<StudyEventKind, 'comment'>, StudyStatus[]> = {
  submit: ['draft', 'returned'],
  withdraw: ['in_review'],
  approve: ['in_review'],
  return: ['in_review'],
  unlock: ['approved'],
};
const nextStatus: Record<Exclude<StudyEventKind, 'comment'>, StudyStatus> = {
  submit: 'in_review',
  withdraw: 'draft',
  approve: 'approved',
  return: 'returned',
  unlock: 'returned',
};
const pastTense = { submit: 'submitted', withdraw: 'withdrawn', approve: 'approved', return: 'returned', unlock: 'unlocked' };
const statusWords: Record<StudyStatus, string> = { draft: 'a draft', in_review: 'in review', approved: 'approved', returned: 'returned' };

async function leadsOf(tx: Tx, teamId: string) {
  const rows = await tx
    .select({ email: users.email, role: users.role })
    .from(teamMembers)
    .innerJoin(users, eq(users.id, teamMembers.userId))
    .where(and(eq(teamMembers.teamId, teamId), eq(users.active, true), eq(users.role, 'lead')));
  if (rows.length > 0) return rows.map((r) => r.email);
  // A team without a lead: its review requests go to the admins.
  const admins = await tx.select({ email: users.email }).from(users).where(and(eq(users.role, 'admin'), eq(users.active, true)));
  return admins.map((a) => a.email);
}

async function lastSubmitter(tx: Tx, studyId: string) {
  const events = await tx
    .select()
    .from(studyEvents)
    .where(and(eq(studyEvents.studyId, studyId), eq(studyEvents.kind, 'submit')))
    .orderBy(asc(studyEvents.createdAt));
  return events.at(-1)?.authorId ?? null;
}

/** Moves a study through review; returns the mail to send once the change is committed. */
export async function transition(
  ctx: AppContext,
  actor: CurrentUser,
  studyId: string,
  kind: Exclude<StudyEventKind, 'comment'>,
  text: string,
): Promise<{ study: Study; mail: Mail | null }> {
  return ctx.db.transaction(async (tx) => {
    const before = await loadVisible(tx, studies, studyId, actor, 'That study');
    if (!allowedFrom[kind].includes(before.status)) {
      throw conflict(`This study is ${statusWords[before.status]}; it cannot be ${pastTense[kind]} now.`, 'wrong_status');
    }
    if (kind === 'approve' && (await lastSubmitter(tx, studyId)) === actor.id) {
      throw forbidden('Someone other than the person who submitted the study must approve it.');
    }
    const [study] = await tx
      .update(studies)
      .set({ status: nextStatus[kind], updatedAt: new Date(), version: before.version + 1 })
      .where(and(eq(studies.id, studyId), eq(studies.status, before.status)))
      .returning();
    if (!study) throw conflict('The study changed while you were deciding; reload it.', 'wrong_status');
    await tx.insert(studyEvents).values({ teamId: study.teamId, studyId, authorId: actor.id, kind, body: text });
    await writeAudit(tx, {
      actorId: actor.id,
      teamId: study.teamId,
      entity: 'study',
      entityId: studyId,
      action: kind,
      before: { status: before.status },
      after: { status: study.status, ...(text ? { text } : {}) },
    });
    const link = `${ctx.config.appUrl}/studies/${studyId}`;
    let mail: Mail | null = null;
    if (kind === 'submit') {
      mail = reviewRequestMail({ to: await leadsOf(tx, study.teamId), author: actor.name, study: study.name, message: text, link });
    } else if (kind === 'approve' || kind === 'return' || kind === 'unlock') {
      const owner = await tx.query.users.findFirst({ where: eq(users.id, study.ownerId) });
      const decision = ({ approve: 'approved', return: 'returned', unlock: 'unlocked' } as const)[kind];
      if (owner?.active) mail = reviewDecisionMail({ to: owner.email, reviewer: actor.name, study: study.name, decision, comment: text, link });
    }
    return { study, mail };
  });
}

export async function addComment(ctx: AppContext, actor: CurrentUser, studyId: string, body: string) {
  return ctx.db.transaction(async (tx) => {
    const study = await loadVisible(tx, studies, studyId, actor, 'That study');
    const [event] = await tx.insert(studyEvents).values({ teamId: study.teamId, studyId, authorId: actor.id, kind: 'comment', body }).returning();
    await writeAudit(tx, { actorId: actor.id, teamId: study.teamId, entity: 'study-comment', entityId: event.id, action: 'create', after: { studyId, body } });
    return event;
  });
}

export async function studyHistory(ctx: AppContext, user: CurrentUser, studyId: string): Promise<StudyEvent[]> {
  await loadVisible(ctx.db, studies, studyId, user, 'That study');
  const rows = await ctx.db
    .select({ event: studyEvents, name: users.name, role: users.role })
    .from(studyEvents)
    .innerJoin(users, eq(users.id, studyEvents.authorId))
    .where(inArray(studyEvents.studyId, [studyId]))
    .orderBy(asc(studyEvents.createdAt));
  return asJson(
    rows.map(({ event, name, role }) => ({
      id: event.id,
      kind: event.kind,
      body: event.body,
      createdAt: event.createdAt,
      author: { id: event.authorId, name, role },
    })),
  );
}
