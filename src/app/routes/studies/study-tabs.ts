// The tabs of a study page (/studies/:studyId/…): one list, relative paths. Later screens (Analysis,
// Review) add their entry here and their child route under the study layout in router.tsx.
export type StudyTab = { to: string; label: string; end?: boolean };

export const studyTabs: StudyTab[] = [
  { to: '', label: 'Overview', end: true },
  { to: 'buffers', label: 'Buffers' },
  { to: 'plates', label: 'Plates' },
  { to: 'analysis', label: 'Analysis' },
  { to: 'review', label: 'Review' },
];
