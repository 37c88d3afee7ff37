// The wells of one plate in a table (rate, window, blank, corrected value, activity, flags,
// exclusions, outliers); choosing a well shows its time course and, for editors, the window and
// exclusion controls.
import { useState } from 'react';
import type { StudyAnalysis } from '@shared/schemas/analysis';
import { DataTable } from '@/components/ui/data-table';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { useAnalysisEdits } from '../hooks/use-analysis-edits';
import { wellColumns, wellOrder, type WellTableRow } from './well-columns';
import { ReasonDialog } from './reason-dialog';
import { StaleNotice } from './stale-notice';
import { WellDetail } from './well-detail';

export type WellsPanelProps = {
  analysis: StudyAnalysis;
  editable: boolean;
  kinetic: boolean;
  plateId: string | null;
  well: string | null;
  onPick: (change: { plate?: string; well?: string | null }) => void;
  onReload: () => void;
  reloading: boolean;
};

/** "A6, B6 on Plate 1; D6 on Plate 2". */
function wellsByPlate(wells: { plateId: string; well: string }[], plateNames: Record<string, string>) {
  const groups = new Map<string, string[]>();
  for (const w of wells) groups.set(w.plateId, [...(groups.get(w.plateId) ?? []), w.well]);
  return [...groups]
    .map(([plateId, names]) => `${names.join(', ')} on ${plateNames[plateId] ?? 'a plate'}`)
    .join('; ');
}

type Pending =
  | { kind: 'exclude'; wells: { plateId: string; well: string }[]; what: string }
  | { kind: 'include'; exclusionId: string; well: string };

export function WellsPanel({
  analysis,
  editable,
  kinetic,
  plateId,
  well,
  onPick,
  onReload,
  reloading,
}: WellsPanelProps) {
  const { result } = analysis;
  const edits = useAnalysisEdits(analysis);
  const [pending, setPending] = useState<Pending | null>(null);
  const [dialogError, setDialogError] = useState<string | null>(null);
  const plates = result.qc.plates;
  const current = plates.find((p) => p.plateId === plateId) ?? plates[0];
  if (!current) return <Notice>This study has no plates yet.</Notice>;
  const variantNames = Object.fromEntries(result.profiles.map((p) => [p.variantId, p.name]));
  const plateNames = Object.fromEntries(plates.map((p) => [p.plateId, p.name]));
  const rows: WellTableRow[] = result.wells
    .filter((w) => w.plateId === current.plateId)
    .map((w) => ({ ...w, variantName: w.variantId ? (variantNames[w.variantId] ?? '—') : '—' }))
    .sort((a, b) => wellOrder(a.well) - wellOrder(b.well));
  const chosen = rows.find((r) => r.well === well) ?? null;
  const point = chosen
    ? result.wells.filter(
        (w) =>
          w.role === 'sample' &&
          w.variantId === chosen.variantId &&
          w.pH === chosen.pH &&
          w.buffer === chosen.buffer,
      )
    : [];

  const confirm = async (reason: string) => {
    if (!pending) return;
    setDialogError(null);
    try {
      if (pending.kind === 'exclude') await edits.excludeWells(pending.wells, reason);
      else await edits.include(pending.exclusionId, pending.well, reason);
      setPending(null);
    } catch (error) {
      setDialogError(error instanceof Error ? error.message : 'The change was not saved.');
    }
  };

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <label className="text-sm">
          <span className="mb-0.5 block text-ink-muted">Plate</span>
          <select
            value={current.plateId}
            onChange={(e) => onPick({ plate: e.target.value, well: null })}
            className="h-8 rounded border border-line-strong bg-surface px-2"
          >
            {plates.map((p) => (
              <option key={p.plateId} value={p.plateId}>
                {p.name}
                {p.hasRead ? '' : ' (no read yet)'}
              </option>
            ))}
          </select>
        </label>
        <p className="pb-1 text-sm text-ink-muted">
          Choose a well for its {kinetic ? 'time course, rate window' : 'numbers'} and exclusion.
        </p>
      </div>
      <DataTable
        data={rows}
        columns={wellColumns(result.units, result.flagText)}
        label={`Wells of ${current.name}`}
        search={{ label: 'Find a well', placeholder: 'B6, FR1-WT, blank…' }}
        getRowId={(r) => r.well}
        selectedRowId={chosen?.well ?? null}
        onRowClick={(r) => onPick({ well: r.well })}
        empty="This plate has no mapped wells."
      />
      {chosen && (
        <Dialog
          open
          width={kinetic ? 'lg' : 'md'}
          onClose={() => {
            edits.save.reset();
            onPick({ well: null });
          }}
          title={`Well ${chosen.well}`}
          description={`${current.name} · ${chosen.role === 'sample' ? chosen.variantName : chosen.role} · pH ${chosen.pH ?? '—'}`}
        >
          <div className="space-y-3">
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
            <WellDetail
              row={chosen}
              variantName={chosen.variantName}
              plateName={current.name}
              units={result.units}
              flagText={result.flagText}
              kinetic={kinetic}
              editable={editable}
              settings={analysis.settings}
              pointSize={point.filter((w) => !w.excluded).length}
              saving={edits.save.isPending}
              onSaveSettings={edits.saveSettings}
              onExclude={(scope) => {
                const wells = scope === 'well' ? [chosen] : point.filter((w) => !w.excluded);
                const what =
                  scope === 'well'
                    ? `well ${chosen.well} of ${current.name}`
                    : `every well of ${chosen.variantName} at pH ${chosen.pH}${chosen.buffer ? ` (${chosen.buffer})` : ''}: ${wellsByPlate(wells, plateNames)}`;
                setPending({
                  kind: 'exclude',
                  wells: wells.map((w) => ({ plateId: w.plateId, well: w.well })),
                  what,
                });
              }}
              onInclude={() =>
                chosen.exclusion &&
                setPending({ kind: 'include', exclusionId: chosen.exclusion.id, well: chosen.well })
              }
            />
          </div>
        </Dialog>
      )}
      {pending && (
        <ReasonDialog
          title={pending.kind === 'exclude' ? 'Exclude from the fit' : `Include ${pending.well} again`}
          confirmLabel={pending.kind === 'exclude' ? 'Exclude and refit' : 'Include and refit'}
          busy={edits.exclude.isPending || edits.lift.isPending}
          error={dialogError}
          onConfirm={(reason) => void confirm(reason)}
          onClose={() => {
            setPending(null);
            setDialogError(null);
          }}
        >
          {pending.kind === 'exclude' ? (
            <p>
              This leaves out {pending.what}. The wells stay in the data and can be included again, with a
              reason.
            </p>
          ) : (
            <p>{pending.well} goes back into its replicate mean and the fit.</p>
          )}
        </ReasonDialog>
      )}
    </div>
  );
}
