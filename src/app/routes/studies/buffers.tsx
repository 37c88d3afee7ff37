// The study's Buffers tab: the attached series (its points, cautions and charts), or ways to get one:
// design a series for this study, or attach a saved series of the team.
import { useState } from 'react';
import { Link, useParams } from 'react-router';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useSeries } from '@/features/buffer-series/api/get-series';
import { useSeriesList } from '@/features/buffer-series/api/get-series-list';
import { SeriesCautions } from '@/features/buffer-series/components/series-cautions';
import { SeriesCharts } from '@/features/buffer-series/components/series-charts';
import { SeriesResults } from '@/features/buffer-series/components/series-results';
import { SeriesSummaryCard } from '@/features/buffer-series/components/series-summary';
import { useLabSystems } from '@/features/buffers/api/get-lab-systems';
import { useStudy } from '@/features/studies/api/get-study';
import { useUpdateStudy } from '@/features/studies/api/update-study';
import { isEditable } from '@/features/studies/utils/study-status';
import { useCan } from '@/lib/auth';

const linkButton =
  'inline-flex h-9 items-center rounded border border-accent-700 bg-accent-700 px-3.5 font-semibold text-white hover:bg-accent-800';

export default function StudyBuffersRoute() {
  const { studyId = '' } = useParams();
  const study = useStudy(studyId);
  const canWrite = useCan('records:write');
  const series = useSeries(study.data?.bufferSeriesId);
  const labSystems = useLabSystems();
  if (!study.data) return null;
  const s = study.data;
  const mayEdit = canWrite && isEditable(s.status);
  if (!s.bufferSeriesId) {
    return (
      <div className="max-w-3xl space-y-4">
        <Notice title="No buffer series yet">
          A study needs one buffer per pH point, chosen and made up for the assay temperature.
        </Notice>
        {mayEdit && (
          <div className="flex items-end gap-6">
            <Link to={paths.bufferSeriesNew.href({ studyId: s.id })} className={linkButton}>
              Design a buffer series for this study
            </Link>
            <AttachSeries studyId={s.id} teamId={s.teamId} notes={s.notes} />
          </div>
        )}
      </div>
    );
  }
  if (series.isPending) return <Loading label="Loading the buffer series…" />;
  if (series.isError) return <Notice tone="error">{series.error.message}</Notice>;
  const d = series.data;
  return (
    <div className="space-y-5">
      <div className="grid grid-cols-[1fr_auto] items-start gap-6">
        <SeriesSummaryCard series={d} />
        <Link
          to={paths.bufferSeries.href(d.id)}
          className="inline-flex h-9 items-center rounded border border-line-strong bg-surface px-3.5 font-semibold hover:bg-canvas"
        >
          Open in the designer
        </Link>
      </div>
      <SeriesResults design={d.design} />
      <SeriesCautions design={d.design} />
      <SeriesCharts design={d.design} request={d.input} library={labSystems} />
    </div>
  );
}

// The PATCH schema fills absent optional fields with their defaults (notes '', series null), so the
// study's notes are sent back unchanged with the series.
function AttachSeries({ studyId, teamId, notes }: { studyId: string; teamId: string; notes: string }) {
  const list = useSeriesList({ teamId });
  const [chosen, setChosen] = useState('');
  const toast = useToast();
  const update = useUpdateStudy({ onSuccess: () => toast.show('Buffer series attached.') });
  if (!list.data || list.data.length === 0) return null;
  return (
    <div className="flex items-end gap-2">
      <label className="block">
        <span className="mb-1 block font-semibold">or attach a saved series</span>
        <select
          value={chosen}
          onChange={(e) => setChosen(e.target.value)}
          className="h-9 rounded border border-line-strong bg-surface px-2"
        >
          <option value="">Choose…</option>
          {list.data.map((x) => (
            <option key={x.id} value={x.id}>
              {x.name}
            </option>
          ))}
        </select>
      </label>
      <Button
        disabled={!chosen}
        busy={update.isPending}
        onClick={() => update.mutate({ id: studyId, change: { bufferSeriesId: chosen, notes } })}
      >
        Attach
      </Button>
      {update.error && <p className="text-sm text-danger-600">{update.error.message}</p>}
    </div>
  );
}
