// One block the parser found: what it is, where it sits, how many wells have values and why the
// others are missing, a heat-map preview, and the scientist's choices for it.
import type { BlockPreview } from '@shared/schemas/plates-types';
import { Badge } from '@/components/ui/badge';
import type { BlockChoice } from '../utils/selection';
import { flagMarks, PlateHeatMap } from './plate-heat-map';

export type BlockCardProps = {
  block: BlockPreview;
  plateFormat: 96 | 384;
  choice: BlockChoice;
  onChange: (choice: BlockChoice) => void;
};

const input = 'h-8 w-full rounded border border-line-strong bg-surface px-2';

function flagSummary(flags: Record<string, string>): string {
  const counts = new Map<string, number>();
  for (const f of Object.values(flags)) counts.set(f, (counts.get(f) ?? 0) + 1);
  return [...counts].map(([f, n]) => `${n} ${f} ${flagMarks[f] ?? ''}`.trim()).join(', ');
}

function timeSummary(times: number[] | null): string {
  if (!times?.length) return '—';
  const last = times[times.length - 1];
  const span = last >= 120 ? `${(last / 60).toFixed(1)} min` : `${last} s`;
  return `${times.length} (${times[0]} s … ${span})`;
}

export function BlockCard({ block: b, plateFormat, choice, onChange }: BlockCardProps) {
  const title = `Block ${b.index + 1}: ${b.label}`;
  const flagged = flagSummary(b.flags);
  return (
    <article
      aria-label={title}
      className={`rounded border bg-surface p-3 ${choice.include ? 'border-accent-300' : 'border-line'}`}
    >
      <header className="flex flex-wrap items-center gap-2">
        <label className="flex items-center gap-2 font-semibold">
          <input
            type="checkbox"
            checked={choice.include}
            disabled={!b.formatMatchesPlate}
            onChange={(e) => onChange({ ...choice, include: e.target.checked })}
          />
          Import block {b.index + 1}
        </label>
        <Badge tone="accent">{b.kind === 'kinetic' ? 'Time course' : 'Single read'}</Badge>
        {b.formatMatchesPlate ? (
          <Badge>{b.plateFormat} wells</Badge>
        ) : (
          <Badge tone="warning">
            {b.plateFormat} wells — this plate has {plateFormat}
          </Badge>
        )}
      </header>
      <div className="mt-2 flex flex-wrap gap-4">
        <dl className="grid min-w-64 flex-1 grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
          <dt className="text-ink-muted">Label</dt>
          <dd>{b.label}</dd>
          <dt className="text-ink-muted">Sheet</dt>
          <dd>{b.sheet || '—'}</dd>
          <dt className="text-ink-muted">Location</dt>
          <dd className="tabular-nums">{b.location}</dd>
          <dt className="text-ink-muted">Layout</dt>
          <dd>{b.layout}</dd>
          <dt className="text-ink-muted">Wavelength</dt>
          <dd>{b.wavelengthNm == null ? 'not found' : `${b.wavelengthNm} nm`}</dd>
          <dt className="text-ink-muted">Wells with values</dt>
          <dd className="tabular-nums">{b.wellsWithValues}</dd>
          <dt className="text-ink-muted">Missing</dt>
          <dd className="tabular-nums">
            {b.missing}
            {flagged && <span className="text-ink-muted"> ({flagged})</span>}
          </dd>
          <dt className="text-ink-muted">Time points</dt>
          <dd className="tabular-nums">{timeSummary(b.timesS)}</dd>
        </dl>
        <PlateHeatMap
          format={b.plateFormat}
          values={b.preview}
          flags={b.flags}
          cell={b.plateFormat === 384 ? 10 : 15}
          label={`Heat map of block ${b.index + 1}${b.kind === 'kinetic' ? ' (last value of each well)' : ''}`}
          legendTitle={b.kind === 'kinetic' ? 'Last value' : 'Value'}
        />
      </div>
      {choice.include && (
        <div className="mt-3 grid grid-cols-[1fr_8rem_auto] items-end gap-3 border-t border-line pt-2">
          {choice.asSeries ? (
            <p className="col-span-2 mb-1.5 text-sm text-ink-muted">
              One read of a time course: the label and wavelength are set below, with the times.
            </p>
          ) : (
            <>
              <label className="block">
                <span className="mb-0.5 block text-sm text-ink-muted">Read label</span>
                <input
                  className={input}
                  value={choice.label}
                  maxLength={200}
                  onChange={(e) => onChange({ ...choice, label: e.target.value })}
                />
              </label>
              <label className="block">
                <span className="mb-0.5 block text-sm text-ink-muted">Wavelength (nm)</span>
                <input
                  className={`${input} text-right`}
                  inputMode="numeric"
                  value={choice.wavelength}
                  onChange={(e) => onChange({ ...choice, wavelength: e.target.value })}
                />
              </label>
            </>
          )}
          {b.kind === 'endpoint' ? (
            <label className="mb-1.5 flex items-center gap-1.5 text-sm">
              <input
                type="checkbox"
                checked={choice.asSeries}
                onChange={(e) => onChange({ ...choice, asSeries: e.target.checked })}
              />
              Part of a time course
            </label>
          ) : (
            <span className="mb-1.5 text-sm text-ink-muted">Imported as a time course</span>
          )}
        </div>
      )}
    </article>
  );
}
