// Who did what when: every review step and comment of the study, oldest first.
import { roleLabels, type Role } from '@shared/permissions';
import type { StudyEvent } from '@shared/schemas/review';
import { formatDateTime } from '@/lib/format';
import { eventWords } from '../utils/review-words';

export type HistoryTimelineProps = { events: StudyEvent[] };

const dots: Record<StudyEvent['kind'], string> = {
  submit: 'bg-accent-500',
  withdraw: 'bg-line-strong',
  approve: 'bg-accent-800',
  return: 'bg-warn-600',
  unlock: 'bg-warn-600',
  comment: 'bg-surface border border-line-strong',
};

export function HistoryTimeline({ events }: HistoryTimelineProps) {
  if (events.length === 0)
    return (
      <p className="text-ink-muted">Nothing yet: the study has not been submitted and has no comments.</p>
    );
  return (
    <ol aria-label="Review history" className="relative space-y-3 border-l border-line pl-5">
      {events.map((e) => (
        <li key={e.id} className="relative" data-event={e.kind}>
          <span
            aria-hidden="true"
            className={`absolute top-1.5 -left-[1.6rem] size-2.5 rounded-full ${dots[e.kind]}`}
          />
          <p className="text-sm">
            <span className="font-semibold">{e.author.name}</span>{' '}
            <span className="text-ink-muted">({roleLabels[e.author.role as Role] ?? e.author.role})</span>{' '}
            {eventWords[e.kind]}{' '}
            <time dateTime={e.createdAt} className="text-ink-muted tabular-nums">
              {formatDateTime(e.createdAt)}
            </time>
          </p>
          {e.body && (
            <blockquote className="mt-0.5 max-w-3xl rounded border border-line bg-surface px-2 py-1 whitespace-pre-line">
              {e.body}
            </blockquote>
          )}
        </li>
      ))}
    </ol>
  );
}
