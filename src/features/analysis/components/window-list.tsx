// The rate windows set by hand (per plate, variant or well), each with a way back to automatic.
import type { StudyAnalysis, StudyAnalysisSettings } from '@shared/schemas/analysis';
import { Button } from '@/components/ui/button';
import { withWindow, type WindowScope } from '../utils/settings-edit';

export type WindowListProps = {
  analysis: StudyAnalysis;
  editable: boolean;
  busy: boolean;
  onSave: (settings: StudyAnalysisSettings, done: string) => void;
};

export function WindowList({ analysis, editable, busy, onSave }: WindowListProps) {
  const windows = analysis.settings.rateWindows ?? {};
  const plateNames = Object.fromEntries(analysis.result.qc.plates.map((p) => [p.plateId, p.name]));
  const variantNames = Object.fromEntries(analysis.result.profiles.map((p) => [p.variantId, p.name]));
  const nameOf = (scope: WindowScope, key: string) => {
    if (scope === 'plate') return `plate ${plateNames[key] ?? key}`;
    if (scope === 'variant') return `every well of ${variantNames[key] ?? key}`;
    const [plateId, well] = key.split(':');
    return `well ${well} of ${plateNames[plateId] ?? 'a plate'}`;
  };
  const entries = (['well', 'variant', 'plate'] as const).flatMap((scope) =>
    Object.entries(windows[scope] ?? {}).map(([key, w]) => ({ scope, key, w })),
  );
  return (
    <section aria-labelledby="windows-title">
      <h3 id="windows-title" className="text-base">
        Rate windows set by hand
      </h3>
      {entries.length === 0 ? (
        <p className="text-sm text-ink-muted">
          None: every kinetic well uses its automatic window (set one from a well in the Wells view).
        </p>
      ) : (
        <ul className="mt-1 space-y-1 text-sm">
          {entries.map(({ scope, key, w }) => (
            <li key={`${scope}-${key}`} className="flex items-center gap-3">
              <span>
                {nameOf(scope, key)}:{' '}
                <span className="tabular-nums">
                  {w.startS}–{w.endS} s
                </span>
              </span>
              {editable && (
                <Button
                  size="sm"
                  variant="ghost"
                  busy={busy}
                  onClick={() =>
                    onSave(
                      withWindow(analysis.settings, scope, key, null),
                      `Window of ${nameOf(scope, key)} cleared.`,
                    )
                  }
                >
                  Back to automatic
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
