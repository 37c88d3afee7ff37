// The chosen well: its numbers and flags in words, its time course with the rate window, and (for
// editors) the window form and exclusion of the well or of its whole point.
import type { ReactNode } from 'react';
import type { Units, WellRow } from '@shared/analysis';
import type { StudyAnalysisSettings } from '@shared/schemas/analysis';
import { Button } from '@/components/ui/button';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { blankMatchWords, flagSentence, roleWords, windowSourceWords } from '../utils/words';
import { WellTrace } from './well-trace';
import { WindowForm } from './window-form';

export type WellDetailProps = {
  row: WellRow;
  variantName: string;
  plateName: string;
  units: Units;
  flagText: Record<string, string>;
  kinetic: boolean;
  editable: boolean;
  settings: StudyAnalysisSettings;
  /** How many wells the whole point (this variant at this pH, every plate) has. */
  pointSize: number;
  saving: boolean;
  onSaveSettings: (settings: StudyAnalysisSettings, done: string) => void;
  onExclude: (scope: 'well' | 'point') => void;
  onInclude: () => void;
};

function Item({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <dt className="text-ink-muted">{label}</dt>
      <dd className="tabular-nums">{children}</dd>
    </>
  );
}

export function WellDetail(props: WellDetailProps) {
  const { row, units, flagText, kinetic, editable } = props;
  const w = row.window;
  return (
    <div
      className={`grid grid-cols-1 gap-4 ${kinetic ? 'md:grid-cols-[minmax(0,1fr)_minmax(0,1.25fr)]' : ''}`}
    >
      <div className="space-y-3">
        <dl className="grid grid-cols-[7.5rem_1fr] gap-x-3 gap-y-0.5 text-sm">
          <Item label="Role">{roleWords[row.role] ?? row.role}</Item>
          {row.variantId && <Item label="Variant">{props.variantName}</Item>}
          <Item label="pH · buffer">
            {formatFixed(row.pH, 2)} · {row.buffer ?? '—'}
            {row.replicate !== null && ` · replicate ${row.replicate}`}
          </Item>
          <Item label={`Signal (${units.signal})`}>
            {formatSig(row.signal, 4)}
            {row.signalSe !== null && ` ± ${formatSig(row.signalSe, 2)}`}
          </Item>
          {kinetic && (
            <Item label="Window">
              {w && w.startS !== null ? `${w.startS}–${w.endS} s, ${windowSourceWords[w.source]}` : '—'}
              {row.r2 !== null && `; r² ${formatFixed(row.r2, 4)}, ${row.n} reads`}
            </Item>
          )}
          <Item label="Blank">
            {row.blank
              ? `${formatSig(row.blank.mean, 3)} (n = ${row.blank.n}, ${blankMatchWords[row.blank.match]})`
              : '—'}
          </Item>
          <Item label="Corrected">{formatSig(row.corrected, 4)}</Item>
          <Item label={`Activity (${units.activity})`}>
            {formatSig(row.activity, 4)}
            {row.activitySe !== null && ` ± ${formatSig(row.activitySe, 2)}`}
          </Item>
          {row.readerFlag && <Item label="Reader flag">{row.readerFlag}</Item>}
        </dl>
        {row.excluded && (
          <p className="rounded border border-line-strong bg-canvas px-2 py-1 text-sm">
            <span className="font-semibold">Excluded:</span> {row.exclusion?.reason}
          </p>
        )}
        {row.outlier && (
          <p className="text-sm text-warn-800">
            Outlier within its replicates (modified z-score {formatSig(row.outlierScore, 2)}): a flag only;
            exclude it only with a reason.
          </p>
        )}
        {row.flags.filter((f) => f !== 'outlier').length > 0 && (
          <ul className="list-disc space-y-0.5 pl-5 text-sm text-warn-800">
            {row.flags
              .filter((f) => f !== 'outlier')
              .map((f) => (
                <li key={f}>{flagSentence(flagText, f)}</li>
              ))}
          </ul>
        )}
        {editable && (
          <div className="flex flex-wrap gap-2">
            {row.excluded ? (
              <Button size="sm" onClick={props.onInclude}>
                Include {row.well} again…
              </Button>
            ) : (
              <Button size="sm" onClick={() => props.onExclude('well')}>
                Exclude {row.well}…
              </Button>
            )}
            {row.role === 'sample' && props.pointSize > 1 && (
              <Button size="sm" onClick={() => props.onExclude('point')}>
                Exclude the whole point ({props.pointSize} wells)…
              </Button>
            )}
          </div>
        )}
      </div>
      <div className="space-y-3">
        {kinetic && (
          <WellTrace
            row={row}
            plateName={props.plateName}
            chosenReadId={props.settings.plateReads?.[row.plateId]}
            signalUnit={units.signal}
          />
        )}
        {editable && kinetic && (
          <WindowForm
            key={`${row.plateId}:${row.well}`}
            row={row}
            variantName={props.variantName}
            plateName={props.plateName}
            settings={props.settings}
            busy={props.saving}
            onSave={props.onSaveSettings}
          />
        )}
      </div>
    </div>
  );
}
