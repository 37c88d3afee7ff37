// Every URL of the app, in one typed place. `path` is the router pattern; `href()` builds a link.

/** Only same-app paths may be a redirect target (never another site). */
export function safeRedirect(target: string | null | undefined, fallback = '/'): string {
  if (!target || !target.startsWith('/') || target.startsWith('//') || target.startsWith('/\\'))
    return fallback;
  return target;
}

/**
 * What a page may hand to the sign-in page: a notice to show and the e-mail to fill in.
 * `signedOut` marks the arrival from Sign out (the user is still cached for a moment).
 */
export type SignInState = { email?: string; notice?: string; signedOut?: boolean };

export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: {
    path: '/sign-in',
    href: (redirectTo?: string | null) =>
      redirectTo && redirectTo !== '/' ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}` : '/sign-in',
  },
  resetRequest: { path: '/reset-password', href: () => '/reset-password' },
  resetPassword: {
    path: '/reset-password/:token',
    href: (token: string) => `/reset-password/${encodeURIComponent(token)}`,
  },
  invitation: {
    path: '/invitation/:token',
    href: (token: string) => `/invitation/${encodeURIComponent(token)}`,
  },
  account: { path: '/account', href: () => '/account' },
  teams: { path: '/teams', href: () => '/teams' },
  team: { path: '/teams/:teamId', href: (teamId: string) => `/teams/${encodeURIComponent(teamId)}` },
  people: { path: '/admin/people', href: () => '/admin/people' },
  outbox: { path: '/admin/outbox', href: () => '/admin/outbox' },
  outboxMessage: {
    path: '/admin/outbox/:messageId',
    href: (messageId: string) => `/admin/outbox/${encodeURIComponent(messageId)}`,
  },
  audit: { path: '/admin/audit', href: () => '/admin/audit' },
  // Records (issue 4): enzymes, assays, studies, the buffer library and buffer series.
  enzymes: { path: '/enzymes', href: () => '/enzymes' },
  enzyme: { path: '/enzymes/:enzymeId', href: (id: string) => `/enzymes/${encodeURIComponent(id)}` },
  assays: { path: '/assays', href: () => '/assays' },
  assayNew: { path: '/assays/new', href: () => '/assays/new' },
  assay: { path: '/assays/:assayId', href: (id: string) => `/assays/${encodeURIComponent(id)}` },
  assayEdit: {
    path: '/assays/:assayId/edit',
    href: (id: string) => `/assays/${encodeURIComponent(id)}/edit`,
  },
  studies: { path: '/studies', href: () => '/studies' },
  studyNew: {
    path: '/studies/new',
    href: (from: { bufferSeriesId?: string } = {}) =>
      from.bufferSeriesId
        ? `/studies/new?bufferSeriesId=${encodeURIComponent(from.bufferSeriesId)}`
        : '/studies/new',
  },
  study: { path: '/studies/:studyId', href: (id: string) => `/studies/${encodeURIComponent(id)}` },
  studyBuffers: {
    path: '/studies/:studyId/buffers',
    href: (id: string) => `/studies/${encodeURIComponent(id)}/buffers`,
  },
  // Plates of a study (issue 5): list, map editor with the plate's reads, reader-file import.
  studyPlates: {
    path: '/studies/:studyId/plates',
    href: (studyId: string) => `/studies/${encodeURIComponent(studyId)}/plates`,
  },
  plate: {
    path: '/studies/:studyId/plates/:plateId',
    href: (studyId: string, plateId: string, view?: 'reads') =>
      `/studies/${encodeURIComponent(studyId)}/plates/${encodeURIComponent(plateId)}${view ? `?view=${view}` : ''}`,
  },
  plateImport: {
    path: '/studies/:studyId/plates/:plateId/import',
    href: (studyId: string, plateId: string) =>
      `/studies/${encodeURIComponent(studyId)}/plates/${encodeURIComponent(plateId)}/import`,
  },
  // Analysis and review of a study (issue 6); the analysis tab keeps its view in the query string.
  studyAnalysis: {
    path: '/studies/:studyId/analysis',
    href: (studyId: string, view?: 'profiles' | 'wells' | 'exclusions' | 'qc' | 'settings') =>
      `/studies/${encodeURIComponent(studyId)}/analysis${view ? `?view=${view}` : ''}`,
  },
  studyReview: {
    path: '/studies/:studyId/review',
    href: (studyId: string) => `/studies/${encodeURIComponent(studyId)}/review`,
  },
  buffers: { path: '/buffers', href: () => '/buffers' },
  bufferNew: { path: '/buffers/new', href: () => '/buffers/new' },
  buffer: { path: '/buffers/:bufferId', href: (id: string) => `/buffers/${encodeURIComponent(id)}` },
  bufferEdit: {
    path: '/buffers/:bufferId/edit',
    href: (id: string) => `/buffers/${encodeURIComponent(id)}/edit`,
  },
  bufferSeriesList: { path: '/buffer-series', href: () => '/buffer-series' },
  bufferSeriesNew: {
    path: '/buffer-series/new',
    href: (forStudy: { studyId?: string } = {}) =>
      forStudy.studyId
        ? `/buffer-series/new?studyId=${encodeURIComponent(forStudy.studyId)}`
        : '/buffer-series/new',
  },
  bufferSeries: {
    path: '/buffer-series/:seriesId',
    href: (id: string) => `/buffer-series/${encodeURIComponent(id)}`,
  },
  // Comparisons and printable reports (issue 7).
  comparisons: { path: '/comparisons', href: () => '/comparisons' },
  comparisonNew: { path: '/comparisons/new', href: () => '/comparisons/new' },
  comparison: {
    path: '/comparisons/:comparisonId',
    href: (id: string) => `/comparisons/${encodeURIComponent(id)}`,
  },
  comparisonEdit: {
    path: '/comparisons/:comparisonId/edit',
    href: (id: string) => `/comparisons/${encodeURIComponent(id)}/edit`,
  },
  comparisonReport: {
    path: '/comparisons/:comparisonId/report',
    href: (id: string) => `/comparisons/${encodeURIComponent(id)}/report`,
  },
  studyReport: {
    path: '/studies/:studyId/report',
    href: (id: string) => `/studies/${encodeURIComponent(id)}/report`,
  },
} as const;
