// The design, point by point. Writers may override the proposed system at a point (the choices
// are the designer's own candidates there, within one unit of pK″).
import { useState } from 'react';
import type { DesignedSeries } from '@shared/schemas/buffer-series';
import { phKey } from '@shared/schemas/buffer-series';
import { PointRow } from './point-row';

export type SeriesResultsProps = {
  design: DesignedSeries;
  /** The design without overrides: where the choices at each point come from. */
  choices?: DesignedSeries;
  onOverride?: (key: string, systemId: string | null) => void;
};

const headers = [
  { label: 'pH', numeric: true },
  { label: 'Buffer system' },
  { label: 'pK″ at assay T', numeric: true },
  { label: '|pH − pK″|', numeric: true },
  { label: 'β (mM/pH)', numeric: true },
  { label: 'Overlap (β mM/pH)' },
  { label: 'Set pH at make-up T', numeric: true },
  { label: 'Well pH (drift)', numeric: true },
  { label: '' },
];

export function SeriesResults({ design, choices, onOverride }: SeriesResultsProps) {
  const [expanded, setExpanded] = useState<Set<string>>(new Set());
  const toggle = (key: string) =>
    setExpanded((s) => {
      const next = new Set(s);
      if (!next.delete(key)) next.add(key);
      return next;
    });
  const base = choices ?? design;
  return (
    <div className="overflow-x-auto rounded border border-line bg-surface">
      <table aria-label="Buffer series design" className="w-full border-collapse">
        <caption className="sr-only">
          pK″ and set pH at {design.assayTemperatureC} °C and {design.makeTemperatureC} °C
        </caption>
        <thead className="bg-canvas text-left text-sm text-ink-muted">
          <tr>
            {headers.map((h, i) => (
              <th
                key={h.label || i}
                scope="col"
                className={`border-b border-line px-2 py-1.5 font-semibold ${h.numeric ? 'text-right' : ''}`}
              >
                {h.label === 'pK″ at assay T'
                  ? `pK″ at ${design.assayTemperatureC} °C`
                  : h.label === 'Set pH at make-up T'
                    ? `Set pH at ${design.makeTemperatureC} °C`
                    : h.label || <span className="sr-only">Recipe</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {design.points.map((p) => {
            const key = phKey(p.pH);
            return (
              <PointRow
                key={key}
                point={p}
                choices={base.points.find((b) => phKey(b.pH) === key)}
                overridden={design.overridden.includes(key)}
                onOverride={onOverride}
                expanded={expanded.has(key)}
                onToggle={() => toggle(key)}
                columns={headers.length}
              />
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
