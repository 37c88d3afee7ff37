// Replicate patterns: variants × replicates as consecutive rows (or columns), numbered 1…n,
// optionally followed by a line of blanks and a line of buffer-only wells.
import { useState } from 'react';
import type { PlateFormat } from '@shared/plate/geometry';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import type { StudyVariant } from '../api/get-study-context';
import { cellName, cellOf, type Cell } from '../utils/grid';
import type { PatternInput } from '../utils/replicate-pattern';
import { gridGeometry } from './plate-grid';
import { CountInput, WellInput } from './small-inputs';

export type ReplicatePatternDialogProps = {
  open: boolean;
  onClose: () => void;
  format: PlateFormat;
  variants: StudyVariant[];
  replicatesRequired: number;
  start: Cell;
  /** Default band length: the number of pH points (one per column), else the plate width. */
  defaultLength: number;
  onApply: (input: PatternInput) => void;
};

export function ReplicatePatternDialog(props: ReplicatePatternDialogProps) {
  return props.open ? <PatternForm {...props} /> : null;
}

function PatternForm({
  onClose,
  format,
  variants,
  replicatesRequired,
  start,
  defaultLength,
  onApply,
}: ReplicatePatternDialogProps) {
  const g = gridGeometry(format);
  const [startText, setStartText] = useState(cellName(start));
  const [direction, setDirection] = useState<'rows' | 'columns'>('rows');
  const [chosen, setChosen] = useState<boolean[]>(() => variants.map((_, i) => i < 2));
  const [replicates, setReplicates] = useState(replicatesRequired);
  const [length, setLength] = useState(defaultLength);
  const [blankLine, setBlankLine] = useState(true);
  const [bufferLine, setBufferLine] = useState(false);
  const startCell = cellOf(startText, format);
  const variantIds = variants.filter((_, i) => chosen[i]).map((v) => v.id);
  const linesNeeded = variantIds.length * replicates + (blankLine ? 1 : 0) + (bufferLine ? 1 : 0);
  const linesAvailable = startCell
    ? direction === 'rows'
      ? g.rows - startCell.row
      : g.columns - startCell.column
    : 0;
  const error = !startCell
    ? `"${startText}" is not a well of this ${format}-well plate.`
    : variantIds.length === 0
      ? 'Pick at least one variant.'
      : null;
  const lineWord = direction === 'rows' ? 'rows' : 'columns';
  const submit = () => {
    if (error || !startCell) return;
    onApply({ start: startCell, direction, variantIds, replicates, length, blankLine, bufferLine });
    onClose();
  };
  return (
    <Dialog
      open
      onClose={onClose}
      title="Replicate pattern"
      description="Each variant takes as many consecutive rows (or columns) as it has replicates, numbered 1, 2, 3…"
      footer={
        <>
          <Button onClick={onClose}>Cancel</Button>
          <Button variant="primary" disabled={Boolean(error)} onClick={submit}>
            Lay out
          </Button>
        </>
      }
    >
      <form
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
      >
        <div className="flex flex-wrap gap-4">
          <WellInput label="Start well" value={startText} onChange={setStartText} />
          <fieldset>
            <legend className="mb-0.5 font-semibold">Replicates run</legend>
            <label className="mr-3">
              <input
                type="radio"
                name="pattern-direction"
                checked={direction === 'rows'}
                onChange={() => setDirection('rows')}
              />{' '}
              Down rows
            </label>
            <label>
              <input
                type="radio"
                name="pattern-direction"
                checked={direction === 'columns'}
                onChange={() => setDirection('columns')}
              />{' '}
              Across columns
            </label>
          </fieldset>
        </div>
        <div className="flex flex-wrap gap-4">
          <CountInput label="Replicates per variant" value={replicates} onChange={setReplicates} />
          <CountInput
            label={`Wells per ${direction === 'rows' ? 'row' : 'column'}`}
            value={length}
            onChange={setLength}
          />
        </div>
        <fieldset>
          <legend className="mb-0.5 font-semibold">Variants, in this order</legend>
          <div className="grid grid-cols-2 gap-x-3">
            {variants.map((v, i) => (
              <label key={v.id}>
                <input
                  type="checkbox"
                  checked={chosen[i]}
                  onChange={(e) => setChosen((c) => c.map((x, k) => (k === i ? e.target.checked : x)))}
                />{' '}
                {v.name}
              </label>
            ))}
          </div>
        </fieldset>
        <div className="flex gap-4">
          <label>
            <input type="checkbox" checked={blankLine} onChange={(e) => setBlankLine(e.target.checked)} />{' '}
            Then one line of blanks (no enzyme)
          </label>
          <label>
            <input type="checkbox" checked={bufferLine} onChange={(e) => setBufferLine(e.target.checked)} />{' '}
            Then one line of buffer only
          </label>
        </div>
        {error ? (
          <Notice tone="error">{error}</Notice>
        ) : (
          <p role="status" className={linesNeeded > linesAvailable ? 'text-warn-800' : 'text-ink-muted'}>
            Needs {linesNeeded} {lineWord} from {startText.toUpperCase()}; {linesAvailable} are left on the
            plate
            {linesNeeded > linesAvailable ? ' — the last ones will not fit.' : '.'} Roles, variants and
            replicate numbers are set; pH stays.
          </p>
        )}
      </form>
    </Dialog>
  );
}
