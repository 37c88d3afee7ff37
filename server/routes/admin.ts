// Admin screens' API: accounts, teams, the audit log and the outbox of the local mail server.
import type { Router } from 'express';
import { auditQuerySchema, outboxQuerySchema } from '../../shared/schemas/admin';
import { userUpdateSchema } from '../../shared/schemas/auth';
import { idParams } from '../../shared/schemas/common';
import { teamCreateSchema, teamMemberAddSchema, teamMemberParams } from '../../shared/schemas/teams';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import { listUsers, updateUser } from '../services/accounts/users';
import { readAudit } from '../services/audit/read-audit';
import { listOutbox, readMessage } from '../services/mail/outbox';
import { addMember, createTeam, getTeam, listTeams, removeMember } from '../services/teams/teams';
import { body, params, query } from '../validate';

export function registerAdminRoutes(api: Router, ctx: AppContext) {
  const { db } = ctx;

  api.get('/users', async (req, res) => {
    requirePermission(req, 'users:read');
    res.json(await listUsers(db));
  });

  api.patch('/users/:id', async (req, res) => {
    const actor = requirePermission(req, 'users:manage');
    const { id } = params(req, idParams);
    const change = body(req, userUpdateSchema);
    const user = await updateUser(db, actor, id, change);
    res.json({ id: user.id, role: user.role, active: user.active });
  });

  api.get('/teams', async (req, res) => {
    const user = requirePermission(req, 'teams:read');
    res.json(await listTeams(db, user));
  });

  api.get('/teams/:id', async (req, res) => {
    const user = requirePermission(req, 'teams:read');
    const { id } = params(req, idParams);
    res.json(await getTeam(db, user, id));
  });

  api.post('/teams', async (req, res) => {
    const actor = requirePermission(req, 'teams:manage');
    const input = body(req, teamCreateSchema);
    res.status(201).json(await createTeam(db, actor, input));
  });

  api.post('/teams/:id/members', async (req, res) => {
    const actor = requirePermission(req, 'teams:manage');
    const { id } = params(req, idParams);
    const { userId } = body(req, teamMemberAddSchema);
    await addMember(db, actor, id, userId);
    res.status(204).end();
  });

  api.delete('/teams/:id/members/:userId', async (req, res) => {
    const actor = requirePermission(req, 'teams:manage');
    const { id, userId } = params(req, teamMemberParams);
    await removeMember(db, actor, id, userId);
    res.status(204).end();
  });

  api.get('/audit', async (req, res) => {
    requirePermission(req, 'audit:read');
    res.json(await readAudit(db, query(req, auditQuerySchema)));
  });

  api.get('/outbox', async (req, res) => {
    requirePermission(req, 'outbox:read');
    res.json(await listOutbox(db, query(req, outboxQuerySchema)));
  });

  api.get('/outbox/:id', async (req, res) => {
    requirePermission(req, 'outbox:read');
    const { id } = params(req, idParams);
    res.json(await readMessage(db, id));
  });
}
