// Which variant's profile is shown: one button per variant (reference marked).
import type { VariantProfile } from '@shared/analysis';

export type ProfilePickerProps = {
  profiles: VariantProfile[];
  selected: string;
  onSelect: (variantId: string) => void;
};

export function ProfilePicker({ profiles, selected, onSelect }: ProfilePickerProps) {
  return (
    <div role="group" aria-label="Variant shown" className="flex flex-wrap gap-1.5">
      {profiles.map((p) => (
        <button
          key={p.variantId}
          type="button"
          aria-pressed={p.variantId === selected}
          onClick={() => onSelect(p.variantId)}
          className={`rounded border px-2.5 py-0.5 text-sm font-semibold ${
            p.variantId === selected
              ? 'border-accent-700 bg-accent-50 text-accent-900'
              : 'border-line-strong bg-surface text-ink hover:bg-canvas'
          }`}
        >
          {p.name}
          {p.isReference && <span className="ml-1 text-xs font-normal text-ink-muted">reference</span>}
          {!p.fit && <span className="ml-1 text-xs font-normal text-warn-800">no fit</span>}
        </button>
      ))}
    </div>
  );
}
