// The main navigation: one simple list. Later features add their entry here (Enzymes, Assays,
// Studies, Buffer library, Comparisons); `permission` hides an entry from roles that lack it.
import type { Permission } from '@shared/permissions';
import { paths } from './paths';

export type NavEntry = { label: string; href: string; permission?: Permission; end?: boolean };

export const navigation: NavEntry[] = [
  { label: 'Home', href: paths.home.href(), end: true },
  { label: 'Teams', href: paths.teams.href() },
  { label: 'People', href: paths.people.href(), permission: 'users:read' },
  { label: 'Outbox', href: paths.outbox.href(), permission: 'outbox:read' },
  { label: 'Audit log', href: paths.audit.href(), permission: 'audit:read' },
  { label: 'Account', href: paths.account.href() },
];
