// A value's source string, verbatim as the library holds it (e.g. "G", "Roy 1997", "[memory]").
export type SourceNoteProps = { source: string | null | undefined };

export function SourceNote({ source }: SourceNoteProps) {
  if (!source) return <span className="text-ink-faint">no source</span>;
  const memory = source.includes('[memory]');
  return (
    <span
      className={`rounded px-1 text-sm ${memory ? 'bg-warn-50 text-warn-800' : 'bg-canvas text-ink-muted'}`}
      title={memory ? 'Recalled, not checked against a source: verify before relying on it.' : undefined}
    >
      {source}
    </span>
  );
}
