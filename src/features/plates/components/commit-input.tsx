// A number box that applies its value on Enter or when it loses focus (not on every keystroke),
// and shows "mixed" when the selected wells differ.
import { useEffect, useState } from 'react';

export type CommitInputProps = {
  label: string;
  value: number | null | 'mixed' | undefined;
  onCommit: (value: number | null) => void;
  disabled?: boolean;
  min?: number;
  max?: number;
  integer?: boolean;
  unit?: string;
};

const text = (v: CommitInputProps['value']) => (v === 'mixed' || v == null ? '' : String(v));

export function CommitInput({ label, value, onCommit, disabled, min, max, integer, unit }: CommitInputProps) {
  const [draft, setDraft] = useState(text(value));
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setDraft(text(value));
    setError(null);
  }, [value]);

  const commit = () => {
    if (draft === text(value)) return;
    if (draft.trim() === '') return onCommit(null);
    const n = Number(draft.replace(',', '.'));
    const bad =
      !Number.isFinite(n) ||
      (integer && !Number.isInteger(n)) ||
      (min !== undefined && n < min) ||
      (max !== undefined && n > max);
    if (bad) {
      setError(
        `Give ${integer ? 'a whole number' : 'a number'}${min !== undefined && max !== undefined ? ` from ${min} to ${max}` : ''}.`,
      );
      return;
    }
    setError(null);
    onCommit(n);
  };
  return (
    <label className="block">
      <span className="mb-0.5 block text-sm text-ink-muted">
        {label}
        {unit && <span className="sr-only"> ({unit})</span>}
      </span>
      <span className="flex items-center gap-1">
        <input
          type="text"
          inputMode="decimal"
          value={draft}
          placeholder={value === 'mixed' ? 'mixed' : ''}
          disabled={disabled}
          aria-invalid={error ? true : undefined}
          onChange={(e) => setDraft(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') commit();
            if (e.key === 'Escape') setDraft(text(value));
          }}
          className={`h-8 w-full rounded border bg-surface px-2 text-right tabular-nums disabled:bg-canvas disabled:text-ink-muted ${error ? 'border-danger-600' : 'border-line-strong'}`}
        />
        {unit && (
          <span className="text-sm text-ink-muted" aria-hidden="true">
            {unit}
          </span>
        )}
      </span>
      {error && <span className="mt-0.5 block text-sm text-danger-600">{error}</span>}
    </label>
  );
}
