export type SortMarkProps = { direction: false | 'asc' | 'desc' };

/** The small arrow beside a sortable column's title. */
export function SortMark({ direction }: SortMarkProps) {
  return (
    <svg viewBox="0 0 8 12" className="h-3 w-2" aria-hidden="true">
      <path d="M4 1 7 5H1z" fill="currentColor" opacity={direction === 'asc' ? 1 : 0.25} />
      <path d="M4 11 1 7h6z" fill="currentColor" opacity={direction === 'desc' ? 1 : 0.25} />
    </svg>
  );
}
