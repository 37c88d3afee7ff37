// The status of a study in PRODUCT.md's words: Draft, In review, Approved, Returned.
import { studyStatusLabels, type StudyStatus } from '@shared/schemas/studies';

const tones: Record<StudyStatus, string> = {
  draft: 'border-line-strong bg-canvas text-ink-muted',
  in_review: 'border-accent-300 bg-accent-50 text-accent-800',
  approved: 'border-accent-700 bg-accent-700 text-white',
  returned: 'border-warn-200 bg-warn-50 text-warn-800',
};

export type StudyStatusBadgeProps = { status: StudyStatus };

export function StudyStatusBadge({ status }: StudyStatusBadgeProps) {
  return (
    <span
      className={`inline-flex items-center gap-1 rounded border px-1.5 text-sm leading-5 font-semibold whitespace-nowrap ${tones[status]}`}
    >
      {status === 'approved' && (
        <svg viewBox="0 0 12 12" className="size-3" aria-hidden="true">
          <path
            d="M3.5 5V3.8a2.5 2.5 0 0 1 5 0V5M2.5 5h7v5.5h-7z"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.3"
          />
        </svg>
      )}
      {studyStatusLabels[status]}
    </span>
  );
}
