// The variants of an enzyme (parent first) with their preparations; writers add, edit and delete
// them here through dialogs.
import { useState } from 'react';
import type { EnzymeDetail, Preparation, VariantWithPreparations } from '@shared/schemas/records-types';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { useToast } from '@/components/ui/toast';
import { useDeletePreparation } from '../api/delete-preparation';
import { useDeleteVariant } from '../api/delete-variant';
import { PreparationFormDialog } from './preparation-form-dialog';
import { VariantCard } from './variant-card';
import { VariantFormDialog } from './variant-form-dialog';

type Editing =
  | { kind: 'variant'; variant?: VariantWithPreparations }
  | { kind: 'preparation'; variant: VariantWithPreparations; preparation?: Preparation }
  | { kind: 'delete-variant'; variant: VariantWithPreparations }
  | { kind: 'delete-preparation'; preparation: Preparation }
  | null;

export type EnzymeVariantsProps = { enzyme: EnzymeDetail; canEdit: boolean };

export function EnzymeVariants({ enzyme, canEdit }: EnzymeVariantsProps) {
  const toast = useToast();
  const [editing, setEditing] = useState<Editing>(null);
  const close = () => setEditing(null);
  const deleteVariant = useDeleteVariant();
  const deletePreparation = useDeletePreparation();
  const parentTaken = enzyme.variants.some((v) => v.isParent);
  const actions = canEdit
    ? {
        onEdit: (variant: VariantWithPreparations) => setEditing({ kind: 'variant', variant }),
        onDelete: (variant: VariantWithPreparations) => setEditing({ kind: 'delete-variant', variant }),
        onAddPreparation: (variant: VariantWithPreparations) => setEditing({ kind: 'preparation', variant }),
        onEditPreparation: (variant: VariantWithPreparations, preparation: Preparation) =>
          setEditing({ kind: 'preparation', variant, preparation }),
        onDeletePreparation: (preparation: Preparation) =>
          setEditing({ kind: 'delete-preparation', preparation }),
      }
    : undefined;

  return (
    <section aria-labelledby="variants-heading">
      <div className="mb-2 flex items-center justify-between">
        <h2 id="variants-heading" className="text-lg">
          Variants and preparations
        </h2>
        {canEdit && (
          <Button variant="primary" onClick={() => setEditing({ kind: 'variant' })}>
            Add variant
          </Button>
        )}
      </div>
      {enzyme.variants.length === 0 ? (
        <Notice>
          No variants yet.{' '}
          {canEdit
            ? 'Add the parent (wild type) first, then its variants.'
            : 'A scientist of the team adds them.'}
        </Notice>
      ) : (
        <div className="space-y-3">
          {enzyme.variants.map((v) => (
            <VariantCard key={v.id} variant={v} actions={actions} />
          ))}
        </div>
      )}

      <VariantFormDialog
        open={editing?.kind === 'variant'}
        onClose={close}
        enzymeId={enzyme.id}
        enzymeName={enzyme.name}
        variant={editing?.kind === 'variant' ? editing.variant : undefined}
        parentTaken={parentTaken}
        onSaved={(v) => toast.show(`Variant ${v.name} saved.`)}
      />
      {editing?.kind === 'preparation' && (
        <PreparationFormDialog
          open
          onClose={close}
          variantId={editing.variant.id}
          variantName={editing.variant.name}
          preparation={editing.preparation}
        />
      )}
      <ConfirmDialog
        open={editing?.kind === 'delete-variant'}
        title={editing?.kind === 'delete-variant' ? `Delete ${editing.variant.name}?` : ''}
        confirmLabel="Delete variant"
        busy={deleteVariant.isPending}
        error={deleteVariant.error?.message}
        onCancel={() => {
          deleteVariant.reset();
          close();
        }}
        onConfirm={() =>
          editing?.kind === 'delete-variant' &&
          deleteVariant.mutate(editing.variant.id, {
            onSuccess: () => {
              toast.show(`Variant ${editing.variant.name} deleted.`);
              close();
            },
          })
        }
      >
        <p>
          The variant and its preparations are removed. A variant that is part of a study cannot be deleted.
        </p>
      </ConfirmDialog>
      <ConfirmDialog
        open={editing?.kind === 'delete-preparation'}
        title={editing?.kind === 'delete-preparation' ? `Delete preparation ${editing.preparation.lot}?` : ''}
        confirmLabel="Delete preparation"
        busy={deletePreparation.isPending}
        error={deletePreparation.error?.message}
        onCancel={() => {
          deletePreparation.reset();
          close();
        }}
        onConfirm={() =>
          editing?.kind === 'delete-preparation' &&
          deletePreparation.mutate(editing.preparation.id, {
            onSuccess: () => {
              toast.show(`Preparation ${editing.preparation.lot} deleted.`);
              close();
            },
          })
        }
      >
        <p>The preparation record is removed; the audit log keeps what it held.</p>
      </ConfirmDialog>
    </section>
  );
}
