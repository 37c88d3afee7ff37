// Wells excluded from the fits, each with its reason, who excluded it and when (and, if lifted, why).
import type { ExclusionView } from '@shared/schemas/analysis';
import { formatDateTime } from '@/lib/format';

export type ExclusionsTableProps = { exclusions: ExclusionView[] };

const th = 'border-b border-line py-1 pr-2 font-semibold';

export function ExclusionsTable({ exclusions }: ExclusionsTableProps) {
  if (exclusions.length === 0) return <p className="text-ink-muted">No well was excluded.</p>;
  return (
    <table className="w-full border-collapse text-sm" aria-label="Excluded wells">
      <thead className="text-left text-ink-muted">
        <tr>
          <th className={th}>Well</th>
          <th className={th}>Reason</th>
          <th className={th}>By, when</th>
          <th className={th}>Status</th>
        </tr>
      </thead>
      <tbody>
        {exclusions.map((x) => (
          <tr key={x.id} className="border-b border-line align-top last:border-b-0">
            <td className="py-1 pr-2 whitespace-nowrap">
              {x.plateName} <span className="font-semibold">{x.well}</span>
            </td>
            <td className="py-1 pr-2">{x.reason}</td>
            <td className="py-1 pr-2">
              {x.createdBy}, {formatDateTime(x.createdAt)}
            </td>
            <td className="py-1">
              {x.liftedAt
                ? `lifted by ${x.liftedBy ?? '—'}, ${formatDateTime(x.liftedAt)}: ${x.liftReason ?? ''}`
                : 'excluded'}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
