// The main navigation: one simple list. Later features add their entry here (Enzymes, Assays,
// Studies, Buffer library, Comparisons); `permission` hides an entry from roles that lack it.
import type { Permission } from '@shared/permissions';
import { paths } from './paths';

export type NavEntry = { label: string; href: string; permission?: Permission; end?: boolean };

export const navigation: NavEntry[] = [
  { label: 'Home', href: paths.home.href(), end: true },
  { label: 'Studies', href: paths.studies.href(), permission: 'records:read' },
  { label: 'Enzymes', href: paths.enzymes.href(), permission: 'records:read' },
  { label: 'Assays', href: paths.assays.href(), permission: 'records:read' },
  { label: 'Buffer series', href: paths.bufferSeriesList.href(), permission: 'records:read' },
  { label: 'Buffer library', href: paths.buffers.href(), permission: 'buffers:read' },
  { label: 'Comparisons', href: paths.comparisons.href(), permission: 'records:read' },
  { label: 'Teams', href: paths.teams.href() },
  { label: 'People', href: paths.people.href(), permission: 'users:read' },
  { label: 'Outbox', href: paths.outbox.href(), permission: 'outbox:read' },
  { label: 'Audit log', href: paths.audit.href(), permission: 'audit:read' },
  { label: 'Account', href: paths.account.href() },
];
