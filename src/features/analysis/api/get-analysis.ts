import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StudyAnalysis } from '@shared/schemas/analysis';
import { api } from '@/lib/api-client';
import { analysisKeys } from './keys';

/** The study's analysis: computed on the server (or its stored result), with settings and exclusions. */
export const getAnalysis = (studyId: string, signal?: AbortSignal) =>
  api.get<StudyAnalysis>(`/studies/${encodeURIComponent(studyId)}/analysis`, undefined, signal);

export const getAnalysisQueryOptions = (studyId: string) =>
  queryOptions({
    queryKey: analysisKeys.study(studyId),
    queryFn: ({ signal }) => getAnalysis(studyId, signal),
  });

export function useAnalysis(studyId: string) {
  return useQuery(getAnalysisQueryOptions(studyId));
}
