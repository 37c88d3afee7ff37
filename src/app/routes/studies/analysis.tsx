// The study's Analysis tab: the server's analysis of the study, read-only for viewers and while
// the study is in review or approved (the note says why).
import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { Notice, QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getAnalysisQueryOptions, useAnalysis } from '@/features/analysis/api/get-analysis';
import { AnalysisScreen } from '@/features/analysis/components/analysis-screen';
import { useStudy } from '@/features/studies/api/get-study';
import { isEditable, lockReason } from '@/features/studies/utils/study-status';
import { ApiError } from '@/lib/api-client';
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
  if (analysis.isError) {
    // 422: the study cannot be analysed as it stands; say what is missing and where to go.
    if (analysis.error instanceof ApiError && analysis.error.status === 422) {
      const missing = ['analysis_no_plates', 'analysis_no_reads', 'analysis_no_variants'].includes(
        analysis.error.code,
      );
      return (
        <Notice
          tone={missing ? 'info' : 'warning'}
          title={missing ? 'Nothing to analyse yet' : 'The study cannot be analysed as it stands'}
        >
          <p>{analysis.error.message}</p>
          <Link to={paths.studyPlates.href(studyId)} className="font-semibold text-accent-700 underline">
            {missing ? 'Lay out the plates and import their reads' : 'Check the plates and their reads'}
          </Link>
        </Notice>
      );
    }
    return <QueryError error={analysis.error} what="the analysis" onRetry={() => void analysis.refetch()} />;
  }
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
