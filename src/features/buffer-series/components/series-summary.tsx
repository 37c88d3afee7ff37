// A saved series in a few lines (for a study's overview): points, temperature, systems used.
import { Link } from 'react-router';
import type { SeriesDetail } from '@shared/schemas/buffer-series';
import { formatFixed, formatPlain } from '@/components/ui/numbers';
import { paths } from '@/config/paths';

export type SeriesSummaryCardProps = { series: SeriesDetail; studyBuffersHref?: string };

export function SeriesSummaryCard({ series: s, studyBuffersHref }: SeriesSummaryCardProps) {
  const pHs = s.input.pHPoints;
  const systems = [...new Set(s.design.points.flatMap((p) => (p.proposal ? [p.proposal.systemName] : [])))];
  const weak = s.design.points.filter((p) => p.weak).length;
  const overlaps = s.design.points.filter((p) => p.overlap).length;
  return (
    <div className="space-y-1.5">
      <p>
        <Link to={paths.bufferSeries.href(s.id)} className="font-semibold text-accent-700 hover:underline">
          {s.name}
        </Link>
      </p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-ink-muted">pH</dt>
        <dd className="tabular-nums">
          {formatFixed(Math.min(...pHs), 2)} – {formatFixed(Math.max(...pHs), 2)} ({pHs.length} points)
        </dd>
        <dt className="text-ink-muted">Assay</dt>
        <dd className="tabular-nums">
          {s.input.assayTemperatureC} °C, {formatPlain(s.input.bufferConcMm)} mM
          {s.input.targetIonicStrengthM !== null ? `, I = ${s.input.targetIonicStrengthM} M` : ''}
        </dd>
        <dt className="text-ink-muted">Systems</dt>
        <dd>{systems.join(', ') || '—'}</dd>
        <dt className="text-ink-muted">Overlaps</dt>
        <dd className="tabular-nums">{overlaps}</dd>
        <dt className="text-ink-muted">Weak points</dt>
        <dd className={`tabular-nums ${weak ? 'font-semibold text-warn-800' : ''}`}>{weak}</dd>
      </dl>
      {studyBuffersHref && (
        <p className="text-sm">
          <Link to={studyBuffersHref} className="text-accent-700 hover:underline">
            Points, recipes and charts
          </Link>
        </p>
      )}
    </div>
  );
}
