// The review history of a study: who submitted, approved, returned or commented, when, and what they wrote.
import type { StudyEvent } from '@shared/schemas/review';
import { formatDateTime } from '@/lib/format';

const kindWords: Record<StudyEvent['kind'], string> = {
  comment: 'Comment',
  submit: 'Submitted for review',
  withdraw: 'Withdrawn from review',
  approve: 'Approved',
  return: 'Returned',
  unlock: 'Unlocked',
};

export type ApprovalsTableProps = { events: StudyEvent[] };

export function ApprovalsTable({ events }: ApprovalsTableProps) {
  if (events.length === 0) return <p className="text-ink-muted">No review steps yet.</p>;
  return (
    <table className="w-full border-collapse text-sm" aria-label="Review and approvals">
      <thead className="text-left text-ink-muted">
        <tr>
          <th className="border-b border-line py-1 pr-3 font-semibold">When</th>
          <th className="border-b border-line py-1 pr-3 font-semibold">Step</th>
          <th className="border-b border-line py-1 pr-3 font-semibold">Who</th>
          <th className="border-b border-line py-1 font-semibold">Comment</th>
        </tr>
      </thead>
      <tbody>
        {events.map((e) => (
          <tr key={e.id} className="border-b border-line align-top last:border-b-0">
            <td className="py-1 pr-3 whitespace-nowrap tabular-nums">{formatDateTime(e.createdAt)}</td>
            <td className={`py-1 pr-3 ${e.kind === 'approve' ? 'font-semibold' : ''}`}>
              {kindWords[e.kind]}
            </td>
            <td className="py-1 pr-3">{e.author.name}</td>
            <td className="py-1 whitespace-pre-wrap">{e.body || '—'}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
