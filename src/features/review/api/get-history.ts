import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StudyEvent } from '@shared/schemas/review';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

/** Who did what when: submissions, decisions, unlocks and comments, oldest first. */
export const getHistory = (studyId: string, signal?: AbortSignal) =>
  api.get<StudyEvent[]>(`/studies/${encodeURIComponent(studyId)}/history`, undefined, signal);

export const getHistoryQueryOptions = (studyId: string) =>
  queryOptions({
    queryKey: reviewKeys.history(studyId),
    queryFn: ({ signal }) => getHistory(studyId, signal),
  });

export function useStudyHistory(studyId: string | null | undefined) {
  return useQuery({ ...getHistoryQueryOptions(studyId ?? ''), enabled: Boolean(studyId) });
}
