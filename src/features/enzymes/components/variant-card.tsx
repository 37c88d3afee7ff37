import type { Preparation, VariantWithPreparations } from '@shared/schemas/records-types';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { MutationList } from './mutation-list';
import { PreparationsTable } from './preparations-table';

export type VariantActions = {
  onEdit: (variant: VariantWithPreparations) => void;
  onDelete: (variant: VariantWithPreparations) => void;
  onAddPreparation: (variant: VariantWithPreparations) => void;
  onEditPreparation: (variant: VariantWithPreparations, preparation: Preparation) => void;
  onDeletePreparation: (preparation: Preparation) => void;
};

export type VariantCardProps = { variant: VariantWithPreparations; actions?: VariantActions };

export function VariantCard({ variant, actions }: VariantCardProps) {
  return (
    <section aria-label={`Variant ${variant.name}`} className="rounded border border-line bg-surface">
      <div className="flex items-start justify-between gap-4 border-b border-line px-3 py-2">
        <div className="min-w-0">
          <h3 className="flex items-center gap-2 text-base">
            {variant.name}
            {variant.isParent && <Badge tone="accent">Parent</Badge>}
          </h3>
          <p className="mt-0.5 flex flex-wrap items-center gap-2 text-sm">
            <span className="text-ink-muted">Mutations:</span>
            <MutationList mutations={variant.mutations} isParent={variant.isParent} />
          </p>
          {variant.notes && <p className="mt-0.5 text-sm text-ink-muted">{variant.notes}</p>}
        </div>
        {actions && (
          <div className="flex shrink-0 gap-1">
            <Button size="sm" onClick={() => actions.onAddPreparation(variant)}>
              Add preparation<span className="sr-only"> of {variant.name}</span>
            </Button>
            <Button size="sm" variant="ghost" onClick={() => actions.onEdit(variant)}>
              Edit<span className="sr-only"> {variant.name}</span>
            </Button>
            <Button size="sm" variant="ghost" onClick={() => actions.onDelete(variant)}>
              Delete<span className="sr-only"> {variant.name}</span>
            </Button>
          </div>
        )}
      </div>
      <PreparationsTable
        variantName={variant.name}
        preparations={variant.preparations}
        onEdit={actions ? (p) => actions.onEditPreparation(variant, p) : undefined}
        onDelete={actions?.onDeletePreparation}
      />
    </section>
  );
}
