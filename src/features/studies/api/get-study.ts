import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StudyDetail } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { studyKeys } from './keys';

export const getStudy = (id: string, signal?: AbortSignal) =>
  api.get<StudyDetail>(`/studies/${encodeURIComponent(id)}`, undefined, signal);

export const getStudyQueryOptions = (id: string) =>
  queryOptions({ queryKey: studyKeys.detail(id), queryFn: ({ signal }) => getStudy(id, signal) });

/** One study with its variants (in the study's order), owner, status and version. */
export function useStudy(id: string | null | undefined) {
  return useQuery({ ...getStudyQueryOptions(id ?? ''), enabled: Boolean(id) });
}
