// One key factory for the review of a study: its history (steps and comments).
export const reviewKeys = {
  all: ['review'] as const,
  history: (studyId: string) => [...reviewKeys.all, 'history', studyId] as const,
};
