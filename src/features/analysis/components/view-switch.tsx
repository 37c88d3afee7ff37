// The views of the analysis tab, as a row of toggle buttons (the choice is kept in the address).
import { analysisViews, type AnalysisView } from '../hooks/use-analysis-params';

const labels: Record<AnalysisView, string> = {
  profiles: 'Profiles',
  wells: 'Wells',
  exclusions: 'Exclusions',
  qc: 'Plate QC',
  settings: 'Settings',
};

export type ViewSwitchProps = {
  view: AnalysisView;
  counts: Partial<Record<AnalysisView, number>>;
  /** What a count counts, for the button's title (e.g. "flags"). */
  countWords?: Partial<Record<AnalysisView, string>>;
  onChange: (view: AnalysisView) => void;
};

export function ViewSwitch({ view, counts, countWords = {}, onChange }: ViewSwitchProps) {
  return (
    <div
      role="group"
      aria-label="Analysis views"
      className="inline-flex overflow-hidden rounded border border-line-strong"
    >
      {analysisViews.map((v) => (
        <button
          key={v}
          type="button"
          aria-pressed={view === v}
          title={counts[v] ? `${counts[v]} ${countWords[v] ?? ''}`.trim() : undefined}
          onClick={() => onChange(v)}
          className={`border-r border-line-strong px-3 py-1 text-sm font-semibold last:border-r-0 ${view === v ? 'bg-accent-700 text-white' : 'bg-surface text-ink hover:bg-canvas'}`}
        >
          {labels[v]}
          {counts[v] ? (
            <span className={`ml-1 font-normal ${view === v ? 'text-accent-100' : 'text-ink-muted'}`}>
              ({counts[v]})
            </span>
          ) : null}
        </button>
      ))}
    </div>
  );
}
