// The audit filters live in the address (?entity=user&from=2025-03-01…) so a filtered view can be
// shared, reloaded and walked back with the browser's Back button.

export type AuditFilters = { entity?: string; action?: string; actorId?: string; from?: string; to?: string };

const keys = ['entity', 'action', 'actorId', 'from', 'to'] as const;
const day = /^\d{4}-\d{2}-\d{2}$/;

export function filtersFromSearch(search: URLSearchParams): AuditFilters {
  const filters: AuditFilters = {};
  for (const key of keys) {
    const value = search.get(key)?.trim();
    if (!value) continue;
    if ((key === 'from' || key === 'to') && !day.test(value)) continue;
    filters[key] = value;
  }
  return filters;
}

export function filtersToSearch(filters: AuditFilters, offset = 0): Record<string, string> {
  const out: Record<string, string> = {};
  for (const key of keys) if (filters[key]) out[key] = filters[key];
  if (offset > 0) out.offset = String(offset);
  return out;
}

/** What the app writes so far (free text works too; later features add their own). */
export const knownEntities = ['user', 'team', 'team-member', 'invitation', 'password-reset'];
export const knownActions = [
  'create',
  'update',
  'add',
  'remove',
  'sign-in',
  'sign-out',
  'deactivate',
  'reactivate',
  'accept-invitation',
  'change-password',
  'request',
  'reset-password',
  'seed',
];
