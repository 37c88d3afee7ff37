// A determinate progress bar (uploads): the fraction done, said in words for screen readers.
export type ProgressBarProps = { fraction: number; label: string; detail?: string };

export function ProgressBar({ fraction, label, detail }: ProgressBarProps) {
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <div>
      <div className="mb-1 flex justify-between text-sm">
        <span>{label}</span>
        <span className="tabular-nums text-ink-muted">{detail ?? `${percent} %`}</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-2 overflow-hidden rounded bg-line"
      >
        <div
          className="h-full bg-accent-600 transition-[width] duration-150"
          style={{ width: `${percent}%` }}
        />
      </div>
    </div>
  );
}
