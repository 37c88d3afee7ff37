// The plate map editor: brush and tools, the grid, the inspector, live checks and the legend.
// The working copy lives here (with undo); Save sends it with the version it started from, and a
// 409 offers to reload. Read-only for viewers and while the study is in review or approved.
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useMemo, useRef, useState } from 'react';
import { checkPlateMap, type MapCheck } from '@shared/plate-map/checks';
import type { PlateMap } from '@shared/plate-map/schema';
import type { PlateDetail } from '@shared/schemas/plates-types';
import { useToast } from '@/components/ui/toast';
import { ApiError } from '@/lib/api-client';
import { getPlateQueryOptions } from '../api/get-plate';
import type { PlateStudyContext } from '../api/get-study-context';
import { useSavePlateMap } from '../api/save-plate-map';
import { useEditorKeys } from '../hooks/use-editor-keys';
import { useMapHistory } from '../hooks/use-map-history';
import { useSelection } from '../hooks/use-selection';
import { useUnsavedGuard } from '../hooks/use-unsaved-guard';
import { brushPatch, defaultBrush, type Brush } from '../utils/brush';
import { clipText, copyWells, copyWholeMap, parseClip, pasteClip, type Clip } from '../utils/clipboard';
import { clearWells, patchWells, type WellPatch } from '../utils/edit-map';
import { fillSeries, type FillSeriesInput } from '../utils/fill-series';
import { boundsOf, rectNames, type Cell } from '../utils/grid';
import { replicatePattern, type PatternInput } from '../utils/replicate-pattern';
import { describeTyped, readTyped } from '../utils/typed-value';
import { variantTags } from '../utils/variant-tags';
import { BrushBar, type Tool } from './brush-bar';
import { EditorDialogs, type DialogName } from './editor-dialogs';
import { EditorToolbar } from './editor-toolbar';
import { MapChecks } from './map-checks';
import { MapLegend } from './map-legend';
import { PlateGrid, type GridHit } from './plate-grid';
import { ReadOnlyNotice } from './read-only-notice';
import { WellInspector } from './well-inspector';

export type PlateMapEditorProps = { plate: PlateDetail; context: PlateStudyContext; canWrite: boolean };

/** Kept across plates in this tab, for pastes when the system clipboard is not readable. */
let lastClip: Clip | null = null;

