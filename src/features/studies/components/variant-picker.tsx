// The variants a study includes (checkboxes, parent marked) and its reference variant.
import type { Variant } from '@shared/schemas/records-types';

export type VariantPickerProps = {
  variants: Variant[];
  value: string[];
  onChange: (ids: string[]) => void;
  error?: string;
};

export function VariantPicker({ variants, value, onChange, error }: VariantPickerProps) {
  const toggle = (id: string, on: boolean) =>
    onChange(
      on
        ? variants.filter((v) => v.id === id || value.includes(v.id)).map((v) => v.id)
        : value.filter((x) => x !== id),
    );
  return (
    <fieldset aria-describedby={error ? 'variant-picker-error' : undefined}>
      <legend className="mb-1 font-semibold">Variants to include</legend>
      <div className="grid grid-cols-2 gap-x-6 gap-y-1 rounded border border-line bg-surface px-3 py-2">
        {variants.map((v) => (
          <label key={v.id} className="flex items-center gap-2">
            <input
              type="checkbox"
              className="size-4 accent-accent-700"
              checked={value.includes(v.id)}
              onChange={(e) => toggle(v.id, e.target.checked)}
            />
            <span>{v.name}</span>
            {v.isParent && <span className="text-sm text-ink-muted">(parent)</span>}
            {!v.isParent && v.mutations && (
              <code className="font-mono text-sm text-ink-muted">{v.mutations}</code>
            )}
          </label>
        ))}
      </div>
      {error && (
        <p id="variant-picker-error" className="mt-1 text-sm text-danger-600">
          {error}
        </p>
      )}
    </fieldset>
  );
}
