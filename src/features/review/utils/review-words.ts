// The review in PRODUCT.md's words: what each status means, what each step did, and which steps a
// role may take from a status (the server decides; the screen only hides what would be refused).
import { can, type Role } from '@shared/permissions';
import type { StudyEvent, StudyEventKind } from '@shared/schemas/review';
import type { StudyStatus } from '@shared/schemas/studies';
import type { ReviewStep } from '../api/review-step';

export const statusMeaning: Record<StudyStatus, string> = {
  draft:
    'The team can still change it. Submit it for review when the analysis is ready; the leads of the team get an e-mail.',
  in_review:
    'Waiting for a lead to approve it or return it with comments. Nothing in the study can change meanwhile.',
  approved:
    'Locked: its numbers, curves and files stay as they were approved. An admin can unlock it with a reason.',
  returned: 'A lead returned it with comments: change what they asked for, then submit it again.',
};

export const eventWords: Record<StudyEventKind, string> = {
  submit: 'submitted it for review',
  withdraw: 'withdrew it from review',
  approve: 'approved it (the study is locked)',
  return: 'returned it with comments',
  unlock: 'unlocked it',
  comment: 'commented',
};

const allowedFrom: Record<ReviewStep, StudyStatus[]> = {
  submit: ['draft', 'returned'],
  withdraw: ['in_review'],
  approve: ['in_review'],
  return: ['in_review'],
  unlock: ['approved'],
};

const permissionOf = {
  submit: 'records:write',
  withdraw: 'records:write',
  approve: 'studies:review',
  return: 'studies:review',
  unlock: 'studies:unlock',
} as const;

export function stepsFor(role: Role | null | undefined, status: StudyStatus): ReviewStep[] {
  return (Object.keys(allowedFrom) as ReviewStep[]).filter(
    (s) => allowedFrom[s].includes(status) && can(role, permissionOf[s]),
  );
}

/** The newest event of a kind (the last submission, the approval in force). */
export const lastEvent = (events: StudyEvent[] | undefined, kinds: StudyEventKind[]) =>
  [...(events ?? [])].reverse().find((e) => kinds.includes(e.kind)) ?? null;
