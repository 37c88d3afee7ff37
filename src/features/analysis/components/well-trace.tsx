// A kinetic well's time course from its read, with the window its rate was fitted over shaded and
// the fitted line drawn across it.
import type { WellRow } from '@shared/analysis';
import { TimeCourseChart } from '@/components/charts/time-course-chart';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { usePlateReads } from '../api/get-plate-reads';
import { useReadTraces } from '../api/get-read';
import { readInUse, windowLine } from '../utils/reads';
import { windowSourceWords } from '../utils/words';

export type WellTraceProps = {
  row: WellRow;
  plateName: string;
  chosenReadId: string | undefined;
  signalUnit: string;
};

export function WellTrace({ row, plateName, chosenReadId, signalUnit }: WellTraceProps) {
  const reads = usePlateReads(row.plateId);
  const read = reads.data ? readInUse(reads.data, chosenReadId, true) : null;
  const traces = useReadTraces(read?.id ?? null);
  if (reads.isPending || (read && traces.isPending)) return <Loading label="Loading the time course…" />;
  if (reads.isError) return <QueryError error={reads.error} what="the plate's reads" />;
  if (traces.isError) return <QueryError error={traces.error} what="the read" />;
  if (!read || !traces.data?.timesS)
    return <p className="text-ink-muted">This plate has no time course to show.</p>;
  const values = traces.data.wells.find((w) => w.well === row.well)?.values;
  if (!values) return <p className="text-ink-muted">The read has no values for {row.well}.</p>;
  const times = traces.data.timesS;
  const w = row.window;
  const window = w && w.startS !== null && w.endS !== null ? { startS: w.startS, endS: w.endS } : null;
  // The signal unit is per minute ('A410/min'); the trace itself is in the unit before '/min'.
  const traceUnit = signalUnit.replace(/\/min$/, '');
  return (
    <TimeCourseChart
      title={`${row.well}: time course`}
      xLabel="Time (s)"
      yLabel={traceUnit}
      times={times}
      values={values}
      window={window ? { start: window.startS, end: window.endS } : null}
      windowLabel={w ? `rate window (${windowSourceWords[w.source]})` : undefined}
      line={window ? windowLine(times, values, window) : null}
      height={230}
      caption={`${plateName}, read “${read.label}” (${read.fileName}). Dark dots: the reads the rate was fitted to; the line is its least-squares fit.`}
    />
  );
}
