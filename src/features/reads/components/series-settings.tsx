// Grids marked "part of a time course" become one kinetic read: their times and its label.
import type { SeriesChoice } from '../utils/selection';
import { seriesTimes } from '../utils/selection';

export type SeriesSettingsProps = {
  count: number;
  series: SeriesChoice;
  onChange: (s: SeriesChoice) => void;
};

const input = 'h-8 w-full rounded border border-line-strong bg-surface px-2';

export function SeriesSettings({ count, series, onChange }: SeriesSettingsProps) {
  const times = seriesTimes(series, count);
  return (
    <section
      aria-label="Time course from grids"
      className="rounded border border-accent-300 bg-accent-50 p-3"
    >
      <h3 className="text-base">Time course from {count} grids</h3>
      <p className="text-sm text-ink-muted">
        The grids are taken in the order of the file; give the time of the first and the interval.
      </p>
      <div className="mt-2 grid grid-cols-[7rem_7rem_6rem_1fr_8rem] items-end gap-3">
        <label className="block">
          <span className="mb-0.5 block text-sm">First read at</span>
          <input
            className={`${input} text-right`}
            inputMode="decimal"
            value={series.start}
            onChange={(e) => onChange({ ...series, start: e.target.value })}
          />
        </label>
        <label className="block">
          <span className="mb-0.5 block text-sm">Interval</span>
          <input
            className={`${input} text-right`}
            inputMode="decimal"
            value={series.interval}
            onChange={(e) => onChange({ ...series, interval: e.target.value })}
          />
        </label>
        <label className="block">
          <span className="mb-0.5 block text-sm">Unit</span>
          <select
            className={input}
            value={series.unit}
            onChange={(e) => onChange({ ...series, unit: e.target.value as 's' | 'min' })}
          >
            <option value="s">seconds</option>
            <option value="min">minutes</option>
          </select>
        </label>
        <label className="block">
          <span className="mb-0.5 block text-sm">Label of the time course</span>
          <input
            className={input}
            value={series.label}
            maxLength={200}
            placeholder="from the first grid"
            onChange={(e) => onChange({ ...series, label: e.target.value })}
          />
        </label>
        <label className="block">
          <span className="mb-0.5 block text-sm">Wavelength (nm)</span>
          <input
            className={`${input} text-right`}
            inputMode="numeric"
            value={series.wavelength}
            onChange={(e) => onChange({ ...series, wavelength: e.target.value })}
          />
        </label>
      </div>
      <p className="mt-2 text-sm tabular-nums" role="status">
        {times
          ? `Times: ${times.map((t) => `${t} s`).join(', ')}`
          : 'Give a start of 0 or more and an interval above 0.'}
      </p>
    </section>
  );
}
