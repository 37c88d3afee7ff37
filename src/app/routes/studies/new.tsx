// A new study (?bufferSeriesId= when it starts from a saved series).
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { seriesKeys } from '@/features/buffer-series/api/keys';
import { useEnzyme } from '@/features/enzymes/api/get-enzyme';
import { StudyForm } from '@/features/studies/components/study-form';
import { useTeams } from '@/features/teams/api/get-teams';
import { useStudyOptions } from './study-options';

export default function NewStudyRoute() {
  const [search] = useSearchParams();
  const bufferSeriesId = search.get('bufferSeriesId') ?? undefined;
  const navigate = useNavigate();
  const toast = useToast();
  const queryClient = useQueryClient();
  const teams = useTeams();
  const { pending, error, options } = useStudyOptions();
  const [enzymeId, setEnzymeId] = useState('');
  const enzyme = useEnzyme(enzymeId || null);
  if (teams.isPending || pending) return <Loading label="Loading enzymes, assays and series…" />;
  if (teams.isError) return <QueryError error={teams.error} what="your teams" />;
  if (error) return <QueryError error={error} what="the records a study needs" />;
  const fromSeries = options.series.find((s) => s.id === bufferSeriesId);
  return (
    <>
      <PageHeader
        title="New study"
        description={
          fromSeries
            ? `Starting from the buffer series “${fromSeries.name}”.`
            : 'Choose the enzyme and its variants, the assay and (now or later) the buffer series.'
        }
      />
      <StudyForm
        teams={teams.data}
        enzymes={options.enzymes}
        assays={options.assays}
        series={options.series}
        variants={enzymeId ? enzyme.data?.variants : undefined}
        onEnzymeChange={setEnzymeId}
        defaults={{ teamId: fromSeries?.teamId, bufferSeriesId: fromSeries?.id }}
        onSaved={(study) => {
          toast.show(`Study “${study.name}” created.`);
          void queryClient.invalidateQueries({ queryKey: seriesKeys.all });
          void navigate(paths.study.href(study.id));
        }}
        onCancel={() => void navigate(paths.studies.href())}
      />
    </>
  );
}
