import { Spinner } from '@/components/ui/spinner';

export type PreviewStatusProps = { fetching: boolean };

/** "Updating…" beside the preview heading while the server recomputes. */
export function PreviewStatus({ fetching }: PreviewStatusProps) {
  return (
    <span role="status" className="flex items-center gap-1.5 text-sm text-ink-muted">
      {fetching && (
        <>
          <Spinner className="size-3.5" />
          Updating…
        </>
      )}
    </span>
  );
}
