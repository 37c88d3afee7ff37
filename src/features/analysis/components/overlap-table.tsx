// Overlap points: one variant at one pH in two buffers. A difference beyond their errors (Welch t,
// p below the level) suggests a buffer-specific effect rather than a pH effect.
import type { OverlapTest } from '@shared/analysis';
import { formatFixed, formatSig } from '@/components/ui/numbers';

export type OverlapTableProps = {
  overlaps: OverlapTest[];
  variantNames: Record<string, string>;
  unit: string;
};

const th = 'border-b border-line px-2 py-1 font-semibold';

export function OverlapTable({ overlaps, variantNames, unit }: OverlapTableProps) {
  return (
    <table aria-label="Overlap points" className="mt-1 w-full border-collapse text-sm">
      <thead className="bg-canvas text-left text-ink-muted">
        <tr>
          <th className={th}>Variant, pH</th>
          <th className={th}>Buffers</th>
          <th className={`${th} text-right`}>Means ({unit})</th>
          <th className={`${th} text-right`}>Difference</th>
          <th className={`${th} text-right`}>p</th>
          <th className={th}>Verdict</th>
        </tr>
      </thead>
      <tbody>
        {overlaps.map((o) => (
          <tr key={`${o.variantId}-${o.pH}-${o.buffers.join('/')}`} className={o.flagged ? 'bg-warn-50' : ''}>
            <td className="px-2 py-0.5">
              {variantNames[o.variantId] ?? 'variant'}, pH {o.pH}
            </td>
            <td className="px-2 py-0.5">{o.buffers.join(' / ')}</td>
            <td className="num px-2 py-0.5">
              {formatSig(o.means[0], 3)} / {formatSig(o.means[1], 3)}
            </td>
            <td className="num px-2 py-0.5">{formatSig(o.difference, 2)}</td>
            <td className="num px-2 py-0.5">{o.p === null ? '—' : formatFixed(o.p, 3)}</td>
            <td className="px-2 py-0.5">
              {o.flagged ? 'the buffers disagree' : 'agree within errors'}
              {!o.samePlate && <span className="block text-xs text-ink-muted">on different plates</span>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
