import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AnalysisJob } from '@shared/schemas/analysis';
import { api } from '@/lib/api-client';
import { analysisKeys } from './keys';

export const getAnalysisJob = (jobId: string, signal?: AbortSignal) =>
  api.get<AnalysisJob>(`/analysis-jobs/${encodeURIComponent(jobId)}`, undefined, signal);

export const isJobActive = (job: AnalysisJob | null | undefined) =>
  job?.state === 'queued' || job?.state === 'running';

const POLL_MS = 1000;

export const getAnalysisJobQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: analysisKeys.job(jobId),
    queryFn: ({ signal }) => getAnalysisJob(jobId, signal),
    // Poll while the job is queued or running; stop once it is done or failed.
    refetchInterval: (query) => (isJobActive(query.state.data) || !query.state.data ? POLL_MS : false),
  });

/** A background job, polled every second while it runs (the page stays usable meanwhile). */
export function useAnalysisJob(jobId: string | null, enabled: boolean) {
  return useQuery({ ...getAnalysisJobQueryOptions(jobId ?? ''), enabled: Boolean(jobId) && enabled });
}
