// The map's checks, recomputed as the map changes (shared/plate-map checkPlateMap, the same
// function the server runs). Clicking a check selects and outlines its wells.
import type { MapCheck } from '@shared/plate-map/checks';

export type MapChecksProps = {
  checks: MapCheck[];
  activeCode: string | null;
  onPick: (check: MapCheck, key: string) => void;
};

const marks = {
  error: { text: '✕', className: 'bg-danger-600 text-white', label: 'Problem' },
  warning: { text: '!', className: 'bg-warn-600 text-white', label: 'Warning' },
  info: { text: 'i', className: 'bg-line-strong text-ink', label: 'Note' },
} as const;

export function MapChecks({ checks, activeCode, onPick }: MapChecksProps) {
  const problems = checks.filter((c) => c.level !== 'info').length;
  return (
    <section aria-labelledby="checks-title" className="rounded border border-line bg-surface p-3">
      <h2 id="checks-title" className="flex items-baseline justify-between text-base">
        Checks
        <span className="text-sm font-normal text-ink-muted" role="status">
          {problems === 0 ? 'No problems' : `${problems} to look at`}
        </span>
      </h2>
      <ul className="mt-2 max-h-72 space-y-1 overflow-auto" aria-label="Map checks">
        {checks.map((check, i) => {
          const mark = marks[check.level];
          const key = `${check.code}-${i}`;
          return (
            <li key={key}>
              <button
                type="button"
                disabled={check.wells.length === 0}
                onClick={() => onPick(check, key)}
                aria-pressed={activeCode === key}
                data-check={check.code}
                className={`flex w-full items-start gap-2 rounded px-1.5 py-1 text-left enabled:hover:bg-canvas ${activeCode === key ? 'bg-warn-50 ring-1 ring-warn-200' : ''}`}
              >
                <span
                  aria-label={mark.label}
                  className={`mt-0.5 inline-flex size-4 shrink-0 items-center justify-center rounded-full text-[10px] font-bold ${mark.className}`}
                >
                  {mark.text}
                </span>
                <span className="flex-1">{check.message}</span>
                {check.wells.length > 0 && (
                  <span className="text-sm text-ink-muted tabular-nums">{check.wells.length}</span>
                )}
              </button>
            </li>
          );
        })}
        {checks.length === 0 && (
          <li className="px-1.5 py-1 text-ink-muted">Every well has a role; nothing to report.</li>
        )}
      </ul>
    </section>
  );
}
