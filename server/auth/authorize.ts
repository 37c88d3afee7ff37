// Route-level checks: who may call (permission table) and which team's data they may touch.
import type { Request } from 'express';
import { can, type Permission } from '../../shared/permissions';
import { forbidden, notFound, unauthorized } from '../errors';
import type { CurrentUser } from '../types';

export function requireUser(req: Request): CurrentUser {
  if (!req.user) throw unauthorized();
  return req.user;
}

export function requirePermission(req: Request, permission: Permission): CurrentUser {
  const user = requireUser(req);
  if (!can(user.role, permission)) throw forbidden();
  return user;
}

/** Data belongs to a team: outsiders get 404 so existence does not leak (admins see all). */
export function assertTeamAccess(user: CurrentUser, teamId: string | null | undefined, what = 'That record') {
  if (user.role === 'admin') return;
  if (!teamId || !user.teamIds.includes(teamId)) throw notFound(what);
}

/** Team ids a user may read: all (null) for admins, else their memberships. */
export function readableTeamIds(user: CurrentUser): string[] | null {
  return user.role === 'admin' ? null : user.teamIds;
}
