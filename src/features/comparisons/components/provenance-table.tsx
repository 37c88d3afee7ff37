// Where each profile's numbers come from: the fit's engine version and input hash, when it was
// computed, and who approved the study when.
import type { ComparisonView } from '@shared/schemas/comparisons';
import { formatDateTime } from '@/lib/format';

export type ProvenanceTableProps = { view: ComparisonView; open?: boolean };

export function ProvenanceTable({ view, open }: ProvenanceTableProps) {
  const rows = view.result.rows;
  return (
    <details open={open} className="rounded border border-line bg-surface p-3">
      <summary className="cursor-pointer font-semibold">Provenance of the fits</summary>
      <table className="mt-2 w-full border-collapse text-sm" aria-label="Provenance of the fits">
        <thead className="text-left text-ink-muted">
          <tr>
            <th className="border-b border-line py-1 pr-3 font-semibold">Profile</th>
            <th className="border-b border-line py-1 pr-3 font-semibold">Engine</th>
            <th className="border-b border-line py-1 pr-3 font-semibold">Input hash (SHA-256)</th>
            <th className="border-b border-line py-1 pr-3 font-semibold">Computed</th>
            <th className="border-b border-line py-1 font-semibold">Approved</th>
          </tr>
        </thead>
        <tbody>
          {view.provenance.map((p) => {
            const row = rows.find((r) => r.key === p.key);
            return (
              <tr key={p.key} className="border-b border-line align-top last:border-b-0">
                <td className="py-1 pr-3">{row ? `${row.variantName} — ${row.studyName}` : p.key}</td>
                <td className="py-1 pr-3">{p.engineVersion}</td>
                <td className="py-1 pr-3 font-mono text-xs break-all">{p.inputHash}</td>
                <td className="py-1 pr-3 whitespace-nowrap">{formatDateTime(p.computedAt)}</td>
                <td className="py-1">
                  {p.approvedAt ? `${p.approvedBy ?? '—'}, ${formatDateTime(p.approvedAt)}` : 'not approved'}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </details>
  );
}
