import { createColumnHelper } from '@tanstack/react-table';
import { Badge } from '@/components/ui/badge';
import { modelShort, modelWords } from '../utils/models';
import type { EstimateCell, ParameterRow } from '../utils/parameter-rows';
import { EstimateText } from './estimate-text';

const col = createColumnHelper<ParameterRow>();
const sortValue = (c: EstimateCell | null) => c?.value ?? Number.NEGATIVE_INFINITY;
const ph = { decimals: 2 } as const;

export function parameterColumns(activityUnit: string) {
  const estimate = (id: keyof ParameterRow & string, header: string, style: { decimals: number } | 'auto') =>
    col.accessor((r) => sortValue(r[id] as EstimateCell | null), {
      id,
      header,
      meta: { numeric: true },
      cell: (c) => <EstimateText cell={c.row.original[id] as EstimateCell | null} style={style} />,
    });
  return [
    col.accessor('name', {
      header: 'Variant',
      cell: (c) => (
        <span className="flex flex-wrap items-center gap-1">
          <span className="font-semibold">{c.getValue()}</span>
          {c.row.original.isReference && <Badge tone="accent">Reference</Badge>}
          {c.row.original.isParent && !c.row.original.isReference && <Badge>Parent</Badge>}
        </span>
      ),
    }),
    col.accessor((r) => r.model ?? '', {
      id: 'model',
      header: 'Model',
      cell: (c) => {
        const r = c.row.original;
        if (!r.model) return <span className="text-danger-600">{r.error ?? 'not fitted'}</span>;
        const auto = r.requested === 'auto' || !r.requested;
        return (
          <span
            className="text-sm whitespace-nowrap"
            title={`${modelWords[r.model]}; ${auto ? 'chosen by the data (nested F-tests, AICc)' : 'chosen in the settings'}`}
          >
            {modelShort[r.model]}
            <span className="ml-1 text-xs text-ink-muted">{auto ? 'auto' : 'set'}</span>
          </span>
        );
      },
    }),
    col.accessor((r) => r.n ?? 0, { id: 'n', header: 'n', meta: { numeric: true } }),
    estimate('V', `V (${activityUnit})`, 'auto'),
    estimate('pKa1', 'apparent pKa1', ph),
    estimate('pKa2', 'apparent pKa2', ph),
    estimate('optimum', 'Optimum pH', ph),
    estimate('low', 'Half-activity low', ph),
    estimate('high', 'Half-activity high', ph),
    estimate('width', 'Width (pH units)', ph),
    col.accessor((r) => r.flags.length, {
      id: 'flags',
      header: 'Flags',
      cell: (c) =>
        c.row.original.flags.length === 0 ? (
          <span className="text-ink-faint">none</span>
        ) : (
          <ul className="max-w-64 min-w-40 space-y-0.5 text-xs text-warn-800">
            {c.row.original.flags.map((f) => (
              <li key={f.code}>{f.message}</li>
            ))}
          </ul>
        ),
    }),
  ];
}
