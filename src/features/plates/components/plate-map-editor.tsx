// The plate map editor: brush and tools, the grid, the inspector, live checks and the legend.
// The working copy lives here (with undo); Save sends it with the version it started from, and a
// 409 offers to reload. Read-only for viewers and while the study is in review or approved.
import { useCallback, useMemo, useState } from 'react';
import { checkPlateMap, type MapCheck } from '@shared/plate-map/checks';
import type { PlateMap } from '@shared/plate-map/schema';
import type { PlateDetail } from '@shared/schemas/plates-types';
import { useToast } from '@/components/ui/toast';
import type { PlateStudyContext } from '../api/get-study-context';
import { useEditorKeys } from '../hooks/use-editor-keys';
import { useGridPointer } from '../hooks/use-grid-pointer';
import { useMapClipboard } from '../hooks/use-map-clipboard';
import { useMapHistory } from '../hooks/use-map-history';
import { useMapSave } from '../hooks/use-map-save';
import { useSelection } from '../hooks/use-selection';
import { useUnsavedGuard } from '../hooks/use-unsaved-guard';
import { brushPatch, defaultBrush, type Brush } from '../utils/brush';
import { clearWells, patchWells, type WellPatch } from '../utils/edit-map';
import { fillSeries, type FillSeriesInput } from '../utils/fill-series';
import { boundsOf } from '../utils/grid';
import { replicatePattern, type PatternInput } from '../utils/replicate-pattern';
import { describeTyped, readTyped } from '../utils/typed-value';
import { variantTags } from '../utils/variant-tags';
import { BrushBar, type Tool } from './brush-bar';
import { EditorDialogs, type DialogName } from './editor-dialogs';
import { EditorToolbar } from './editor-toolbar';
import { MapChecks } from './map-checks';
import { MapLegend } from './map-legend';
import { PlateGrid } from './plate-grid';
import { ReadOnlyNotice } from './read-only-notice';
import { WellInspector } from './well-inspector';

export type PlateMapEditorProps = { plate: PlateDetail; context: PlateStudyContext; canWrite: boolean };

const emptySet: ReadonlySet<string> = new Set();

