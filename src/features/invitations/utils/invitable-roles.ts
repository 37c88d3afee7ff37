import { roles, type Role } from '@shared/permissions';

/** Which roles a person may hand out in an invitation (the server enforces the same rule). */
export function invitableRoles(inviter: Role): readonly Role[] {
  if (inviter === 'admin') return roles;
  if (inviter === 'lead') return ['lead', 'scientist', 'viewer'];
  return [];
}
