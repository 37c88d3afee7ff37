// Plate QC for the report: per plate the Z′ of its controls, replicate CVs over the limit, wells
// flagged as outliers (flagged only, never removed by the program), blank drift with pH and plate
// trends; then overlap points whose two buffers disagree, and the analysis notes.
import type { AnalysisResult } from '@shared/analysis';
import { formatFixed, formatSig } from '@/components/ui/numbers';

export type QcSummaryProps = { result: AnalysisResult; variantNames: Record<string, string> };

const th = 'border-b border-line py-1 pr-2 font-semibold';
const pText = (p: number | null | undefined) =>
  p === null || p === undefined ? '—' : p < 0.001 ? '< 0.001' : formatSig(p, 2);

export function QcSummary({ result, variantNames }: QcSummaryProps) {
  const { qc, flagText } = result;
  const flaggedOverlaps = qc.overlaps.filter((o) => o.flagged);
  const plateFlags = [...new Set(qc.plates.flatMap((p) => p.flags))];
  return (
    <div className="space-y-2">
      <table className="w-full border-collapse text-sm" aria-label="Plate QC">
        <thead className="text-left text-ink-muted">
          <tr>
            <th className={th}>Plate</th>
            <th className={`${th} text-right`}>Z′</th>
            <th className={`${th} text-right`}>CV over {qc.cvLimitPercent} %</th>
            <th className={th}>Outliers (flagged)</th>
            <th className={`${th} text-right`}>Blank drift, p</th>
            <th className={`${th} text-right`}>Row / edge trend, p</th>
          </tr>
        </thead>
        <tbody>
          {qc.plates.map((p) => {
            const over = p.replicateCvs.filter((c) => c.overLimit);
            return (
              <tr key={p.plateId} className="border-b border-line align-top last:border-b-0">
                <td className="py-1 pr-2">
                  <span className="font-semibold">{p.name}</span>
                  <span className="block text-xs text-ink-muted">
                    {p.format} wells{p.hasRead ? '' : ', no read'}
                  </span>
                </td>
                <td className="num py-1 pr-2">
                  {p.zPrime.zPrime === null ? (
                    <span className="text-ink-muted">not computed</span>
                  ) : (
                    <>
                      {formatFixed(p.zPrime.zPrime, 2)}
                      {p.zPrime.band && <span className="block text-xs text-ink-muted">{p.zPrime.band}</span>}
                    </>
                  )}
                </td>
                <td className="num py-1 pr-2">
                  {over.length} of {p.replicateCvs.length}
                  {over.map((c) => (
                    <span key={`${c.variantId}-${c.pH}-${c.buffer}`} className="block text-xs text-warn-800">
                      {variantNames[c.variantId] ?? 'variant'} pH {c.pH}: {formatSig(c.cvPercent, 2)} %
                    </span>
                  ))}
                </td>
                <td className="py-1 pr-2">
                  {p.outliers.length === 0 ? 'none' : p.outliers.map((o) => o.well).join(', ')}
                </td>
                <td className="num py-1 pr-2">
                  {pText(p.blankDrift?.p)}
                  {p.blankDrift?.changeAcrossRange != null && (
                    <span className="block text-xs text-ink-muted">
                      change {formatSig(p.blankDrift.changeAcrossRange, 2)} across the range
                    </span>
                  )}
                </td>
                <td className="num py-1">
                  {pText(p.trends?.row?.p)} / {pText(p.trends?.edge?.p)}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {plateFlags.length > 0 && (
        <ul className="list-disc space-y-0.5 pl-5 text-sm text-ink-muted">
          {plateFlags.map((f) => (
            <li key={f}>{flagText[f] ?? f}</li>
          ))}
        </ul>
      )}
      <p className="text-sm">
        Overlap points (one pH in two buffers):{' '}
        {qc.overlaps.length === 0
          ? 'none in this study.'
          : flaggedOverlaps.length === 0
            ? `${qc.overlaps.length}, none with a buffer-specific effect (α = ${qc.overlapAlpha}).`
            : `${flaggedOverlaps.length} of ${qc.overlaps.length} disagree beyond their errors: ${flaggedOverlaps
                .map(
                  (o) =>
                    `${variantNames[o.variantId] ?? 'variant'} at pH ${o.pH} (${o.buffers.join(' vs ')}, p = ${pText(o.p)})`,
                )
                .join('; ')}.`}
      </p>
      {result.notes.length > 0 && (
        <ul className="space-y-0.5 text-sm">
          {result.notes.map((n) => (
            <li key={n.code} className={n.level === 'warning' ? 'text-warn-800' : 'text-ink-muted'}>
              {n.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
