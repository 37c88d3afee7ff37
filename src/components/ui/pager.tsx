import { Button } from './button';

export type PagerProps = {
  offset: number;
  limit: number;
  total: number;
  onChange: (offset: number) => void;
  noun?: string;
};

/** "1–50 of 312 entries" with previous/next, for lists the server pages. */
export function Pager({ offset, limit, total, onChange, noun = 'entries' }: PagerProps) {
  if (total === 0) return null;
  const first = offset + 1;
  const last = Math.min(offset + limit, total);
  return (
    <nav aria-label="Pages" className="no-print mt-2 flex items-center justify-end gap-3 text-ink-muted">
      <span className="tabular-nums">
        {first.toLocaleString('en')}–{last.toLocaleString('en')} of {total.toLocaleString('en')} {noun}
      </span>
      <Button size="sm" disabled={offset === 0} onClick={() => onChange(Math.max(0, offset - limit))}>
        Previous
      </Button>
      <Button size="sm" disabled={offset + limit >= total} onClick={() => onChange(offset + limit)}>
        Next
      </Button>
    </nav>
  );
}
