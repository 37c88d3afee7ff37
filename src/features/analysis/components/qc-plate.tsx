// One plate's quality checks: Z′ and robust Z′ with their bands and the control rule, replicate CVs
// over the limit, outliers (flags only), blank drift across pH, row/column/edge trends, overlap
// points, and the plate-map checks.
import type { ReactNode } from 'react';
import type { PlateQc } from '@shared/analysis';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { flagSentence, zPrimeBandWords } from '../utils/words';
import { OverlapTable } from './overlap-table';

export type QcPlateProps = {
  plate: PlateQc;
  signalUnit: string;
  activityUnit: string;
  cvLimit: number;
  variantNames: Record<string, string>;
  flagText: Record<string, string>;
};

/** Differences within rounding of zero (e.g. a column trend on a plate laid out by column) read as 0. */
const amount = (v: number | null) => (v !== null && Math.abs(v) < 1e-9 ? '0' : formatSig(v, 2));

const pText = (p: number | null) => (p === null ? '—' : p < 0.001 ? '< 0.001' : formatFixed(p, 3));

function Block({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div>
      <h4 className="text-sm font-semibold">{title}</h4>
      <div className="text-sm">{children}</div>
    </div>
  );
}

export function QcPlate({ plate, signalUnit, activityUnit, cvLimit, variantNames, flagText }: QcPlateProps) {
  const z = plate.zPrime;
  const overCv = plate.replicateCvs.filter((c) => c.overLimit);
  const drift = plate.blankDrift;
  const trends = plate.trends;
  return (
    <section
      aria-label={`QC of ${plate.name}`}
      className="space-y-3 rounded border border-line bg-surface p-3"
    >
      <h3 className="text-base">{plate.name}</h3>
      {!plate.hasRead && <p className="text-sm text-ink-muted">No read yet: nothing to check.</p>}
      <Block title="Z′ (controls of this plate)">
        {z.zPrime === null ? (
          <p>Not computed: {z.flags.map((f) => flagSentence(flagText, f)).join(' ') || 'no controls.'}</p>
        ) : (
          <p>
            Z′ = <span className="tabular-nums font-semibold">{formatFixed(z.zPrime, 2)}</span>,{' '}
            {z.band ? zPrimeBandWords[z.band] : ''}; robust Z′ (median/MAD) ={' '}
            <span className="tabular-nums font-semibold">{formatFixed(z.robustZPrime, 2)}</span>
            {z.robustBand ? `, ${zPrimeBandWords[z.robustBand]}` : ''}.
          </p>
        )}
        {z.positive && (
          <p className="text-ink-muted">
            Positive: {variantNames[z.positive.variantId] ?? 'variant'} at pH {z.positive.pH} (
            {z.positive.wells.join(', ')}), mean {formatSig(z.positive.mean, 3)} ±{' '}
            {formatSig(z.positive.sd, 2)} {signalUnit}.
          </p>
        )}
        {z.negative && (
          <p className="text-ink-muted">
            Negative: blanks at pH {z.negative.pH} ({z.negative.wells.join(', ')}), mean{' '}
            {formatSig(z.negative.mean, 3)} ± {formatSig(z.negative.sd, 2)} {signalUnit}.
          </p>
        )}
        <details className="mt-0.5 text-ink-muted">
          <summary className="cursor-pointer">The control rule</summary>
          <p className="mt-0.5">{z.rule}</p>
        </details>
      </Block>
      <Block title={`Replicate CVs over ${cvLimit} %`}>
        {overCv.length === 0 ? (
          <p className="text-ink-muted">None: every replicate group is within {cvLimit} %.</p>
        ) : (
          <ul className="list-disc pl-5">
            {overCv.map((c) => (
              <li key={`${c.variantId}-${c.pH}-${c.buffer}`}>
                {variantNames[c.variantId] ?? 'variant'} at pH {c.pH}
                {c.buffer ? ` (${c.buffer})` : ''}: CV{' '}
                <span className="tabular-nums">{formatFixed(c.cvPercent, 0)} %</span> (n = {c.n}, mean{' '}
                {formatSig(c.mean, 3)} {activityUnit})
              </li>
            ))}
          </ul>
        )}
      </Block>
      <Block title="Outliers (flagged only; nothing is removed)">
        {plate.outliers.length === 0 ? (
          <p className="text-ink-muted">None by the robust rule (modified z-score above 3.5).</p>
        ) : (
          <p>{plate.outliers.map((o) => `${o.well} (${formatSig(o.score, 2)})`).join(', ')}</p>
        )}
      </Block>
      <Block title="Blanks across pH">
        {!drift ? (
          <p className="text-ink-muted">Too few blanks to judge a drift.</p>
        ) : (
          <p className={drift.flags.length ? 'text-warn-800' : ''}>
            {formatSig(drift.slope, 2)} {signalUnit} per pH unit (p {pText(drift.p)});{' '}
            {formatSig(drift.changeAcrossRange, 2)} {signalUnit} from the lowest to the highest pH, {drift.n}{' '}
            blanks.
            {drift.flags.length > 0 &&
              ' The blanks drift with pH: the blank of each pH point is used, not one for all.'}
          </p>
        )}
      </Block>
      <Block title="Row, column and edge trends (activities)">
        {!trends ? (
          <p className="text-ink-muted">Too few wells to judge.</p>
        ) : (
          <ul className="list-disc pl-5">
            {trends.row && (
              <li>
                Rows: {amount(trends.row.changeAcrossPlate)} {activityUnit} from first to last row (p{' '}
                {pText(trends.row.p)})
              </li>
            )}
            {trends.column && (
              <li>
                Columns: {amount(trends.column.changeAcrossPlate)} {activityUnit} from first to last column (p{' '}
                {pText(trends.column.p)})
              </li>
            )}
            {trends.edge && (
              <li>
                Edge − inner wells: {amount(trends.edge.difference)} {activityUnit} (p {pText(trends.edge.p)})
              </li>
            )}
            {trends.flags.map((f) => (
              <li key={f} className="text-warn-800">
                {flagSentence(flagText, f)}
              </li>
            ))}
          </ul>
        )}
      </Block>
      {plate.overlaps.length > 0 && (
        <Block title="Overlap points (two buffers at one pH)">
          <OverlapTable overlaps={plate.overlaps} variantNames={variantNames} unit={activityUnit} />
        </Block>
      )}
      <Block title="Plate-map checks">
        {plate.mapChecks.length === 0 ? (
          <p className="text-ink-muted">No problems in the map.</p>
        ) : (
          <ul className="list-disc pl-5">
            {plate.mapChecks.map((c, i) => (
              <li
                key={`${c.code}-${i}`}
                className={
                  c.level === 'error' ? 'text-danger-600' : c.level === 'warning' ? 'text-warn-800' : ''
                }
              >
                {c.message}
              </li>
            ))}
          </ul>
        )}
      </Block>
    </section>
  );
}
