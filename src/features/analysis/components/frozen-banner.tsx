// Approved studies show the result stored at approval. "Recompute and compare" runs the analysis
// again from the stored inputs (storing nothing) and shows any difference.
import { useState } from 'react';
import type { StudyAnalysis } from '@shared/schemas/analysis';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { formatSig } from '@/components/ui/numbers';
import { formatDateTime } from '@/lib/format';
import { useRecomputeAnalysis, type RecomputeComparison } from '../api/recompute';

export type FrozenBannerProps = { analysis: StudyAnalysis; readOnlyReason: string | null };

export function FrozenBanner({ analysis, readOnlyReason }: FrozenBannerProps) {
  const recompute = useRecomputeAnalysis();
  const [open, setOpen] = useState(false);
  return (
    <Notice title="Read-only and frozen: the result stored at approval">
      <p>
        {readOnlyReason} These numbers were computed on {formatDateTime(analysis.computedAt)} with engine{' '}
        {analysis.result.engineVersion} and are kept as approved, even if the engine changes later.
      </p>
      <Button
        size="sm"
        className="mt-1"
        busy={recompute.isPending}
        onClick={() => recompute.mutate(analysis.studyId, { onSuccess: () => setOpen(true) })}
      >
        Recompute and compare
      </Button>
      {recompute.error && <p className="mt-1 text-danger-600">{recompute.error.message}</p>}
      {open && recompute.data && (
        <ComparisonDialog comparison={recompute.data} onClose={() => setOpen(false)} />
      )}
    </Notice>
  );
}

const LIMIT = 1e-9;

function ComparisonDialog({
  comparison: c,
  onClose,
}: {
  comparison: RecomputeComparison;
  onClose: () => void;
}) {
  const rows = c.differences.flatMap((d) =>
    Object.entries(d.parameters).map(([name, p]) => ({ variant: d.name, name, ...p, model: d.model })),
  );
  const changed = rows.filter((r) =>
    r.relativeDifference === null ? r.stored !== r.recomputed : r.relativeDifference > LIMIT,
  );
  const modelChanged = c.differences.filter((d) => d.model.stored !== d.model.recomputed);
  return (
    <Dialog
      open
      onClose={onClose}
      title="Recomputed from the stored inputs"
      width="lg"
      footer={<Button onClick={onClose}>Close</Button>}
    >
      <div className="space-y-3">
        <p>
          Stored: engine {c.stored?.engineVersion ?? '—'}, inputs{' '}
          <code className="font-mono text-xs">{c.stored?.inputHash.slice(0, 12) ?? '—'}</code>. Recomputed:
          engine {c.recomputed.engineVersion}, inputs{' '}
          <code className="font-mono text-xs">{c.recomputed.inputHash.slice(0, 12)}</code>.{' '}
          {c.sameInputs
            ? 'The inputs are the same.'
            : 'The inputs differ from the stored ones (data or settings changed since).'}
        </p>
        <Notice tone={changed.length || modelChanged.length ? 'warning' : 'success'}>
          {changed.length === 0 && modelChanged.length === 0
            ? 'Every parameter agrees within a relative difference of 10⁻⁹, and every model is the same.'
            : `${changed.length} parameter ${changed.length === 1 ? 'value differs' : 'values differ'}; ${modelChanged.length} ${modelChanged.length === 1 ? 'model changed' : 'models changed'}.`}
        </Notice>
        <table aria-label="Stored and recomputed parameters" className="w-full border-collapse text-sm">
          <thead className="bg-canvas text-left text-ink-muted">
            <tr>
              <th className="border-b border-line px-2 py-1">Variant</th>
              <th className="border-b border-line px-2 py-1">Parameter</th>
              <th className="border-b border-line px-2 py-1 text-right">Stored</th>
              <th className="border-b border-line px-2 py-1 text-right">Recomputed</th>
              <th className="border-b border-line px-2 py-1 text-right">Relative difference</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={`${r.variant}-${r.name}`}>
                <td className="px-2 py-0.5">{r.variant}</td>
                <td className="px-2 py-0.5">{r.name}</td>
                <td className="num px-2 py-0.5">{formatSig(r.stored, 6)}</td>
                <td className="num px-2 py-0.5">{formatSig(r.recomputed, 6)}</td>
                <td className="num px-2 py-0.5">
                  {r.relativeDifference === null
                    ? '—'
                    : r.relativeDifference === 0
                      ? '0'
                      : r.relativeDifference.toExponential(1)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </Dialog>
  );
}
