// Create a study (team, enzyme, variants with a reference, assay, buffer series, notes) or edit one
// (team and enzyme stay). The route supplies the choices: records come from other features.
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import type { TeamRef } from '@shared/schemas/api-types';
import type { StudyDetail, Variant } from '@shared/schemas/records-types';
import { studyCreateSchema } from '@shared/schemas/studies';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateStudy, type StudyCreated } from '../api/create-study';
import { useUpdateStudy } from '../api/update-study';
import { VariantPicker } from './variant-picker';

type Values = z.input<typeof studyCreateSchema>;
type Output = z.output<typeof studyCreateSchema>;

export type RecordOption = { id: string; name: string; teamId: string; hint?: string };

export type StudyFormProps = {
  study?: StudyDetail;
  teams: TeamRef[];
  enzymes: RecordOption[];
  assays: RecordOption[];
  series: RecordOption[];
  /** Variants of the chosen enzyme; undefined while they load. */
  variants: Variant[] | undefined;
  onEnzymeChange: (enzymeId: string) => void;
  defaults?: { teamId?: string; bufferSeriesId?: string };
  onSaved: (study: StudyCreated) => void;
  onCancel: () => void;
};

const fieldNames = [
  'teamId',
  'name',
  'enzymeId',
  'variantIds',
  'referenceVariantId',
  'assayId',
  'bufferSeriesId',
  'notes',
] as const;

const parentOrFirst = (variants: Variant[], included: string[]) =>
  variants.find((v) => v.isParent && included.includes(v.id))?.id ?? included[0] ?? '';

export function StudyForm(props: StudyFormProps) {
  const { study, teams, variants, onEnzymeChange, defaults = {} } = props;
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values, unknown, Output>({
    resolver: zodResolver(studyCreateSchema),
    defaultValues: {
      teamId: study?.teamId ?? defaults.teamId ?? (teams.length === 1 ? teams[0].id : ''),
      name: study?.name ?? '',
      enzymeId: study?.enzymeId ?? '',
      variantIds: study?.variants.map((v) => v.id) ?? [],
      referenceVariantId: study?.referenceVariantId ?? '',
      assayId: study?.assayId ?? '',
      bufferSeriesId: study?.bufferSeriesId ?? defaults.bufferSeriesId ?? null,
      notes: study?.notes ?? '',
    },
  });
  const { errors } = form.formState;
  const [teamId, enzymeId, variantIds] = useWatch({
    control: form.control,
    name: ['teamId', 'enzymeId', 'variantIds'],
  });
  const ofTeam = (options: RecordOption[]) => options.filter((o) => o.teamId === teamId);

  useEffect(() => onEnzymeChange(enzymeId), [enzymeId, onEnzymeChange]);
  // A new enzyme's variants: include them all, with the parent as the reference.
  useEffect(() => {
    if (study || !variants) return;
    const all = variants.map((v) => v.id);
    form.setValue('variantIds', all);
    form.setValue('referenceVariantId', parentOrFirst(variants, all));
  }, [variants, study, form]);

  const create = useCreateStudy({ onSuccess: props.onSaved });
  const update = useUpdateStudy({ onSuccess: props.onSaved });
  const onError = (error: unknown) => setFormError(applyServerErrors(error, form.setError, fieldNames));
  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    if (study) {
      const { teamId: _t, enzymeId: _e, ...change } = input;
      update.mutate({ id: study.id, change }, { onError });
    } else {
      create.mutate(input, { onError });
    }
  });
  const included = (variants ?? []).filter((v) => (variantIds ?? []).includes(v.id));

  return (
    <form onSubmit={onSubmit} noValidate className="max-w-3xl space-y-4" aria-label="Study">
      {formError && <Notice tone="error">{formError}</Notice>}
      <TextField label="Study name" error={errors.name?.message} {...form.register('name')} />
      <div className="grid grid-cols-2 gap-4">
        {study ? (
          <p>
            <span className="text-ink-muted">Team and enzyme:</span> {study.teamName} · {study.enzymeName}
          </p>
        ) : (
          <>
            <SelectField label="Team" error={errors.teamId?.message} {...form.register('teamId')}>
              <option value="">Choose a team…</option>
              {teams.map((t) => (
                <option key={t.id} value={t.id}>
                  {t.name}
                </option>
              ))}
            </SelectField>
            <SelectField label="Enzyme" error={errors.enzymeId?.message} {...form.register('enzymeId')}>
              <option value="">{teamId ? 'Choose an enzyme…' : 'Choose a team first'}</option>
              {ofTeam(props.enzymes).map((o) => (
                <option key={o.id} value={o.id}>
                  {o.name}
                </option>
              ))}
            </SelectField>
          </>
        )}
      </div>
      {enzymeId &&
        (variants === undefined ? (
          <Loading label="Loading the enzyme’s variants…" />
        ) : variants.length === 0 ? (
          <Notice tone="warning">
            This enzyme has no variants yet: add them on the enzyme’s page first.
          </Notice>
        ) : (
          <>
            <Controller
              control={form.control}
              name="variantIds"
              render={({ field }) => (
                <VariantPicker
                  variants={variants}
                  value={field.value ?? []}
                  onChange={(ids) => {
                    field.onChange(ids);
                    const reference = form.getValues('referenceVariantId');
                    if (!ids.includes(reference))
                      form.setValue('referenceVariantId', parentOrFirst(variants, ids));
                  }}
                  error={errors.variantIds?.message ?? errors.variantIds?.root?.message}
                />
              )}
            />
            <SelectField
              label="Reference variant"
              hint="Other variants are compared with it; usually the parent."
              error={errors.referenceVariantId?.message}
              {...form.register('referenceVariantId')}
            >
              {included.map((v) => (
                <option key={v.id} value={v.id}>
                  {v.name}
                  {v.isParent ? ' (parent)' : ''}
                </option>
              ))}
            </SelectField>
          </>
        ))}
      <div className="grid grid-cols-2 gap-4">
        <SelectField label="Assay" error={errors.assayId?.message} {...form.register('assayId')}>
          <option value="">{teamId ? 'Choose an assay…' : 'Choose a team first'}</option>
          {ofTeam(props.assays).map((o) => (
            <option key={o.id} value={o.id}>
              {o.name}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Buffer series"
          hint="Optional now; design one from the study’s Buffers tab."
          error={errors.bufferSeriesId?.message}
          {...form.register('bufferSeriesId', { setValueAs: (v: unknown) => (v ? String(v) : null) })}
        >
          <option value="">None yet</option>
          {ofTeam(props.series).map((o) => (
            <option key={o.id} value={o.id}>
              {o.name}
              {o.hint ? ` · ${o.hint}` : ''}
            </option>
          ))}
        </SelectField>
      </div>
      <TextAreaField
        label="Notes"
        hint="Optional."
        error={errors.notes?.message}
        {...form.register('notes')}
      />
      <div className="flex gap-2 border-t border-line pt-4">
        <Button type="submit" variant="primary" busy={create.isPending || update.isPending}>
          {study ? 'Save changes' : 'Create study'}
        </Button>
        <Button onClick={props.onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
