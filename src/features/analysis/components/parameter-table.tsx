// Every variant's fitted parameters side by side: V, the apparent pKa values, the optimum and the
// half-activity window, each over its interval; the model, n and flags; the reference marked.
import type { VariantProfile } from '@shared/analysis';
import { DataTable } from '@/components/ui/data-table';
import { intervalMarks } from '@/lib/intervals';
import { parameterRows } from '../utils/parameter-rows';
import { parameterColumns } from './parameter-columns';

export type ParameterTableProps = {
  profiles: VariantProfile[];
  activityUnit: string;
  bootstrapCurrent: boolean;
  selectedVariantId: string | null;
  onSelect: (variantId: string) => void;
};

export function ParameterTable({
  profiles,
  activityUnit,
  bootstrapCurrent,
  selectedVariantId,
  onSelect,
}: ParameterTableProps) {
  const rows = parameterRows(profiles, bootstrapCurrent);
  const kinds = new Set(
    rows.flatMap((r) => [r.V, r.pKa1, r.pKa2, r.optimum, r.low, r.high, r.width].map((c) => c?.kind)),
  );
  return (
    <section aria-labelledby="parameters-title">
      <h3 id="parameters-title" className="mb-1 text-base">
        Fitted parameters
      </h3>
      <DataTable
        data={rows}
        columns={parameterColumns(activityUnit)}
        label="Fitted parameters of every variant"
        getRowId={(r) => r.variantId}
        selectedRowId={selectedVariantId}
        onRowClick={(r) => onSelect(r.variantId)}
        empty="No variant has a profile yet: import reads for the plates."
      />
      <p className="mt-1 text-sm text-ink-muted">
        Each value sits over its 95 % interval:{' '}
        {(['bootstrap', 'profile', 't'] as const)
          .filter((k) => kinds.has(k))
          .map((k) => `${intervalMarks[k].mark} = ${intervalMarks[k].words}`)
          .join('; ')}
        .{' '}
        {bootstrapCurrent
          ? 'Bootstrap intervals are current and shown where they exist.'
          : 'No current bootstrap: run one for resampling intervals.'}{' '}
        The pKa values are apparent (macroscopic) constants of the active form.
      </p>
    </section>
  );
}
