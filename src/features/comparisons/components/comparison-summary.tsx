// The head of a saved comparison: its notes, reference, profiles, team, who saved it and when.
import type { ComparisonView, SavedComparison } from '@shared/schemas/comparisons';
import { formatDateTime } from '@/lib/format';

export type ComparisonSummaryProps = {
  saved: SavedComparison;
  view: ComparisonView;
  teamName?: string;
  createdByName?: string;
};

export function ComparisonSummary({ saved, view, teamName, createdByName }: ComparisonSummaryProps) {
  const reference = view.result.rows.find((r) => r.isReference);
  const studies = [...new Set(view.result.rows.map((r) => r.studyName))];
  return (
    <dl className="grid grid-cols-[9rem_1fr] gap-x-4 gap-y-1">
      {saved.notes && (
        <>
          <dt className="text-ink-muted">Notes</dt>
          <dd className="whitespace-pre-wrap">{saved.notes}</dd>
        </>
      )}
      <dt className="text-ink-muted">Reference</dt>
      <dd className="font-semibold">
        {reference ? `${reference.variantName} — ${reference.studyName}` : '—'}
      </dd>
      <dt className="text-ink-muted">Profiles</dt>
      <dd>
        {view.result.rows.length} from {studies.length === 1 ? 'the study' : `${studies.length} studies:`}{' '}
        {studies.map((n) => `“${n}”`).join(', ')}
        {saved.includeUnapproved && ', studies not yet approved included'}
      </dd>
      {teamName && (
        <>
          <dt className="text-ink-muted">Team</dt>
          <dd>{teamName}</dd>
        </>
      )}
      <dt className="text-ink-muted">Saved</dt>
      <dd>
        {createdByName ? `${createdByName}, ` : ''}
        {formatDateTime(saved.createdAt)}
        {saved.updatedAt !== saved.createdAt &&
          `; changed ${formatDateTime(saved.updatedAt)} (version ${saved.version})`}
      </dd>
    </dl>
  );
}
