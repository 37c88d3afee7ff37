// The study's status in PRODUCT.md's words (Draft, In review, Approved, Returned) and what it means.
import { studyStatusLabels, type StudyStatus } from '@shared/schemas/studies';
import { statusMeaning } from '../utils/review-words';

export type ReviewStatusProps = { status: StudyStatus };

export function ReviewStatus({ status }: ReviewStatusProps) {
  return (
    <div className="rounded border border-line bg-surface p-3">
      <p className="text-sm text-ink-muted">Status</p>
      <p className="text-lg font-semibold">{studyStatusLabels[status]}</p>
      <p className="mt-0.5 max-w-2xl">{statusMeaning[status]}</p>
    </div>
  );
}
