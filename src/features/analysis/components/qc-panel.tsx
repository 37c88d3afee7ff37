// Quality checks of the study: per plate (Z′, CVs, outliers, blank drift, trends, overlaps, map
// checks), overlap points across plates, the predicted well pH against the nominal pH, and notes.
import type { StudyAnalysis } from '@shared/schemas/analysis';
import { formatFixed, formatSigned } from '@/components/ui/numbers';
import { OverlapTable } from './overlap-table';
import { QcPlate } from './qc-plate';

export type QcPanelProps = { analysis: StudyAnalysis };

export function QcPanel({ analysis }: QcPanelProps) {
  const { result } = analysis;
  const variantNames = Object.fromEntries(result.profiles.map((p) => [p.variantId, p.name]));
  const wellPh = analysis.wellPh ?? [];
  const crossPlate = result.qc.overlaps.filter((o) => !o.samePlate);
  return (
    <div className="space-y-4">
      <div className="grid grid-cols-1 gap-4 xl:grid-cols-2">
        {result.qc.plates.map((plate) => (
          <QcPlate
            key={plate.plateId}
            plate={plate}
            signalUnit={result.units.signal}
            activityUnit={result.units.activity}
            cvLimit={result.qc.cvLimitPercent}
            variantNames={variantNames}
            flagText={result.flagText}
          />
        ))}
      </div>
      {crossPlate.length > 0 && (
        <section aria-labelledby="cross-overlaps" className="rounded border border-line bg-surface p-3">
          <h3 id="cross-overlaps" className="text-base">
            Overlap points across plates
          </h3>
          <OverlapTable overlaps={crossPlate} variantNames={variantNames} unit={result.units.activity} />
        </section>
      )}
      {wellPh.length > 0 && (
        <section aria-labelledby="well-ph" className="rounded border border-line bg-surface p-3">
          <h3 id="well-ph" className="text-base">
            Predicted well pH
          </h3>
          <p className="text-sm text-ink-muted">
            The buffer series’ prediction of the pH in the well once enzyme and substrate are added, against
            the nominal pH; drifts beyond 0.05 are marked.
          </p>
          <table aria-label="Predicted well pH" className="mt-1 border-collapse text-sm">
            <thead className="bg-canvas text-left text-ink-muted">
              <tr>
                <th className="border-b border-line px-2 py-1 font-semibold">Nominal pH</th>
                <th className="border-b border-line px-2 py-1 font-semibold">Buffer</th>
                <th className="border-b border-line px-2 py-1 text-right font-semibold">Predicted</th>
                <th className="border-b border-line px-2 py-1 text-right font-semibold">Drift</th>
              </tr>
            </thead>
            <tbody>
              {wellPh.map((w) => (
                <tr key={`${w.pH}-${w.buffer}`} className={w.overLimit ? 'bg-warn-50' : ''}>
                  <td className="num px-2 py-0.5">{formatFixed(w.pH, 2)}</td>
                  <td className="px-2 py-0.5">{w.buffer ?? '—'}</td>
                  <td className="num px-2 py-0.5">{formatFixed(w.predicted, 2)}</td>
                  <td className={`num px-2 py-0.5 ${w.overLimit ? 'font-semibold text-warn-800' : ''}`}>
                    {formatSigned(w.drift, 2)}
                    {w.overLimit && ' (over 0.05)'}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      )}
    </div>
  );
}
