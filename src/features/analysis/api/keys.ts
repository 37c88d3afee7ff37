// One key factory for everything the analysis screens read: the study's analysis, a bootstrap job,
// and the plate, read and enzyme facts the wells and settings panels need.
export const analysisKeys = {
  all: ['analysis'] as const,
  study: (studyId: string) => [...analysisKeys.all, 'study', studyId] as const,
  job: (jobId: string) => [...analysisKeys.all, 'job', jobId] as const,
  plateReads: (plateId: string) => [...analysisKeys.all, 'plate-reads', plateId] as const,
  read: (readId: string) => [...analysisKeys.all, 'read', readId] as const,
  preparations: (enzymeId: string) => [...analysisKeys.all, 'preparations', enzymeId] as const,
};
