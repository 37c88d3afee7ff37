// Save the designed series: a name, the team, and optionally a study to attach it to (an existing
// editable study of the team, or a new study created from the saved series next).
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import type { TeamRef } from '@shared/schemas/api-types';
import { seriesSaveSchema, type SeriesRequest } from '@shared/schemas/buffer-series';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useSaveSeries, type SeriesSave, type SeriesSaved } from '../api/save-series';

const saveFormSchema = seriesSaveSchema
  .pick({ teamId: true, name: true })
  .extend({ attach: z.enum(['none', 'study', 'new-study']), studyId: z.string() })
  .superRefine((v, ctx) => {
    if (v.attach === 'study' && !v.studyId) {
      ctx.addIssue({ code: 'custom', path: ['studyId'], message: 'Choose the study.' });
    }
  });

type Values = z.input<typeof saveFormSchema>;

export type StudyChoice = { id: string; name: string; teamId: string };

export type SaveSeriesDialogProps = {
  open: boolean;
  onClose: () => void;
  request: SeriesRequest;
  teams: TeamRef[];
  /** Editable studies (draft or returned) the series may be attached to. */
  studies: StudyChoice[];
  /** Opened from this study: attach to it by default. */
  forStudy?: StudyChoice;
  onSaved: (saved: SeriesSaved, attach: { kind: Values['attach']; studyId: string | null }) => void;
};

export function SaveSeriesDialog(props: SaveSeriesDialogProps) {
  const { open, onClose, request, teams, studies, forStudy } = props;
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values>({
    resolver: zodResolver(saveFormSchema),
    defaultValues: {
      name: '',
      teamId: forStudy?.teamId ?? (teams.length === 1 ? teams[0].id : ''),
      attach: forStudy ? 'study' : 'none',
      studyId: forStudy?.id ?? '',
    },
  });
  const { errors } = form.formState;
  const [teamId, attach] = useWatch({ control: form.control, name: ['teamId', 'attach'] });
  const save = useSaveSeries();
  const close = () => {
    setFormError(null);
    onClose();
  };
  const onSubmit = form.handleSubmit((v) => {
    setFormError(null);
    const body: SeriesSave = {
      teamId: v.teamId,
      name: v.name,
      input: request,
      studyId: v.attach === 'study' ? v.studyId : null,
    };
    save.mutate(body, {
      onSuccess: (saved) => props.onSaved(saved, { kind: v.attach, studyId: body.studyId }),
      onError: (error) =>
        setFormError(applyServerErrors(error, form.setError, ['name', 'teamId', 'studyId'])),
    });
  });
  const teamStudies = studies.filter((s) => s.teamId === teamId);
  return (
    <Dialog
      open={open}
      onClose={close}
      title="Save buffer series"
      description="Saved series are reused by studies and plate maps."
      footer={
        <>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" form="save-series-form" variant="primary" busy={save.isPending}>
            Save series
          </Button>
        </>
      }
    >
      <form id="save-series-form" onSubmit={onSubmit} noValidate className="space-y-4">
        {formError && <Notice tone="error">{formError}</Notice>}
        <TextField label="Series name" autoFocus error={errors.name?.message} {...form.register('name')} />
        {forStudy ? (
          <p>
            <input type="hidden" {...form.register('teamId')} />
            <span className="text-ink-muted">Team:</span>{' '}
            {teams.find((t) => t.id === forStudy.teamId)?.name ?? '—'}{' '}
            <span className="text-ink-muted">(the study’s team)</span>
          </p>
        ) : (
          <SelectField label="Team" error={errors.teamId?.message} {...form.register('teamId')}>
            <option value="">Choose a team…</option>
            {teams.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </SelectField>
        )}
        <fieldset>
          <legend className="mb-1 font-semibold">Attach to a study</legend>
          <div className="space-y-1">
            <label className="flex items-center gap-2">
              <input type="radio" value="none" className="accent-accent-700" {...form.register('attach')} />
              Not now
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" value="study" className="accent-accent-700" {...form.register('attach')} />
              An existing study of the team
            </label>
            {attach === 'study' && (
              <SelectField
                label="Study"
                className="ml-6"
                hint="Draft or returned studies only: the others are locked."
                error={errors.studyId?.message}
                {...form.register('studyId')}
              >
                <option value="">Choose a study…</option>
                {teamStudies.map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.name}
                  </option>
                ))}
              </SelectField>
            )}
            <label className="flex items-center gap-2">
              <input
                type="radio"
                value="new-study"
                className="accent-accent-700"
                {...form.register('attach')}
              />
              A new study created from this series
            </label>
          </div>
        </fieldset>
      </form>
    </Dialog>
  );
}
