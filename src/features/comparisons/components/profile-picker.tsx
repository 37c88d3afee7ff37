// The profiles a comparison may hold, grouped by study: a checkbox per variant, the parent first.
// Studies not yet approved (listed only when asked for) carry a clear mark.
import { entryKey } from '@shared/comparison/compare';
import type { AvailableProfile } from '@shared/schemas/comparisons';
import { Badge } from '@/components/ui/badge';
import { formatFixed } from '@/components/ui/numbers';
import { formatDate } from '@/lib/format';
import { groupByStudy } from '../utils/builder-state';
import { modelWords } from '../utils/format';

export type ProfilePickerProps = {
  profiles: AvailableProfile[];
  selected: readonly string[];
  onToggle: (key: string) => void;
  onSelectStudy: (keys: string[], on: boolean) => void;
};

export function ProfilePicker({ profiles, selected, onToggle, onSelectStudy }: ProfilePickerProps) {
  const groups = groupByStudy(profiles);
  return (
    <div className="space-y-3">
      {groups.map((g) => {
        const keys = g.profiles.map(entryKey);
        const all = keys.every((k) => selected.includes(k));
        return (
          <fieldset key={g.studyId} className="rounded border border-line bg-surface">
            <legend className="sr-only">{g.studyName}</legend>
            <div className="flex items-start justify-between gap-3 border-b border-line bg-canvas px-3 py-1.5">
              <div>
                <p className="font-semibold" aria-hidden="true">
                  {g.studyName}
                </p>
                <p className="text-sm text-ink-muted">
                  {g.assayName}, {g.temperatureC} °C
                </p>
              </div>
              <div className="flex shrink-0 items-center gap-2">
                {!g.approved && (
                  <Badge tone="warning">not approved ({g.studyStatus.replace('_', ' ')})</Badge>
                )}
                <button
                  type="button"
                  onClick={() => onSelectStudy(keys, !all)}
                  className="text-sm font-semibold text-accent-700 hover:underline"
                >
                  {all ? 'None' : 'All'}
                  <span className="sr-only"> of {g.studyName}</span>
                </button>
              </div>
            </div>
            <ul className="divide-y divide-line">
              {g.profiles.map((p) => {
                const key = entryKey(p);
                return (
                  <li key={key} className="px-3 py-1">
                    <label className="flex items-center gap-2">
                      <input
                        type="checkbox"
                        className="size-4 accent-accent-700"
                        checked={selected.includes(key)}
                        onChange={() => onToggle(key)}
                        aria-label={p.variantName}
                        aria-describedby={`fit-${key}`}
                      />
                      <span className="font-semibold">{p.variantName}</span>
                      {p.isParent && <span className="text-sm text-ink-muted">(parent)</span>}
                      <span id={`fit-${key}`} className="ml-auto text-right text-sm text-ink-muted">
                        {p.isParent && <span className="sr-only">parent, </span>}
                        {p.model ? (modelWords[p.model] ?? p.model) : 'no fit'}
                        {p.pHopt !== null && `, optimum ${formatFixed(p.pHopt, 2)}`}
                      </span>
                    </label>
                  </li>
                );
              })}
            </ul>
            <p className="border-t border-line px-3 py-1 text-xs text-ink-faint">
              Fitted {formatDate(g.profiles[0]?.computedAt)}
            </p>
          </fieldset>
        );
      })}
    </div>
  );
}
