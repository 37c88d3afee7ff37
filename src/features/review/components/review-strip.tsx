// The review state on every tab of a study: in review since when and by whom, approved and locked
// (by whom, when), or returned with the lead's comment; nothing for a draft.
import { Link, useLocation } from 'react-router';
import type { StudyStatus } from '@shared/schemas/studies';
import { formatDateTime } from '@/lib/format';
import { useStudyHistory } from '../api/get-history';
import { lastEvent } from '../utils/review-words';

export type ReviewStripProps = { studyId: string; status: StudyStatus; reviewHref: string };

const tones: Record<Exclude<StudyStatus, 'draft'>, string> = {
  in_review: 'border-accent-200 bg-accent-50 text-accent-900',
  approved: 'border-accent-700 bg-accent-50 text-accent-900',
  returned: 'border-warn-200 bg-warn-50 text-warn-800',
};

export function ReviewStrip({ studyId, status, reviewHref }: ReviewStripProps) {
  const history = useStudyHistory(status === 'draft' ? null : studyId);
  const { pathname } = useLocation();
  if (status === 'draft') return null;
  const event = lastEvent(
    history.data,
    status === 'in_review' ? ['submit'] : status === 'approved' ? ['approve'] : ['return', 'unlock'],
  );
  const who = event ? ` by ${event.author.name} on ${formatDateTime(event.createdAt)}` : '';
  const text =
    status === 'in_review'
      ? `In review: submitted${who}. Nothing can change until a lead approves it or returns it.`
      : status === 'approved'
        ? `Approved and locked${event ? `: approved${who}` : ''}. Its numbers, curves and files stay as approved; an admin can unlock it with a reason.`
        : `Returned${who}${event?.body ? `: “${event.body.replace(/[.!?]+$/, '')}”` : ''}. Change what was asked, then submit it again.`;
  return (
    <div
      role="status"
      aria-label="Review state"
      className={`mb-4 flex flex-wrap items-center gap-x-3 rounded border px-3 py-1.5 text-sm ${tones[status]}`}
    >
      {status === 'approved' && (
        <svg viewBox="0 0 12 12" className="size-3.5" aria-hidden="true">
          <path
            d="M3.5 5V3.8a2.5 2.5 0 0 1 5 0V5M2.5 5h7v5.5h-7z"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.3"
          />
        </svg>
      )}
      <span className="flex-1">{text}</span>
      {pathname !== reviewHref && (
        <Link to={reviewHref} className="font-semibold underline">
          Review and history
        </Link>
      )}
    </div>
  );
}
