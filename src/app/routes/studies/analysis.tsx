// The study's Analysis tab: the server's analysis of the study, read-only for viewers and while
// the study is in review or approved (the note says why).
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { getAnalysisQueryOptions, useAnalysis } from '@/features/analysis/api/get-analysis';
import { AnalysisScreen } from '@/features/analysis/components/analysis-screen';
import { useStudy } from '@/features/studies/api/get-study';
import { isEditable, lockReason } from '@/features/studies/utils/study-status';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(queryClient, 'records:read', () =>
      queryClient.ensureQueryData(getAnalysisQueryOptions(params.studyId ?? '')),
    );

export default function StudyAnalysisRoute() {
  const { studyId = '' } = useParams();
  const study = useStudy(studyId);
  const analysis = useAnalysis(studyId);
  const canWrite = useCan('records:write');
  if (analysis.isPending || !study.data) return <Loading label="Analysing the study…" />;
  if (analysis.isError)
    return <QueryError error={analysis.error} what="the analysis" onRetry={() => void analysis.refetch()} />;
  const status = study.data.status;
  const editable = canWrite && isEditable(status);
  const readOnlyReason = !canWrite
    ? 'Your role can read the analysis and export its charts, but not change it.'
    : lockReason(status);
  return (
    <AnalysisScreen
      analysis={analysis.data}
      enzymeId={study.data.enzymeId}
      editable={editable}
      readOnlyReason={readOnlyReason}
      onReload={() => void analysis.refetch()}
      reloading={analysis.isFetching}
    />
  );
}
