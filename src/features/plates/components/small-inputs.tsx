// The small labelled inputs of the editor's fill and pattern dialogs: a well name, and a whole
// number of at least 1 (an empty or unreadable entry counts as 1).
import type { ReactNode } from 'react';

const input = 'h-8 w-20 rounded border border-line-strong bg-surface px-2';

export function WellInput({
  label,
  value,
  onChange,
}: {
  label: string;
  value: string;
  onChange: (v: string) => void;
}) {
  return (
    <label className="block">
      <span className="mb-0.5 block font-semibold">{label}</span>
      <input className={input} value={value} onChange={(e) => onChange(e.target.value)} />
    </label>
  );
}

export function CountInput({
  label,
  value,
  onChange,
  max = 24,
}: {
  label: ReactNode;
  value: number;
  onChange: (n: number) => void;
  max?: number;
}) {
  return (
    <label className="block">
      <span className="mb-0.5 block font-semibold">{label}</span>
      <input
        type="number"
        min={1}
        max={max}
        className={`${input} text-right`}
        value={value}
        onChange={(e) => onChange(Math.max(1, Number(e.target.value) || 1))}
      />
    </label>
  );
}
