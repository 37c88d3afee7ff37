// The buffer series designer: inputs, the design point by point (with overrides), cautions,
// charts, and the printable recipe sheet. A new series is saved with a name and team; a saved one
// is updated against its version (409 when someone else changed it: offer to reload).
import { useEffect, useMemo, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { BufferSystem } from '@shared/chemistry';
import type { TeamRef } from '@shared/schemas/api-types';
import type { SeriesDetail, SeriesRequest } from '@shared/schemas/buffer-series';
import type { BufferSummary } from '@shared/schemas/buffers-types';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { useToast } from '@/components/ui/toast';
import { ApiError } from '@/lib/api-client';
import { useDeleteSeries } from '../api/delete-series';
import type { SeriesSaved } from '../api/save-series';
import { useUpdateSeries } from '../api/update-series';
import { useDesign } from '../hooks/use-design';
import { designerResolver } from '../utils/designer-resolver';
import {
  checkDesigner,
  defaultDesignerValues,
  fromRequest,
  type DesignerValues,
} from '../utils/designer-values';
import { phKey } from '@shared/schemas/buffer-series';
import { DesignerInputs } from './designer-inputs';
import { DesignerToolbar } from './designer-toolbar';
import { RecipeSheet } from './recipe-sheet';
import { SaveSeriesDialog, type StudyChoice } from './save-series-dialog';
import { SeriesCautions } from './series-cautions';
import { SeriesCharts } from './series-charts';
import { SeriesResults } from './series-results';

export type SeriesDesignerProps = {
  saved?: SeriesDetail;
  library: BufferSummary[];
  labSystems: BufferSystem[];
  teams: TeamRef[];
  studies: StudyChoice[];
  forStudy?: StudyChoice;
  canWrite: boolean;
  onSaved: (
    saved: SeriesSaved,
    attach: { kind: 'none' | 'study' | 'new-study'; studyId: string | null },
  ) => void;
  onDeleted: () => void;
  onReload: () => Promise<unknown>;
};

export function SeriesDesigner(props: SeriesDesignerProps) {
  const { saved, canWrite } = props;
  const toast = useToast();
  const form = useForm<DesignerValues, unknown, SeriesRequest>({
    resolver: designerResolver,
    mode: 'onChange',
    defaultValues: saved ? fromRequest(saved.input) : defaultDesignerValues(),
  });
  const [overrides, setOverrides] = useState<Record<string, string>>(saved?.input.overrides ?? {});
  const [saving, setSaving] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const [stale, setStale] = useState<string | null>(null);
  const values = useWatch({ control: form.control }) as DesignerValues;
  const checked = useMemo(() => checkDesigner(values), [values]);
  const request = useMemo<SeriesRequest | null>(() => {
    if (!checked.ok) return null;
    const keys = new Set(checked.request.pHPoints.map(phKey));
    const kept = Object.fromEntries(Object.entries(overrides).filter(([k]) => keys.has(k)));
    return { ...checked.request, overrides: kept };
  }, [checked, overrides]);
  const state = useDesign(request, saved);
  const locked = Boolean(saved?.usedBy.some((s) => s.status === 'in_review' || s.status === 'approved'));
  const editable = canWrite && !locked;

  // A saved series that changed on the server (our own save, or a reload): start from it again.
  const savedVersion = saved?.version;
  useEffect(() => {
    if (!saved) return;
    form.reset(fromRequest(saved.input));
    setOverrides(saved.input.overrides);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- only when the saved version changes
  }, [savedVersion]);

  const update = useUpdateSeries({
    onSuccess: () => {
      setStale(null);
      toast.show('Series saved.');
    },
  });
  const remove = useDeleteSeries({ onSuccess: props.onDeleted });
  const onOverride = (key: string, systemId: string | null) =>
    setOverrides((o) => {
      const next = { ...o };
      if (systemId) next[key] = systemId;
      else delete next[key];
      return next;
    });
  const saveChanges = form.handleSubmit(() => {
    if (!saved || !request) return;
    update.mutate(
      { id: saved.id, change: { input: request, version: saved.version } },
      {
        onError: (error) =>
          setStale(error instanceof ApiError && error.code === 'stale_version' ? error.message : null),
      },
    );
  });
  const openSave = form.handleSubmit(() => setSaving(true));
  const design = state.design;

  return (
    <FormProvider {...form}>
      <div className="print:hidden">
        <DesignerToolbar
          saved={saved}
          canWrite={canWrite}
          locked={locked}
          valid={checked.ok}
          changed={state.changed}
          pending={state.pending}
          hasDesign={Boolean(design)}
          saving={update.isPending}
          onSave={() => void openSave()}
          onSaveChanges={() => void saveChanges()}
          onDelete={() => setDeleting(true)}
        />
        {locked && (
          <Notice tone="info" className="mb-3">
            This series is used by a study in review or approved (
            {saved?.usedBy.map((s) => s.name).join(', ')}): it is frozen with it. Design a new series to
            change anything.
          </Notice>
        )}
        {stale && (
          <Notice tone="warning" title="Not saved" className="mb-3">
            <p>{stale}</p>
            <Button
              size="sm"
              className="mt-1"
              onClick={() => void props.onReload().then(() => setStale(null))}
            >
              Reload the saved version
            </Button>
          </Notice>
        )}
        {update.error && !stale && (
          <Notice tone="error" className="mb-3">
            {update.error.message}
          </Notice>
        )}
        <form onSubmit={(e) => e.preventDefault()} noValidate>
          <DesignerInputs library={props.library} disabled={!editable && Boolean(saved)} />
        </form>
        <div className="mt-5 space-y-5">
          {state.error && (
            <Notice tone="error" title="The series could not be designed">
              {state.error.message}
            </Notice>
          )}
          {design && (
            <>
              <section aria-labelledby="design-heading">
                <h2 id="design-heading" className="mb-2 text-lg">
                  Design: {design.points.length} pH points at {design.assayTemperatureC} °C
                  {design.ionicStrengthRange &&
                    `, I ${design.ionicStrengthRange[0].toFixed(3)}–${design.ionicStrengthRange[1].toFixed(3)} M`}
                </h2>
                <SeriesResults
                  design={design}
                  choices={state.choices}
                  onOverride={editable || !saved ? onOverride : undefined}
                />
              </section>
              <SeriesCautions design={design} />
              {state.request && (
                <SeriesCharts design={design} request={state.request} library={props.labSystems} />
              )}
            </>
          )}
        </div>
      </div>
      {design && state.request && (
        <RecipeSheet
          name={saved?.name ?? 'Unsaved buffer series'}
          design={design}
          request={state.request}
          version={saved?.version}
        />
      )}
      {saving && request && (
        <SaveSeriesDialog
          open
          onClose={() => setSaving(false)}
          request={request}
          teams={props.teams}
          studies={props.studies}
          forStudy={props.forStudy}
          onSaved={(s, attach) => {
            setSaving(false);
            props.onSaved(s, attach);
          }}
        />
      )}
      {saved && (
        <ConfirmDialog
          open={deleting}
          title={`Delete ${saved.name}?`}
          confirmLabel="Delete series"
          busy={remove.isPending}
          error={remove.error?.message}
          onCancel={() => {
            remove.reset();
            setDeleting(false);
          }}
          onConfirm={() => remove.mutate(saved.id)}
        >
          <p>The saved series and its recipes are removed. A series used by a study cannot be deleted.</p>
        </ConfirmDialog>
      )}
    </FormProvider>
  );
}
