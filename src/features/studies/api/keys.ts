import type { StudyStatus } from '@shared/schemas/studies';

export type StudyFilters = { teamId?: string; status?: StudyStatus; mine?: boolean };

export const studyKeys = {
  all: ['studies'] as const,
  list: (filters: StudyFilters = {}) => [...studyKeys.all, 'list', filters] as const,
  detail: (id: string) => [...studyKeys.all, 'detail', id] as const,
};
