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
} as const;
