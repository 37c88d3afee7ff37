// A mutation list in one-letter notation (D92N/S110A), one chip per substitution; the parent has none.
export type MutationListProps = { mutations: string; isParent?: boolean };

export function MutationList({ mutations, isParent }: MutationListProps) {
  const parts = mutations.split('/').filter(Boolean);
  if (parts.length === 0) {
    return <span className="text-ink-muted">{isParent ? 'none (wild type)' : 'none'}</span>;
  }
  return (
    <span className="inline-flex flex-wrap gap-1" aria-label={`Mutations ${parts.join(', ')}`}>
      {parts.map((m) => (
        <code key={m} className="rounded border border-line bg-canvas px-1 font-mono text-sm text-ink">
          {m}
        </code>
      ))}
    </span>
  );
}
