// Roles and what each may do: the one permission table. The server enforces it on every route;
// the client reads it only to hide what a role cannot do.
export const roles = ['admin', 'lead', 'scientist', 'viewer'] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  admin: 'Admin',
  lead: 'Group lead',
  scientist: 'Scientist',
  viewer: 'Viewer',
};

const everyone: readonly Role[] = roles;
const writers: readonly Role[] = ['admin', 'lead', 'scientist'];
const leads: readonly Role[] = ['admin', 'lead'];
const admins: readonly Role[] = ['admin'];

export const permissionTable = {
  'account:use': everyone,
  'users:read': admins,
  'users:manage': admins,
  'invitations:create': leads,
  'teams:read': everyone,
  'teams:manage': admins,
  'audit:read': admins,
  'outbox:read': admins,
  'buffers:read': everyone,
  'buffers:manage': admins,
  'records:read': everyone,
  'records:write': writers,
  'studies:review': leads,
  'studies:unlock': admins,
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissionTable;

export function can(role: Role | null | undefined, permission: Permission): boolean {
  if (!role) return false;
  return (permissionTable[permission] as readonly Role[]).includes(role);
}

export function permissionsOf(role: Role): Permission[] {
  return (Object.keys(permissionTable) as Permission[]).filter((p) => can(role, p));
}
