// One read: a heat map of its wells (the end-point value, or each well's last value of a time
// course) and, for a time course, the chosen well's curve.
import { useState } from 'react';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useRead } from '../api/get-read';
import { PlateHeatMap } from './plate-heat-map';
import { Sparkline } from './sparkline';

export type ReadViewerProps = { readId: string; format: 96 | 384 };

export function ReadViewer({ readId, format }: ReadViewerProps) {
  const read = useRead(readId);
  const [well, setWell] = useState<string | null>(null);
  if (read.isPending) return <Loading label="Loading the read…" />;
  if (read.isError)
    return <QueryError error={read.error} what="the read" onRetry={() => void read.refetch()} />;
  const r = read.data;
  const kinetic = r.kind === 'kinetic';
  const values: Record<string, number | null> = {};
  const flags: Record<string, string> = {};
  for (const w of r.wells) {
    values[w.well] = kinetic ? ((w.values ?? []).findLast((v) => v !== null) ?? null) : w.value;
    if (w.flag) flags[w.well] = w.flag;
  }
  const chosen =
    well ?? (kinetic ? (r.wells.find((w) => w.values?.some((v) => v !== null))?.well ?? null) : null);
  const chosenData = chosen ? r.wells.find((w) => w.well === chosen) : undefined;
  return (
    <section
      aria-label={`Read ${r.label}`}
      className="flex flex-wrap items-start gap-6 rounded border border-line bg-surface p-3"
    >
      <div>
        <h3 className="mb-1 text-base">
          {r.label}
          {r.wavelengthNm ? ` · ${r.wavelengthNm} nm` : ''}
        </h3>
        <PlateHeatMap
          format={format}
          values={values}
          flags={flags}
          cell={format === 384 ? 16 : 30}
          label={`Heat map of ${r.label}${kinetic ? ', last value of each well' : ''}`}
          legendTitle={kinetic ? 'Last value' : 'Value'}
          selectedWell={chosen}
          onSelectWell={setWell}
        />
        <p className="mt-1 text-sm text-ink-muted">
          {kinetic ? 'Click a well to see its time course.' : 'Click a well to see its value.'} Sheet{' '}
          {r.sheet || '—'}, cells {r.location}.
        </p>
      </div>
      <div className="min-w-72">
        {chosenData ? (
          <>
            <h4 className="font-semibold">Well {chosenData.well}</h4>
            {kinetic && r.timesS ? (
              <Sparkline
                timesS={r.timesS}
                values={chosenData.values ?? []}
                label={`Time course of ${chosenData.well}`}
              />
            ) : (
              <p className="tabular-nums">
                {chosenData.value ?? `missing (${chosenData.flag ?? 'no value'})`}
              </p>
            )}
            {chosenData.flag && <p className="text-sm text-danger-600">Flag: {chosenData.flag}</p>}
          </>
        ) : (
          <p className="text-ink-muted">No well chosen.</p>
        )}
      </div>
    </section>
  );
}
