// What a study's status means for editing (the server refuses edits in review and when approved).
import type { StudyStatus } from '@shared/schemas/studies';

export function isEditable(status: StudyStatus): boolean {
  return status === 'draft' || status === 'returned';
}

/** Why edits are hidden, in the words the study page shows; null when the study can be edited. */
export function lockReason(status: StudyStatus): string | null {
  if (status === 'in_review') {
    return 'This study is in review: it cannot be changed until the lead approves it or returns it with comments.';
  }
  if (status === 'approved') {
    return 'This study is approved and locked: its numbers, curves and files stay as they were approved. An admin can unlock it with a reason.';
  }
  return null;
}
