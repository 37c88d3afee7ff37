import type { Preparation } from '@shared/schemas/records-types';
import { Button } from '@/components/ui/button';
import { formatFixed } from '@/components/ui/numbers';

export type PreparationsTableProps = {
  variantName: string;
  preparations: Preparation[];
  onEdit?: (preparation: Preparation) => void;
  onDelete?: (preparation: Preparation) => void;
};

const th = 'border-b border-line px-3 py-1 font-semibold';

export function PreparationsTable({ variantName, preparations, onEdit, onDelete }: PreparationsTableProps) {
  if (preparations.length === 0) {
    return <p className="px-3 py-2 text-sm text-ink-muted">No preparations of {variantName} yet.</p>;
  }
  const editable = Boolean(onEdit || onDelete);
  return (
    <table aria-label={`Preparations of ${variantName}`} className="w-full border-collapse">
      <thead className="bg-canvas text-left text-sm text-ink-muted">
        <tr>
          <th scope="col" className={th}>
            Lot
          </th>
          <th scope="col" className={`${th} text-right`}>
            Protein (mg/mL)
          </th>
          <th scope="col" className={`${th} text-right`}>
            Prepared on
          </th>
          <th scope="col" className={th}>
            Storage buffer
          </th>
          <th scope="col" className={th}>
            Notes
          </th>
          {editable && (
            <th scope="col" className={th}>
              <span className="sr-only">Actions</span>
            </th>
          )}
        </tr>
      </thead>
      <tbody>
        {preparations.map((p) => (
          <tr key={p.id} className="border-b border-line last:border-b-0">
            <td className="px-3 py-1 font-mono text-sm">{p.lot}</td>
            <td className="num px-3 py-1">{formatFixed(p.proteinMgPerMl, 2)}</td>
            <td className="num px-3 py-1">{p.preparedOn}</td>
            <td className="px-3 py-1">{p.storageBuffer || '—'}</td>
            <td className="px-3 py-1 text-ink-muted">{p.notes || '—'}</td>
            {editable && (
              <td className="px-3 py-1 text-right whitespace-nowrap">
                {onEdit && (
                  <Button size="sm" variant="ghost" onClick={() => onEdit(p)}>
                    Edit<span className="sr-only"> preparation {p.lot}</span>
                  </Button>
                )}
                {onDelete && (
                  <Button size="sm" variant="ghost" onClick={() => onDelete(p)}>
                    Delete<span className="sr-only"> preparation {p.lot}</span>
                  </Button>
                )}
              </td>
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
