// The charts of a design: capacity across the series, and the titration curve of a chosen recipe.
import { useId, useState } from 'react';
import type { BufferSystem } from '@shared/chemistry';
import { phKey, type DesignedSeries, type SeriesRequest } from '@shared/schemas/buffer-series';
import { PhLegend } from '@/components/ui/ph-legend';
import { CapacityChart } from './capacity-chart';
import { TitrationChart } from './titration-chart';

export type SeriesChartsProps = {
  design: DesignedSeries;
  request: Pick<SeriesRequest, 'bufferConcMm' | 'targetIonicStrengthM' | 'method'>;
  library: readonly BufferSystem[];
};

export function SeriesCharts({ design, request, library }: SeriesChartsProps) {
  const selectId = useId();
  const recipes = design.points.flatMap((p) => [
    ...(p.recipe
      ? [
          {
            value: `${phKey(p.pH)}|main`,
            label: `pH ${phKey(p.pH)} · ${p.recipe.systemName}`,
            recipe: p.recipe,
          },
        ]
      : []),
    ...(p.overlap
      ? [
          {
            value: `${phKey(p.pH)}|overlap`,
            label: `pH ${phKey(p.pH)} · ${p.overlap.systemName} (overlap)`,
            recipe: p.overlap.recipe,
          },
        ]
      : []),
  ]);
  const [chosen, setChosen] = useState<string | null>(null);
  const selected = recipes.find((r) => r.value === chosen) ?? recipes[0];
  const pHs = design.points.map((p) => p.pH);
  return (
    <section aria-labelledby="charts-heading" className="space-y-3">
      <div className="flex items-end justify-between">
        <h2 id="charts-heading" className="text-lg">
          Charts
        </h2>
        <PhLegend min={Math.floor(Math.min(...pHs, 2))} max={Math.ceil(Math.max(...pHs, 10))} width={260} />
      </div>
      <div className="grid grid-cols-2 gap-4">
        <CapacityChart design={design} request={request} library={library} />
        <div>
          {selected ? (
            <>
              <div className="mb-1 flex items-center gap-2">
                <label htmlFor={selectId} className="text-sm font-semibold text-ink-muted">
                  Recipe
                </label>
                <select
                  id={selectId}
                  value={selected.value}
                  onChange={(e) => setChosen(e.target.value)}
                  className="h-8 rounded border border-line-strong bg-surface px-1.5"
                >
                  {recipes.map((r) => (
                    <option key={r.value} value={r.value}>
                      {r.label}
                    </option>
                  ))}
                </select>
              </div>
              <TitrationChart recipe={selected.recipe} library={library} />
            </>
          ) : (
            <p className="text-ink-muted">No recipe to titrate.</p>
          )}
        </div>
      </div>
    </section>
  );
}
