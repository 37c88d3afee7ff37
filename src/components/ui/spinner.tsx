export type SpinnerProps = { className?: string };

export function Spinner({ className = 'size-4' }: SpinnerProps) {
  return (
    <svg viewBox="0 0 16 16" className={`animate-spin ${className}`} aria-hidden="true">
      <circle cx="8" cy="8" r="6.5" fill="none" stroke="currentColor" strokeOpacity="0.25" strokeWidth="2" />
      <path
        d="M14.5 8A6.5 6.5 0 0 0 8 1.5"
        fill="none"
        stroke="currentColor"
        strokeWidth="2"
        strokeLinecap="round"
      />
    </svg>
  );
}

export type LoadingProps = { label?: string };

/** A calm loading line for a screen or a panel. */
export function Loading({ label = 'Loading…' }: LoadingProps) {
  return (
    <p role="status" className="flex items-center gap-2 py-6 text-ink-muted">
      <Spinner />
      {label}
    </p>
  );
}