export function PlateMapEditor({ plate, context, canWrite }: PlateMapEditorProps) {
  const format = plate.format;
  const toast = useToast();
  const queryClient = useQueryClient();
  const history = useMapHistory(plate.map, plate.version);
  const selection = useSelection(format);
  const [brush, setBrush] = useState<Brush>(defaultBrush);
  const [tool, setTool] = useState<Tool>('select');
  const [highlight, setHighlight] = useState<{ key: string; wells: Set<string> } | null>(null);
  const [dialog, setDialog] = useState<DialogName | null>(null);
  const [stale, setStale] = useState<string | null>(null);
  const [typedError, setTypedError] = useState<string | null>(null);
  const pending = useRef<string[] | null>(null);
  const dragAnchor = useRef<Cell | null>(null);

  const locked = context.status === 'in_review' || context.status === 'approved';
  const readOnly = !canWrite || locked;
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
      if (readOnly) return;
      history.edit(next);
    },
    [readOnly, history],
  );
  const patch = (p: WellPatch, wells: string[] = names) => edit(patchWells(map, wells, p));
  const applyBrush = (wells: string[] = names) => patch(brushPatch(brush), wells);
  const clear = () => edit(clearWells(map, names));

  const save = useSavePlateMap();
  const doSave = () => {
    if (readOnly || !history.dirty || save.isPending) return;
    const sent = map;
    save.mutate(
      { plateId: plate.id, version: history.version, map: sent },
      {
        onSuccess: (saved) => {
          history.markSaved(sent, saved.version);
          toast.show(`Map saved (version ${saved.version}).`);
        },
        onError: (error) => {
          if (error instanceof ApiError && error.code === 'stale_version') setStale(error.message);
          else toast.show(`The map was not saved: ${error.message}`, 'error');
        },
      },
    );
  };
  const guard = useUnsavedGuard(history.dirty && !save.isPending);

  const reload = async (keepCopy: boolean) => {
    if (keepCopy) {
      const text = clipText(copyWholeMap(map, format));
      lastClip = copyWholeMap(map, format);
      await navigator.clipboard?.writeText(text).catch(() => undefined);
    }
    const fresh = await queryClient.fetchQuery({ ...getPlateQueryOptions(plate.id), staleTime: 0 });
    history.load(fresh.map, fresh.version);
    setStale(null);
    toast.show(
      keepCopy
        ? `Reloaded version ${fresh.version}. Your version is in the clipboard: Ctrl+V (⌘V) on the map puts it back.`
        : `Reloaded version ${fresh.version}.`,
    );
  };

  // Pointer: a press starts a selection (a cell, a whole row or column, or all); dragging grows
  // the rectangle; with the Paint tool, releasing paints what was selected.
  const onPointerStart = (hit: GridHit, extend: boolean) => {
    setHighlight(null);
    if (hit.kind === 'cell') {
      const anchor = extend ? selection.anchor : hit.cell;
      dragAnchor.current = anchor;
      if (extend) selection.extendTo(hit.cell);
      else selection.selectRect(hit.cell, hit.cell);
      pending.current = rectNames(anchor, hit.cell);
    } else {
      const last = { row: format === 96 ? 7 : 15, column: format === 96 ? 11 : 23 };
      const [a, b] =
        hit.kind === 'row'
          ? [
              { row: hit.row, column: 0 },
              { row: hit.row, column: last.column },
            ]
          : hit.kind === 'column'
            ? [
                { row: 0, column: hit.column },
                { row: last.row, column: hit.column },
              ]
            : [{ row: 0, column: 0 }, last];
      selection.selectRect(a, b);
      dragAnchor.current = null;
      pending.current = rectNames(a, b);
    }
  };
  const onPointerDrag = (cell: Cell) => {
    if (!dragAnchor.current) return;
    selection.extendTo(cell);
    pending.current = rectNames(dragAnchor.current, cell);
  };
  const onPointerEnd = () => {
    if (tool === 'paint' && pending.current && !readOnly) applyBrush(pending.current);
    pending.current = null;
    dragAnchor.current = null;
  };

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
    save: doSave,
    escape: () => {
      setHighlight(null);
      selection.selectRect(selection.cursor, selection.cursor);
    },
  });

  const topLeft = (): Cell => boundsOf(names, format)?.top ?? selection.cursor;
  const copySelection = (): Clip | null => {
    const clip = copyWells(map, names, format);
    if (clip) lastClip = clip;
    return clip;
  };
  const pasteFrom = (clip: Clip | null) => {
    if (readOnly) return;
    if (!clip) return toast.show('Nothing to paste: copy wells of a Bellwether plate map first.', 'warning');
    const result = pasteClip(map, clip, topLeft(), format);
    edit(result.map);
    if (result.wells.length) selection.selectNames(result.wells);
    if (result.leftOut)
      toast.show(`${result.leftOut} copied well(s) fell off the plate and were left out.`, 'warning');
  };
  const onCopy = (e: ClipboardEvent) => {
    const clip = copySelection();
    if (!clip) return;
    e.clipboardData?.setData('text/plain', clipText(clip));
    e.preventDefault();
  };
  const onCut = (e: ClipboardEvent) => {
    onCopy(e);
    clear();
  };
  const onPaste = (e: ClipboardEvent) => {
    e.preventDefault();
    pasteFrom(parseClip(e.clipboardData?.getData('text/plain') ?? '') ?? lastClip);
  };
  const copyButton = () => {
    const clip = copySelection();
    if (clip) void navigator.clipboard?.writeText(clipText(clip)).catch(() => undefined);
    toast.show(`Copied ${names.length} well(s).`);
  };
  const pasteButton = async () => {
    const text = await navigator.clipboard?.readText().catch(() => '');
    pasteFrom((text && parseClip(text)) || lastClip);
  };

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
            saving={save.isPending}
            version={history.version}
            replicatesRequired={map.replicatesRequired}
            onUndo={history.undo}
            onRedo={history.redo}
            onCopy={copyButton}
            onPaste={() => void pasteButton()}
            onClear={clear}
            onFill={() => setDialog('fill')}
            onPattern={() => setDialog('pattern')}
            onApplyTemplate={() => setDialog('apply-template')}
            onSaveTemplate={() => setDialog('save-template')}
            onReplicatesRequired={(n) => edit({ ...map, replicatesRequired: n })}
            onSave={doSave}
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
            onPointerStart={onPointerStart}
            onPointerDrag={onPointerDrag}
            onPointerEnd={onPointerEnd}
            onKeyDown={keys.onKeyDown}
            onCopy={onCopy}
            onCut={readOnly ? undefined : onCut}
            onPaste={readOnly ? undefined : onPaste}
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
        stale={stale}
        onReload={(keep) => void reload(keep)}
        onKeepEditing={() => setStale(null)}
        guard={guard}
      />
    </div>
  );
}

const emptySet: ReadonlySet<string> = new Set();
