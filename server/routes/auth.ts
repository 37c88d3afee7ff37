import type { Request, Router } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { inArray } from 'drizzle-orm';
import { permissionsOf } from '../../shared/permissions';
import type { Me } from '../../shared/schemas/api-types';
import {
  acceptInvitationSchema,
  changePasswordSchema,
  invitationCreateSchema,
  resetRequestSchema,
  resetSchema,
  signInSchema,
  tokenSchema,
} from '../../shared/schemas/auth';
import { z } from 'zod';
import { requirePermission, requireUser } from '../auth/authorize';
import { newCsrfToken } from '../auth/csrf';
import { PgRateLimitStore } from '../auth/rate-limit-store';
import { findCurrentUser } from '../auth/current-user';
import type { AppContext } from '../context';
import { sendAfterCommit } from '../context';
import { teams } from '../db/schema';
import { AppError } from '../errors';
import { acceptInvitation, createInvitation, viewInvitation } from '../services/accounts/invitations';
import { requestPasswordReset, resetPassword } from '../services/accounts/password-reset';
import { changePassword, verifyCredentials } from '../services/accounts/sign-in';
import { body, params } from '../validate';
import type { CurrentUser } from '../types';
import { writeAudit } from '../services/audit/write-audit';

const tokenParams = z.object({ token: tokenSchema });

function regenerate(req: Request) {
  return new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
}
function save(req: Request) {
  return new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
}

export async function describeMe(ctx: AppContext, user: CurrentUser, csrfToken: string): Promise<Me> {
  const rows = user.teamIds.length
    ? await ctx.db.select({ id: teams.id, name: teams.name }).from(teams).where(inArray(teams.id, user.teamIds))
    : [];
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    teams: rows.sort((a, b) => a.name.localeCompare(b.name)),
    permissions: permissionsOf(user.role),
    csrfToken,
  };
}

function loginLimiters(ctx: AppContext) {
  const { perAccount, perAddress, windowMinutes } = ctx.config.loginLimits;
  const handler = () => {
    throw new AppError('too_many_attempts', `Too many failed sign-ins. Wait ${windowMinutes} minutes, or reset your password.`, 429);
  };
  const common = { windowMs: windowMinutes * 60_000, skipSuccessfulRequests: true, standardHeaders: 'draft-8' as const, legacyHeaders: false, handler };
  // counts in the database: they hold across restarts and across app processes
  return [
    rateLimit({ ...common, store: new PgRateLimitStore(ctx.db, 'sign-in:'), limit: perAddress, keyGenerator: (req) => `ip:${ipKeyGenerator(req.ip ?? '')}` }),
    rateLimit({
      ...common,
      store: new PgRateLimitStore(ctx.db, 'sign-in:'),
      limit: perAccount,
      keyGenerator: (req) => {
        const email: unknown = (req.body as { email?: unknown } | undefined)?.email;
        return `account:${typeof email === 'string' ? email.trim().toLowerCase() : ''}`;
      },
    }),
  ];
}

export function registerAuthRoutes(api: Router, ctx: AppContext) {
  const { db, config } = ctx;

  api.post('/auth/sign-in', ...loginLimiters(ctx), async (req, res) => {
    const input = body(req, signInSchema);
    const user = await verifyCredentials(db, input.email, input.password);
    // A new session id at sign-in (no fixation), with its own CSRF token.
    await regenerate(req);
    req.session.userId = user.id;
    req.session.csrfToken = newCsrfToken();
    await save(req);
    const current = await findCurrentUser(db, user.id);
    if (!current) throw new AppError('invalid_credentials', 'E-mail or password is not correct.', 401);
    res.json(await describeMe(ctx, current, req.session.csrfToken));
  });

  api.post('/auth/sign-out', async (req, res) => {
    const user = requireUser(req);
    await db.transaction((tx) => writeAudit(tx, { actorId: user.id, entity: 'user', entityId: user.id, action: 'sign-out' }));
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    res.clearCookie('bw.sid', { path: '/' });
    res.status(204).end();
  });

  api.get('/me', async (req, res) => {
    const user = requireUser(req);
    res.json(await describeMe(ctx, user, req.session.csrfToken ?? ''));
  });

  api.post('/me/password', async (req, res) => {
    const user = requirePermission(req, 'account:use');
    const input = body(req, changePasswordSchema);
    await changePassword(db, user.id, input.currentPassword, input.newPassword);
    res.status(204).end();
  });

  api.post('/auth/password-reset', async (req, res) => {
    const input = body(req, resetRequestSchema);
    const mail = await requestPasswordReset(db, input.email, config.appUrl);
    await sendAfterCommit(ctx, mail);
    res.status(202).json({ message: 'If an account uses this address, a reset link is on its way. It works once, within one hour.' });
  });

  api.post('/auth/password-reset/complete', async (req, res) => {
    const input = body(req, resetSchema);
    await resetPassword(db, input.token, input.newPassword);
    res.status(204).end();
  });

  api.post('/invitations', async (req, res) => {
    const user = requirePermission(req, 'invitations:create');
    const input = body(req, invitationCreateSchema);
    const { mail, expiresAt } = await createInvitation(db, user, input, config.appUrl);
    const mailSent = await sendAfterCommit(ctx, mail);
    res.status(201).json({ email: input.email, expiresAt: expiresAt.toISOString(), mailSent });
  });

  api.get('/invitations/:token', async (req, res) => {
    const { token } = params(req, tokenParams);
    res.json(await viewInvitation(db, token));
  });

  api.post('/invitations/:token/accept', async (req, res) => {
    const { token } = params(req, tokenParams);
    const input = body(req, acceptInvitationSchema);
    const user = await acceptInvitation(db, token, input);
    res.status(201).json({ email: user.email });
  });
}
