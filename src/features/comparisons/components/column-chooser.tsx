// "Columns": which quantities the comparison table shows. A disclosure with one checkbox each.
import type { ColumnChoice } from './comparison-columns';

export type ColumnChooserProps = {
  columns: ColumnChoice[];
  visible: ReadonlySet<string>;
  onChange: (visible: Set<string>) => void;
};

export function ColumnChooser({ columns, visible, onChange }: ColumnChooserProps) {
  const toggle = (id: string) => {
    const next = new Set(visible);
    if (next.has(id)) next.delete(id);
    else next.add(id);
    onChange(next);
  };
  return (
    <details className="no-print relative">
      <summary className="inline-flex h-8 cursor-pointer list-none items-center rounded border border-line-strong bg-surface px-2.5 font-semibold hover:bg-canvas">
        Columns ({visible.size} of {columns.length})
      </summary>
      <fieldset className="absolute right-0 z-20 mt-1 w-80 rounded border border-line bg-surface p-3 shadow-lg">
        <legend className="sr-only">Columns shown</legend>
        <ul className="space-y-1">
          {columns.map((c) => (
            <li key={c.id}>
              <label className="flex items-center gap-2">
                <input
                  type="checkbox"
                  className="size-4 accent-accent-700"
                  checked={visible.has(c.id)}
                  onChange={() => toggle(c.id)}
                />
                {c.label}
              </label>
            </li>
          ))}
        </ul>
      </fieldset>
    </details>
  );
}
