// The global-fit option of the builder: fit the chosen profiles together with one or more
// parameters shared (one apparent pKa for all), to ask whether they really differ.
import { useId } from 'react';
import type { GlobalFitChoice } from '../utils/builder-state';
import { sharedLabels } from '../utils/global-fit-words';

const modelChoices: {
  value: GlobalFitChoice['model'];
  label: string;
  shareable: GlobalFitChoice['shared'];
}[] = [
  { value: 'bell', label: 'Bell (two ionizations)', shareable: ['pKa1', 'pKa2'] },
  { value: 'acid', label: 'Acid limb only (one ionization)', shareable: ['pKa'] },
  { value: 'base', label: 'Alkaline limb only (one ionization)', shareable: ['pKa'] },
];

export type GlobalFitControlsProps = {
  value: GlobalFitChoice | null;
  onChange: (value: GlobalFitChoice | null) => void;
  profiles: number;
  disabled?: boolean;
};

export function GlobalFitControls({ value, onChange, profiles, disabled }: GlobalFitControlsProps) {
  const modelId = useId();
  const on = value !== null;
  const model = modelChoices.find((m) => m.value === value?.model) ?? modelChoices[0];
  const toggleShared = (name: GlobalFitChoice['shared'][number]) => {
    if (!value) return;
    const shared = value.shared.includes(name)
      ? value.shared.filter((s) => s !== name)
      : [...value.shared, name];
    onChange({ ...value, shared });
  };
  return (
    <fieldset className="rounded border border-line bg-surface p-3" disabled={disabled}>
      <legend className="px-1 font-semibold">Global fit</legend>
      <label className="flex items-center gap-2">
        <input
          type="checkbox"
          className="size-4 accent-accent-700"
          checked={on}
          onChange={(e) => onChange(e.target.checked ? { model: 'bell', shared: ['pKa1'] } : null)}
        />
        Fit the chosen profiles together with a shared parameter
      </label>
      <p className="mt-1 text-sm text-ink-muted">
        Asks whether the profiles need their own value, or whether one value describes them all.
        {profiles < 2 && ' Choose at least two profiles.'}
      </p>
      {on && value && (
        <div className="mt-2 space-y-2 pl-6">
          <div>
            <label htmlFor={modelId} className="mb-0.5 block text-sm text-ink-muted">
              Model of the global fit
            </label>
            <select
              id={modelId}
              value={value.model}
              onChange={(e) => {
                const next = modelChoices.find((m) => m.value === e.target.value) ?? modelChoices[0];
                onChange({ model: next.value, shared: [next.shareable[0]] });
              }}
              className="h-8 rounded border border-line-strong bg-surface px-2"
            >
              {modelChoices.map((m) => (
                <option key={m.value} value={m.value}>
                  {m.label}
                </option>
              ))}
            </select>
          </div>
          <div role="group" aria-label="Shared parameters" className="flex gap-4">
            {model.shareable.map((name) => (
              <label key={name} className="flex items-center gap-2">
                <input
                  type="checkbox"
                  className="size-4 accent-accent-700"
                  checked={value.shared.includes(name)}
                  onChange={() => toggleShared(name)}
                />
                Share {sharedLabels[name]}
              </label>
            ))}
          </div>
          {value.shared.length === 0 && (
            <p className="text-sm text-warn-800">Share at least one parameter.</p>
          )}
        </div>
      )}
    </fieldset>
  );
}
