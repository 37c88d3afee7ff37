export const plateKeys = {
  all: ['plates'] as const,
  list: (studyId: string) => [...plateKeys.all, 'list', studyId] as const,
  detail: (plateId: string) => [...plateKeys.all, 'detail', plateId] as const,
  /** The study facts the editor needs (status, variants, pH points, quantitation). */
  studyContext: (studyId: string) => [...plateKeys.all, 'study-context', studyId] as const,
  /** Studies of a team a map may be copied into. */
  copyTargets: (teamId: string) => [...plateKeys.all, 'copy-targets', teamId] as const,
  templates: (teamId: string, format: number) => [...plateKeys.all, 'templates', teamId, format] as const,
};
