// Set the rate window for one well, its variant on every plate, or the whole plate; or go back to
// the automatic window. Saved with the settings version the screen shows (409: someone else saved).
import { useState } from 'react';
import { analysisSettingsSchema, type StudyAnalysisSettings } from '@shared/schemas/analysis';
import type { WellRow } from '@shared/analysis';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { withWindow, windowKey, type WindowScope } from '../utils/settings-edit';

export type WindowFormProps = {
  row: WellRow;
  variantName: string;
  plateName: string;
  settings: StudyAnalysisSettings;
  busy: boolean;
  onSave: (settings: StudyAnalysisSettings, done: string) => void;
};

export function WindowForm({ row, variantName, plateName, settings, busy, onSave }: WindowFormProps) {
  const w = row.window;
  const [start, setStart] = useState(String(w?.startS ?? 0));
  const [end, setEnd] = useState(String(w?.endS ?? ''));
  const [scope, setScope] = useState<WindowScope>('well');
  const [error, setError] = useState<string | null>(null);
  const scopes: { value: WindowScope; label: string; target: string; disabled?: boolean }[] = [
    { value: 'well', label: `This well (${row.well})`, target: `well ${row.well}` },
    {
      value: 'variant',
      label: `Every well of ${variantName}`,
      target: `every well of ${variantName}`,
      disabled: !row.variantId,
    },
    { value: 'plate', label: `The whole plate (${plateName})`, target: `every well of ${plateName}` },
  ];
  const target = { plateId: row.plateId, well: row.well, variantId: row.variantId };

  const apply = () => {
    const startS = Number(start);
    const endS = Number(end);
    const key = windowKey(scope, target);
    if (start.trim() === '' || end.trim() === '' || !Number.isFinite(startS) || !Number.isFinite(endS)) {
      return setError('Give the start and the end of the window in seconds.');
    }
    if (!key) return setError('This well has no variant.');
    const next = withWindow(settings, scope, key, { startS, endS });
    const checked = analysisSettingsSchema.safeParse(next);
    if (!checked.success) return setError(checked.error.issues[0]?.message ?? 'This window is not valid.');
    setError(null);
    onSave(next, `Window ${startS}–${endS} s set for ${scopes.find((s) => s.value === scope)!.target}.`);
  };
  const clear = () => {
    if (!w || (w.source !== 'well' && w.source !== 'variant' && w.source !== 'plate')) return;
    const key = windowKey(w.source, target);
    if (key) onSave(withWindow(settings, w.source, key, null), 'Back to the automatic window.');
  };
  const setBy =
    w && (w.source === 'well' || w.source === 'variant' || w.source === 'plate') ? w.source : null;

  return (
    <fieldset className="space-y-2 rounded border border-line p-3">
      <legend className="px-1 font-semibold">Rate window</legend>
      <div className="grid grid-cols-2 gap-3">
        <TextField
          label="Start (s)"
          type="number"
          min={0}
          step="any"
          inputMode="decimal"
          value={start}
          onChange={(e) => setStart(e.target.value)}
        />
        <TextField
          label="End (s)"
          type="number"
          min={0}
          step="any"
          inputMode="decimal"
          value={end}
          onChange={(e) => setEnd(e.target.value)}
        />
      </div>
      <div role="radiogroup" aria-label="Apply the window to" className="space-y-0.5">
        <p className="text-sm font-semibold">Apply to</p>
        {scopes.map((s) => (
          <label
            key={s.value}
            className={`flex items-center gap-2 text-sm ${s.disabled ? 'text-ink-faint' : ''}`}
          >
            <input
              type="radio"
              name="window-scope"
              value={s.value}
              checked={scope === s.value}
              disabled={s.disabled}
              onChange={() => setScope(s.value)}
            />
            {s.label}
          </label>
        ))}
      </div>
      <p className="text-xs text-ink-muted">
        The most specific window wins: a well’s own, then its variant’s, then the plate’s.
      </p>
      {error && <Notice tone="error">{error}</Notice>}
      <div className="flex flex-wrap gap-2">
        <Button variant="primary" size="sm" busy={busy} onClick={apply}>
          Apply window
        </Button>
        {setBy && (
          <Button size="sm" busy={busy} onClick={clear}>
            Clear the window set for this {setBy}
          </Button>
        )}
      </div>
    </fieldset>
  );
}
