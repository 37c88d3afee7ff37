// The analysis settings: model per variant (automatic or a chosen one), the preparation that gives
// each variant's protein concentration, the read each plate uses, the enzyme volume per well and
// the reaction time of end-point reads, and the rate windows set. Saved with the version shown.
import { useState } from 'react';
import {
  analysisSettingsSchema,
  type StudyAnalysis,
  type StudyAnalysisSettings,
} from '@shared/schemas/analysis';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { usePreparations } from '../api/get-preparations';
import { useAnalysisEdits } from '../hooks/use-analysis-edits';
import { withEntry } from '../utils/settings-edit';
import { PlateReadRow, VariantSettingsRow } from './settings-fields';
import { StaleNotice } from './stale-notice';
import { WindowList } from './window-list';

export type SettingsPanelProps = {
  analysis: StudyAnalysis;
  enzymeId: string;
  editable: boolean;
  kinetic: boolean;
  onReload: () => void;
  reloading: boolean;
};

const numberText = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

export function SettingsPanel({
  analysis,
  enzymeId,
  editable,
  kinetic,
  onReload,
  reloading,
}: SettingsPanelProps) {
  const [draft, setDraft] = useState<StudyAnalysisSettings>(analysis.settings);
  const [volume, setVolume] = useState(numberText(analysis.settings.enzymeVolumeUl));
  const [minutes, setMinutes] = useState(numberText(analysis.settings.reactionTimeMin));
  const [error, setError] = useState<string | null>(null);
  const preparations = usePreparations(enzymeId);
  const edits = useAnalysisEdits(analysis);
  const { result } = analysis;
  const disabled = !editable;

  const save = () => {
    const toNumber = (s: string) => (s.trim() === '' ? null : Number(s));
    const next: StudyAnalysisSettings = {
      ...draft,
      enzymeVolumeUl: toNumber(volume),
      reactionTimeMin: toNumber(minutes),
    };
    const checked = analysisSettingsSchema.safeParse(next);
    if (!checked.success)
      return setError(checked.error.issues.map((i) => `${i.path.join(' ')}: ${i.message}`).join(' '));
    setError(null);
    edits.saveSettings(checked.data, 'Settings saved.');
  };

  return (
    <div className="max-w-5xl space-y-4">
      {!editable && (
        <p className="text-sm text-ink-muted">
          The settings are shown as they were used; they cannot be changed here now.
        </p>
      )}
      <table
        aria-label="Settings per variant"
        className="w-full border-collapse rounded border border-line bg-surface text-sm"
      >
        <thead className="bg-canvas text-left text-ink-muted">
          <tr>
            <th className="border-b border-line px-2 py-1 font-semibold">Variant</th>
            <th className="border-b border-line px-2 py-1 font-semibold">Model</th>
            <th className="border-b border-line px-2 py-1 font-semibold">
              Preparation (protein concentration)
            </th>
          </tr>
        </thead>
        <tbody>
          {result.profiles.map((p) => (
            <VariantSettingsRow
              key={p.variantId}
              name={p.name}
              model={draft.models?.[p.variantId] ?? 'auto'}
              preparation={draft.preparations?.[p.variantId] ?? ''}
              preparations={preparations.data?.[p.variantId]}
              disabled={disabled}
              onModel={(m) => setDraft((d) => withEntry(d, 'models', p.variantId, m))}
              onPreparation={(id) => setDraft((d) => withEntry(d, 'preparations', p.variantId, id))}
            />
          ))}
        </tbody>
      </table>
      <table
        aria-label="Read per plate"
        className="w-full border-collapse rounded border border-line bg-surface text-sm"
      >
        <thead className="bg-canvas text-left text-ink-muted">
          <tr>
            <th className="border-b border-line px-2 py-1 font-semibold">Plate</th>
            <th className="border-b border-line px-2 py-1 font-semibold">Read used</th>
          </tr>
        </thead>
        <tbody>
          {result.qc.plates.map((plate) => (
            <PlateReadRow
              key={plate.plateId}
              plateId={plate.plateId}
              name={plate.name}
              read={draft.plateReads?.[plate.plateId] ?? ''}
              kind={kinetic ? 'kinetic' : 'endpoint'}
              disabled={disabled}
              onRead={(id) => setDraft((d) => withEntry(d, 'plateReads', plate.plateId, id))}
            />
          ))}
        </tbody>
      </table>
      <div className="grid max-w-2xl grid-cols-2 gap-4">
        <TextField
          label="Enzyme volume per well (µL)"
          type="number"
          min={0}
          step="any"
          inputMode="decimal"
          value={volume}
          disabled={disabled}
          onChange={(e) => setVolume(e.target.value)}
          hint="With the preparation’s protein concentration, gives activity per mg of protein. Empty: not set."
        />
        <TextField
          label="Reaction time (min)"
          type="number"
          min={0}
          step="any"
          inputMode="decimal"
          value={minutes}
          disabled={disabled || kinetic}
          onChange={(e) => setMinutes(e.target.value)}
          hint={
            kinetic
              ? 'End-point reads only; this study’s reads are kinetic.'
              : 'End-point reads: product ÷ time gives a rate. Empty: not set.'
          }
        />
      </div>
      <p className="text-sm text-ink-muted">{result.units.note}</p>
      {error && <Notice tone="error">{error}</Notice>}
      {edits.stale && (
        <StaleNotice
          busy={reloading}
          onReload={() => {
            edits.save.reset();
            onReload();
          }}
        />
      )}
      {edits.save.error && !edits.stale && <Notice tone="error">{edits.save.error.message}</Notice>}
      {editable && (
        <Button variant="primary" busy={edits.save.isPending} onClick={save}>
          Save settings and refit
        </Button>
      )}
      <WindowList
        analysis={analysis}
        editable={editable}
        busy={edits.save.isPending}
        onSave={edits.saveSettings}
      />
    </div>
  );
}
