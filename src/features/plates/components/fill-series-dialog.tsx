// Fill the study's pH series along a row or down a column from a start well, over a band of
// several rows (or columns). Sets pH and buffer only; roles and variants stay.
import { useState } from 'react';
import type { PlateFormat } from '@shared/plate/geometry';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import type { PhPoint } from '../api/get-study-context';
import type { FillDirection, FillSeriesInput } from '../utils/fill-series';
import { cellName, cellOf, type Cell } from '../utils/grid';
import { gridGeometry } from './plate-grid';
import { CountInput, WellInput } from './small-inputs';

export type FillSeriesDialogProps = {
  open: boolean;
  onClose: () => void;
  format: PlateFormat;
  phPoints: PhPoint[];
  seriesName: string | null;
  /** The selection's top-left corner and size, as the defaults. */
  start: Cell;
  selectionRows: number;
  selectionColumns: number;
  onFill: (input: FillSeriesInput) => void;
};

export function FillSeriesDialog(props: FillSeriesDialogProps) {
  return props.open ? <FillSeriesForm {...props} /> : null;
}

function FillSeriesForm({
  onClose,
  format,
  phPoints,
  seriesName,
  start,
  selectionRows,
  selectionColumns,
  onFill,
}: FillSeriesDialogProps) {
  const g = gridGeometry(format);
  const [startText, setStartText] = useState(cellName(start));
  const [direction, setDirection] = useState<FillDirection>('along-row');
  const [chosen, setChosen] = useState<boolean[]>(() => phPoints.map(() => true));
  const [descending, setDescending] = useState(false);
  const [span, setSpan] = useState(1);
  const [lines, setLines] = useState(Math.max(selectionRows, 1));
  const startCell = cellOf(startText, format);
  const points = phPoints.filter((_, i) => chosen[i]);
  const ordered = descending ? [...points].reverse() : points;
  const room = startCell
    ? direction === 'along-row'
      ? g.columns - startCell.column
      : g.rows - startCell.row
    : 0;
  const fits = Math.min(ordered.length, Math.floor(room / Math.max(1, span)));
  const error = !startCell
    ? `"${startText}" is not a well of this ${format}-well plate.`
    : ordered.length === 0
      ? 'Pick at least one pH point.'
      : null;

  const changeDirection = (d: FillDirection) => {
    setDirection(d);
    setLines(Math.max(d === 'along-row' ? selectionRows : selectionColumns, 1));
  };
  const submit = () => {
    if (error || !startCell) return;
    onFill({ start: startCell, direction, points: ordered, span, lines });
    onClose();
  };
  const acrossWord = direction === 'along-row' ? 'rows' : 'columns';
  return (
    <Dialog
      open
      onClose={onClose}
      title="Fill pH series"
      description={
        seriesName
          ? `Points of the buffer series “${seriesName}”. Sets each well's pH and buffer.`
          : undefined
      }
      footer={
        <>
          <Button onClick={onClose}>Cancel</Button>
          <Button variant="primary" disabled={Boolean(error)} onClick={submit}>
            Fill
          </Button>
        </>
      }
    >
      {phPoints.length === 0 ? (
        <Notice tone="warning" title="The study has no buffer series yet">
          Design and attach a buffer series to the study; its pH points fill the plate.
        </Notice>
      ) : (
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
              <legend className="mb-0.5 font-semibold">Direction</legend>
              <label className="mr-3">
                <input
                  type="radio"
                  name="fill-direction"
                  checked={direction === 'along-row'}
                  onChange={() => changeDirection('along-row')}
                />{' '}
                Along the row (one pH per column →)
              </label>
              <label>
                <input
                  type="radio"
                  name="fill-direction"
                  checked={direction === 'down-column'}
                  onChange={() => changeDirection('down-column')}
                />{' '}
                Down the column (one pH per row ↓)
              </label>
            </fieldset>
          </div>
          <div className="flex flex-wrap gap-4">
            <CountInput label="Wells per pH point" value={span} onChange={setSpan} />
            <CountInput label={`Number of ${acrossWord} to fill`} value={lines} onChange={setLines} />
            <label className="mt-6 block">
              <input type="checkbox" checked={descending} onChange={(e) => setDescending(e.target.checked)} />{' '}
              Highest pH first
            </label>
          </div>
          <fieldset>
            <legend className="mb-0.5 font-semibold">pH points</legend>
            <div className="grid grid-cols-3 gap-x-3">
              {phPoints.map((p, i) => (
                <label key={`${p.pH}-${i}`} className="tabular-nums">
                  <input
                    type="checkbox"
                    checked={chosen[i]}
                    onChange={(e) => setChosen((c) => c.map((v, k) => (k === i ? e.target.checked : v)))}
                  />{' '}
                  pH {p.pH.toFixed(2)} <span className="text-ink-muted">{p.bufferName ?? ''}</span>
                </label>
              ))}
            </div>
          </fieldset>
          {error ? (
            <Notice tone="error">{error}</Notice>
          ) : (
            <p className="text-ink-muted" role="status">
              {fits} of {ordered.length} pH points fit from {startText.toUpperCase()}
              {fits < ordered.length ? ` (${ordered.length - fits} run off the plate)` : ''}. Wells without a
              role become samples.
            </p>
          )}
        </form>
      )}
    </Dialog>
  );
}