export function PlateMapEditor({ plate, context, canWrite }: PlateMapEditorProps) {
  const format = plate.format;
  const toast = useToast();
  const history = useMapHistory(plate.map, plate.version);
  const selection = useSelection(format);
  const [brush, setBrush] = useState<Brush>(defaultBrush);
  const [tool, setTool] = useState<Tool>('select');
  const [highlight, setHighlight] = useState<{ key: string; wells: Set<string> } | null>(null);
  const [dialog, setDialog] = useState<DialogName | null>(null);
  const [typedError, setTypedError] = useState<string | null>(null);

  const readOnly = !canWrite || context.status === 'in_review' || context.status === 'approved';
  const { map } = history;
  const names = selection.names;

  const tags = useMemo(() => variantTags(context.variants, format === 384), [context.variants, format]);
  const fullTags = useMemo(() => variantTags(context.variants), [context.variants]);
  const variantNames = useMemo(
    () => Object.fromEntries(context.variants.map((v) => [v.id, v.name])),
    [context.variants],
  );
  const checks = useMemo(
    () => checkPlateMap(map, { format, variantNames, needsStandardCurve: context.needsStandardCurve }),
    [map, format, variantNames, context.needsStandardCurve],
  );
  const phRange = useMemo<[number, number]>(() => {
    const pHs = context.phPoints.map((p) => p.pH);
    return pHs.length ? [Math.floor(Math.min(...pHs)), Math.ceil(Math.max(...pHs))] : [2, 10];
  }, [context.phPoints]);

  const edit = useCallback(
    (next: PlateMap) => {
      if (!readOnly) history.edit(next);
    },
    [readOnly, history],
  );
  const patch = (p: WellPatch, wells: string[] = names) => edit(patchWells(map, wells, p));
  const applyBrush = (wells: string[] = names) => patch(brushPatch(brush), wells);
  const clear = () => edit(clearWells(map, names));

  const saving = useMapSave(plate.id, format, history, readOnly);
  const guard = useUnsavedGuard(history.dirty && !saving.saving);
  const pointer = useGridPointer(format, selection, (wells) => {
    if (tool === 'paint' && !readOnly) applyBrush(wells);
  });
  const clipboard = useMapClipboard({
    format,
    map,
    names,
    cursor: selection.cursor,
    readOnly,
    edit,
    clear,
    select: selection.selectNames,
  });

  const keys = useEditorKeys({
    readOnly,
    move: (dr, dc, extend) => {
      setTypedError(null);
      selection.move(dr, dc, extend);
    },
    patch: (p) => patch(p),
    commitTyped: (text) => {
      const result = readTyped(text, context.variants, context.phPoints);
      if (!result.ok) return setTypedError(result.message);
      setTypedError(null);
      patch(result.patch);
    },
    applyBrush: () => applyBrush(),
    clear,
    undo: history.undo,
    redo: history.redo,
    selectAll: selection.selectAll,
    save: saving.save,
    escape: () => {
      setHighlight(null);
      selection.selectRect(selection.cursor, selection.cursor);
    },
  });

  const onFill = (input: FillSeriesInput) => {
    const result = fillSeries(map, format, input);
    edit(result.map);
    toast.show(
      `Filled ${result.wells} wells with ${result.pointsPlaced} pH point(s)` +
        (result.pointsLeftOut ? `; ${result.pointsLeftOut} did not fit on the plate.` : '.'),
      result.pointsLeftOut ? 'warning' : 'success',
    );
  };
  const onPattern = (input: PatternInput) => {
    const result = replicatePattern(map, format, input);
    edit(result.map);
    const short = result.linesNeeded > result.linesAvailable;
    toast.show(
      `Laid out ${result.wells} wells` +
        (short ? `; ${result.linesNeeded - result.linesAvailable} line(s) did not fit.` : '.'),
      short ? 'warning' : 'success',
    );
  };
  const pickCheck = (check: MapCheck, key: string) => {
    if (highlight?.key === key) return setHighlight(null);
    setHighlight({ key, wells: new Set(check.wells) });
    selection.selectNames(check.wells);
  };
  const bounds = boundsOf(names, format);

  return (
    <div className="space-y-3">
      {readOnly && <ReadOnlyNotice status={context.status} canWrite={canWrite} />}
      {!readOnly && (
        <>
          <BrushBar
            tool={tool}
            onToolChange={setTool}
            brush={brush}
            onBrushChange={setBrush}
            variants={context.variants}
            phPoints={context.phPoints}
            onApply={() => applyBrush()}
          />
          <EditorToolbar
            canUndo={history.canUndo}
            canRedo={history.canRedo}
            dirty={history.dirty}
            saving={saving.saving}
            version={history.version}
            replicatesRequired={map.replicatesRequired}
            onUndo={history.undo}
            onRedo={history.redo}
            onCopy={clipboard.copyButton}
            onPaste={() => void clipboard.pasteButton()}
            onClear={clear}
            onFill={() => setDialog('fill')}
            onPattern={() => setDialog('pattern')}
            onApplyTemplate={() => setDialog('apply-template')}
            onSaveTemplate={() => setDialog('save-template')}
            onReplicatesRequired={(n) => edit({ ...map, replicatesRequired: n })}
            onSave={saving.save}
          />
        </>
      )}
      <div className="grid grid-cols-[auto_minmax(16rem,1fr)] items-start gap-4">
        <div>
          <PlateGrid
            format={format}
            map={map}
            selected={selection.set}
            cursor={selection.cursor}
            highlighted={highlight?.wells ?? emptySet}
            tags={tags}
            variantNames={variantNames}
            label={`Plate map of ${plate.name}`}
            onPointerStart={(hit, extend) => {
              setHighlight(null);
              pointer.onPointerStart(hit, extend);
            }}
            onPointerDrag={pointer.onPointerDrag}
            onPointerEnd={pointer.onPointerEnd}
            onKeyDown={keys.onKeyDown}
            onCopy={clipboard.onCopy}
            onCut={readOnly ? undefined : clipboard.onCut}
            onPaste={readOnly ? undefined : clipboard.onPaste}
          />
          <p role="status" className={`h-5 text-sm ${typedError ? 'text-danger-600' : 'text-ink'}`}>
            {typedError ??
              (keys.typed !== null
                ? `Typing ${describeTyped(keys.typed)} — Enter sets it on ${names.length} well(s), Esc cancels.`
                : '')}
          </p>
        </div>
        <div className="space-y-3">
          <WellInspector
            map={map}
            names={names}
            variants={context.variants}
            phPoints={context.phPoints}
            readOnly={readOnly}
            onPatch={(p) => patch(p)}
            onClear={clear}
          />
          <MapChecks checks={checks} activeCode={highlight?.key ?? null} onPick={pickCheck} />
        </div>
      </div>
      <MapLegend
        variants={context.variants}
        tags={fullTags}
        phRange={phRange}
        numbered={tags !== fullTags && Object.keys(tags).some((k) => tags[k] !== fullTags[k])}
      />
      <EditorDialogs
        open={dialog}
        onClose={() => setDialog(null)}
        format={format}
        map={map}
        context={context}
        start={bounds?.top ?? selection.cursor}
        selectionRows={bounds ? bounds.bottom.row - bounds.top.row + 1 : 1}
        selectionColumns={bounds ? bounds.bottom.column - bounds.top.column + 1 : 1}
        onFill={onFill}
        onPattern={onPattern}
        onApplyTemplate={(m, name) => {
          edit({ ...m });
          toast.show(`Template “${name}” applied. Undo brings the previous map back.`);
        }}
        stale={saving.stale}
        onReload={(keep) => void saving.reload(keep)}
        onKeepEditing={saving.keepEditing}
        guard={guard}
      />
    </div>
  );
}
