// The buffer series designer: /buffer-series/new (optionally ?studyId= to attach the result to a
// study) and /buffer-series/:seriesId for a saved series. Composes the library, teams and studies.
import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useSeries } from '@/features/buffer-series/api/get-series';
import { SeriesDesigner } from '@/features/buffer-series/components/series-designer';
import { useBuffers } from '@/features/buffers/api/get-buffers';
import { useLabSystems } from '@/features/buffers/api/get-lab-systems';
import { useStudies } from '@/features/studies/api/get-studies';
import { useStudy } from '@/features/studies/api/get-study';
import { studyKeys } from '@/features/studies/api/keys';
import { useTeams } from '@/features/teams/api/get-teams';
import { useCan } from '@/lib/auth';

export default function BufferSeriesDesignerRoute() {
  const { seriesId } = useParams();
  const [search] = useSearchParams();
  const studyId = search.get('studyId');
  const navigate = useNavigate();
  const toast = useToast();
  const queryClient = useQueryClient();
  const canWrite = useCan('records:write');
  const saved = useSeries(seriesId);
  const library = useBuffers();
  const labSystems = useLabSystems();
  const teams = useTeams();
  const study = useStudy(studyId);
  const studies = useStudies({}, { enabled: canWrite });

  if ((seriesId && saved.isPending) || library.isPending || teams.isPending || (studyId && study.isPending)) {
    return <Loading label="Opening the designer…" />;
  }
  if (seriesId && saved.isError) return <QueryError error={saved.error} what="this buffer series" />;
  if (library.isError) return <QueryError error={library.error} what="the buffer library" />;
  if (teams.isError) return <QueryError error={teams.error} what="your teams" />;
  const forStudy = study.data
    ? { id: study.data.id, name: study.data.name, teamId: study.data.teamId }
    : undefined;
  const editableStudies = (studies.data ?? [])
    .filter((s) => s.status === 'draft' || s.status === 'returned')
    .map((s) => ({ id: s.id, name: s.name, teamId: s.teamId }));

  return (
    <>
      <div className="print:hidden">
        <p className="mb-1 text-sm">
          <Link to={paths.bufferSeriesList.href()} className="text-accent-700 hover:underline">
            Buffer series
          </Link>
          {forStudy && (
            <>
              {' · for '}
              <Link to={paths.study.href(forStudy.id)} className="text-accent-700 hover:underline">
                {forStudy.name}
              </Link>
            </>
          )}
        </p>
        <PageHeader
          title={saved.data?.name ?? 'Design a buffer series'}
          description={
            saved.data
              ? `Used by ${saved.data.usedBy.length === 0 ? 'no study yet' : saved.data.usedBy.map((s) => s.name).join(', ')}.`
              : 'For every pH point the designer proposes the buffer whose pK″ at the assay temperature and ionic strength lies nearest (within one unit), with its recipe and capacity.'
          }
        />
      </div>
      <SeriesDesigner
        key={seriesId ?? 'new'}
        saved={saved.data}
        library={library.data}
        labSystems={labSystems}
        teams={teams.data}
        studies={editableStudies}
        forStudy={forStudy}
        canWrite={canWrite}
        onReload={() => saved.refetch()}
        onDeleted={() => {
          toast.show('Buffer series deleted.');
          void navigate(paths.bufferSeriesList.href());
        }}
        onSaved={(s, attach) => {
          toast.show(`Series “${s.name}” saved.`);
          void queryClient.invalidateQueries({ queryKey: studyKeys.all });
          if (attach.kind === 'new-study') void navigate(paths.studyNew.href({ bufferSeriesId: s.id }));
          else if (attach.kind === 'study' && attach.studyId)
            void navigate(paths.studyBuffers.href(attach.studyId));
          else void navigate(paths.bufferSeries.href(s.id));
        }}
      />
    </>
  );
}
