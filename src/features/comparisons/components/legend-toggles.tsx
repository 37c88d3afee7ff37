// The legend that hides and shows each profile of the comparison chart (not printed: the chart's
// own legend lists what is shown).
import type { ComparisonCurve } from '@shared/schemas/comparisons';
import type { ProfileStyle } from '../utils/colors';

export type LegendTogglesProps = {
  curves: ComparisonCurve[];
  styles: Record<string, ProfileStyle>;
  referenceKey: string;
  hidden: ReadonlySet<string>;
  onToggle: (key: string) => void;
};

export function LegendToggles({ curves, styles, referenceKey, hidden, onToggle }: LegendTogglesProps) {
  return (
    <ul aria-label="Profiles in the chart" className="no-print mb-2 flex flex-wrap gap-1.5">
      {curves.map((c) => {
        const on = !hidden.has(c.key);
        const color = styles[c.key]?.color ?? '#000';
        return (
          <li key={c.key}>
            <button
              type="button"
              aria-pressed={on}
              onClick={() => onToggle(c.key)}
              title={on ? 'Hide this profile' : 'Show this profile'}
              className={`inline-flex items-center gap-1.5 rounded border px-2 py-0.5 text-sm ${on ? 'border-line-strong bg-surface text-ink' : 'border-line bg-canvas text-ink-faint line-through'}`}
            >
              <svg viewBox="0 0 18 8" className="h-2 w-4.5" aria-hidden="true">
                <line
                  x1="0"
                  x2="18"
                  y1="4"
                  y2="4"
                  stroke={on ? color : '#b9c1bd'}
                  strokeWidth="3"
                  strokeDasharray={styles[c.key]?.dash}
                />
              </svg>
              {c.label}
              {c.key === referenceKey && <span className="text-ink-muted">(reference)</span>}
              {!c.approved && <span className="font-semibold text-warn-800">not approved</span>}
            </button>
          </li>
        );
      })}
    </ul>
  );
}
