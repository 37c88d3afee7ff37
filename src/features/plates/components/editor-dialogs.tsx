// The editor's dialogs in one place: fill, pattern, templates, the refused save and the
// question before leaving with unsaved changes.
import type { Blocker } from 'react-router';
import type { PlateMap } from '@shared/plate-map/schema';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import type { PlateStudyContext } from '../api/get-study-context';
import type { FillSeriesInput } from '../utils/fill-series';
import type { Cell } from '../utils/grid';
import type { PatternInput } from '../utils/replicate-pattern';
import { FillSeriesDialog } from './fill-series-dialog';
import { ReplicatePatternDialog } from './replicate-pattern-dialog';
import { StaleSaveDialog } from './stale-save-dialog';
import { ApplyTemplateDialog, SaveTemplateDialog } from './template-dialogs';
import { gridGeometry } from './plate-grid';

export type DialogName = 'fill' | 'pattern' | 'apply-template' | 'save-template';

export type EditorDialogsProps = {
  open: DialogName | null;
  onClose: () => void;
  format: 96 | 384;
  map: PlateMap;
  context: PlateStudyContext;
  start: Cell;
  selectionRows: number;
  selectionColumns: number;
  onFill: (input: FillSeriesInput) => void;
  onPattern: (input: PatternInput) => void;
  onApplyTemplate: (map: PlateMap, name: string) => void;
  stale: string | null;
  onReload: (keepCopy: boolean) => void;
  onKeepEditing: () => void;
  guard: Blocker;
};

export function EditorDialogs(p: EditorDialogsProps) {
  const columns = gridGeometry(p.format).columns;
  return (
    <>
      <FillSeriesDialog
        open={p.open === 'fill'}
        onClose={p.onClose}
        format={p.format}
        phPoints={p.context.phPoints}
        seriesName={p.context.seriesName}
        start={p.start}
        selectionRows={p.selectionRows}
        selectionColumns={p.selectionColumns}
        onFill={p.onFill}
      />
      <ReplicatePatternDialog
        open={p.open === 'pattern'}
        onClose={p.onClose}
        format={p.format}
        variants={p.context.variants}
        replicatesRequired={p.map.replicatesRequired}
        start={p.start}
        defaultLength={Math.min(columns - p.start.column, p.context.phPoints.length || columns)}
        onApply={p.onPattern}
      />
      <SaveTemplateDialog
        open={p.open === 'save-template'}
        onClose={p.onClose}
        teamId={p.context.teamId}
        format={p.format}
        map={p.map}
      />
      <ApplyTemplateDialog
        open={p.open === 'apply-template'}
        onClose={p.onClose}
        teamId={p.context.teamId}
        format={p.format}
        onApply={p.onApplyTemplate}
      />
      <StaleSaveDialog
        open={p.stale !== null}
        message={p.stale ?? ''}
        onReload={p.onReload}
        onKeepEditing={p.onKeepEditing}
      />
      <ConfirmDialog
        open={p.guard.state === 'blocked'}
        title="Leave without saving?"
        confirmLabel="Leave, drop changes"
        onConfirm={() => p.guard.proceed?.()}
        onCancel={() => p.guard.reset?.()}
      >
        <p>The plate map has changes that are not saved. Leaving drops them.</p>
      </ConfirmDialog>
    </>
  );
}
