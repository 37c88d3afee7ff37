// Create or edit an assay. Fields appear as they apply (emission for fluorescence, ε and its unit
// for an extinction coefficient, a stop solution for end-point reads); fields that are hidden are
// unregistered, so the shared schema's defaults (null, '') are what is sent for them.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import type { TeamRef } from '@shared/schemas/api-types';
import { assayCreateSchema } from '@shared/schemas/assays';
import type { Assay } from '@shared/schemas/records-types';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateAssay } from '../api/create-assay';
import { useUpdateAssay } from '../api/update-assay';
import {
  IdentitySection,
  QuantitationSection,
  ReadingSection,
  SubstrateSection,
} from './assay-form-sections';

export type AssayFormValues = z.input<typeof assayCreateSchema>;
type Output = z.output<typeof assayCreateSchema>;

export type AssayFormProps = {
  teams: TeamRef[];
  assay?: Assay;
  onSaved: (assay: Assay) => void;
  onCancel: () => void;
};

const fieldNames = [
  'teamId',
  'name',
  'substrate',
  'substrateMm',
  'kmMm',
  'substrateRegime',
  'readMode',
  'detection',
  'wavelengthNm',
  'emissionNm',
  'quantitation',
  'extinctionCoefficient',
  'extinctionUnit',
  'pathLengthCm',
  'wellVolumeUl',
  'temperatureC',
  'stopSolution',
  'chromophorePka',
  'notes',
] as const;

function initialValues(teams: TeamRef[], assay?: Assay): AssayFormValues {
  if (assay) {
    const { id: _id, createdAt: _c, updatedAt: _u, createdBy: _b, ...fields } = assay;
    return fields;
  }
  return {
    teamId: teams.length === 1 ? teams[0].id : '',
    name: '',
    substrate: '',
    substrateMm: Number.NaN,
    kmMm: null,
    substrateRegime: 'unknown',
    readMode: 'kinetic',
    detection: 'absorbance',
    wavelengthNm: 405,
    emissionNm: null,
    quantitation: 'extinction',
    extinctionCoefficient: null,
    extinctionUnit: 'M-1cm-1',
    pathLengthCm: null,
    wellVolumeUl: 200,
    temperatureC: 37,
    stopSolution: '',
    chromophorePka: null,
    notes: '',
  };
}

export function AssayForm({ teams, assay, onSaved, onCancel }: AssayFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<AssayFormValues, unknown, Output>({
    resolver: zodResolver(assayCreateSchema),
    defaultValues: initialValues(teams, assay),
    shouldUnregister: true,
  });
  const create = useCreateAssay({ onSuccess: onSaved });
  const update = useUpdateAssay({ onSuccess: onSaved });
  const onError = (error: unknown) => setFormError(applyServerErrors(error, form.setError, fieldNames));
  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    if (assay) {
      const { teamId: _team, ...change } = input;
      update.mutate({ id: assay.id, change }, { onError });
    } else {
      create.mutate(input, { onError });
    }
  });
  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="max-w-4xl space-y-6" aria-label="Assay">
        {formError && <Notice tone="error">{formError}</Notice>}
        <IdentitySection teams={teams} editing={Boolean(assay)} />
        <SubstrateSection />
        <ReadingSection />
        <QuantitationSection />
        <div className="flex gap-2 border-t border-line pt-4">
          <Button type="submit" variant="primary" busy={create.isPending || update.isPending}>
            {assay ? 'Save changes' : 'Create assay'}
          </Button>
          <Button onClick={onCancel}>Cancel</Button>
        </div>
      </form>
    </FormProvider>
  );
}
