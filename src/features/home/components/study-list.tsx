// A short list of studies on the home page: name (a link), enzyme, owner, when it last changed.
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { StudySummary } from '@shared/schemas/records-types';
import { studyStatusLabels } from '@shared/schemas/studies';
import { Badge } from '@/components/ui/badge';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';

export type StudyListProps = {
  id: string;
  title: string;
  count: number;
  studies: StudySummary[];
  empty: ReactNode;
  /** Who is shown beside each study: the owner (reviews, approvals) or nobody (my drafts). */
  showOwner?: boolean;
};

export function StudyList({ id, title, count, studies, empty, showOwner = true }: StudyListProps) {
  return (
    <section aria-labelledby={id} className="rounded border border-line bg-surface">
      <h2 id={id} className="flex items-center justify-between border-b border-line px-4 py-2 text-base">
        {title}
        <span className="rounded-full bg-canvas px-2 text-sm text-ink-muted tabular-nums">{count}</span>
      </h2>
      {studies.length === 0 ? (
        <p className="px-4 py-3 text-ink-muted">{empty}</p>
      ) : (
        <ul className="divide-y divide-line">
          {studies.map((s) => (
            <li key={s.id} className="flex items-baseline justify-between gap-3 px-4 py-2">
              <div>
                <Link to={paths.study.href(s.id)} className="font-semibold text-accent-700 hover:underline">
                  {s.name}
                </Link>
                {s.status === 'returned' && (
                  <span className="ml-2">
                    <Badge tone="warning">{studyStatusLabels.returned}</Badge>
                  </span>
                )}
                <p className="text-sm text-ink-muted">
                  {s.enzymeName} · {s.variantCount} variants{showOwner ? ` · ${s.ownerName}` : ''}
                  {` · ${s.teamName}`}
                </p>
              </div>
              <span className="text-sm whitespace-nowrap text-ink-muted tabular-nums">
                {formatDateTime(s.updatedAt)}
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
