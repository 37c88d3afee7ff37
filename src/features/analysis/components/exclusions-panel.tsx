// Every exclusion of the study: which well, why, who and when; lifted ones with who lifted them,
// when and why. Editors can include an excluded well again (with a reason).
import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import type { ExclusionView, StudyAnalysis } from '@shared/schemas/analysis';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { formatDateTime } from '@/lib/format';
import { useAnalysisEdits } from '../hooks/use-analysis-edits';
import { ReasonDialog } from './reason-dialog';

export type ExclusionsPanelProps = {
  analysis: StudyAnalysis;
  editable: boolean;
  onShowWell: (plateId: string, well: string) => void;
};

const col = createColumnHelper<ExclusionView>();

export function ExclusionsPanel({ analysis, editable, onShowWell }: ExclusionsPanelProps) {
  const edits = useAnalysisEdits(analysis);
  const [lifting, setLifting] = useState<ExclusionView | null>(null);
  const [error, setError] = useState<string | null>(null);
  const columns = [
    col.accessor('well', {
      header: 'Well',
      cell: (c) => (
        <button
          type="button"
          className="font-semibold text-accent-700 hover:underline"
          onClick={() => onShowWell(c.row.original.plateId, c.row.original.well)}
        >
          {c.getValue()}
        </button>
      ),
    }),
    col.accessor('plateName', { header: 'Plate' }),
    col.accessor('reason', {
      header: 'Reason',
      cell: (c) => <span className="block max-w-md">{c.getValue()}</span>,
    }),
    col.accessor('createdBy', { header: 'By' }),
    col.accessor('createdAt', {
      header: 'When',
      cell: (c) => <span className="whitespace-nowrap tabular-nums">{formatDateTime(c.getValue())}</span>,
    }),
    col.accessor((e) => (e.liftedAt ? 'included again' : 'excluded'), {
      id: 'state',
      header: 'Now',
      cell: (c) => {
        const e = c.row.original;
        if (!e.liftedAt) {
          return editable ? (
            <Button size="sm" onClick={() => setLifting(e)}>
              Include again…
            </Button>
          ) : (
            <span className="font-semibold">excluded</span>
          );
        }
        return (
          <span className="block max-w-md text-sm">
            Included again by {e.liftedBy ?? 'someone'} on{' '}
            <span className="tabular-nums">{formatDateTime(e.liftedAt)}</span>: {e.liftReason}
          </span>
        );
      },
    }),
  ];
  const active = analysis.exclusions.filter((e) => !e.liftedAt).length;
  return (
    <section aria-labelledby="exclusions-title" className="space-y-2">
      <h3 id="exclusions-title" className="text-base">
        Exclusions{' '}
        <span className="font-normal text-ink-muted">
          ({active} in force, {analysis.exclusions.length - active} lifted)
        </span>
      </h3>
      <DataTable
        data={[...analysis.exclusions].sort(
          (a, b) => Number(Boolean(a.liftedAt)) - Number(Boolean(b.liftedAt)),
        )}
        columns={columns}
        label="Exclusions of this study"
        getRowId={(e) => e.id}
        empty="No well has been excluded."
      />
      <p className="text-sm text-ink-muted">
        Every exclusion and inclusion is kept in the audit log with its reason.
      </p>
      {lifting && (
        <ReasonDialog
          title={`Include ${lifting.well} again`}
          confirmLabel="Include and refit"
          busy={edits.lift.isPending}
          error={error}
          onClose={() => {
            setLifting(null);
            setError(null);
          }}
          onConfirm={(reason) =>
            void edits
              .include(lifting.id, lifting.well, reason)
              .then(() => setLifting(null))
              .catch((e: Error) => setError(e.message))
          }
        >
          <p>
            {lifting.well} of {lifting.plateName} was excluded by {lifting.createdBy}: “{lifting.reason}”. It
            goes back into its replicate mean and the fit.
          </p>
        </ReasonDialog>
      )}
    </section>
  );
}
