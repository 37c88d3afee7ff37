import type { Router } from 'express';
import { idParams } from '../../shared/schemas/common';
import { approveSchema, commentSchema, returnSchema, submitSchema, unlockSchema } from '../../shared/schemas/review';
import { requirePermission } from '../auth/authorize';
import { sendAfterCommit, type AppContext } from '../context';
import { getAnalysis } from '../services/analysis/analysis';
import { addComment, studyHistory, transition } from '../services/review/review';
import { body, params } from '../validate';

export function registerReviewRoutes(api: Router, ctx: AppContext) {
  api.post('/studies/:id/submit', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    const { study, mail } = await transition(ctx, user, id, 'submit', body(req, submitSchema).message);
    res.json({ status: study.status, mailSent: await sendAfterCommit(ctx, mail) });
  });

  api.post('/studies/:id/withdraw', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { study } = await transition(ctx, user, params(req, idParams).id, 'withdraw', '');
    res.json({ status: study.status });
  });

  api.post('/studies/:id/approve', async (req, res) => {
    const user = requirePermission(req, 'studies:review');
    const { id } = params(req, idParams);
    const comment = body(req, approveSchema).comment;
    // The analysis the lead reviewed is stored before the lock (its fits then serve comparisons).
    await getAnalysis(ctx.db, user, id).catch(() => undefined);
    const { study, mail } = await transition(ctx, user, id, 'approve', comment);
    res.json({ status: study.status, mailSent: await sendAfterCommit(ctx, mail) });
  });

  api.post('/studies/:id/return', async (req, res) => {
    const user = requirePermission(req, 'studies:review');
    const { id } = params(req, idParams);
    const { study, mail } = await transition(ctx, user, id, 'return', body(req, returnSchema).comment);
    res.json({ status: study.status, mailSent: await sendAfterCommit(ctx, mail) });
  });

  api.post('/studies/:id/unlock', async (req, res) => {
    const user = requirePermission(req, 'studies:unlock');
    const { id } = params(req, idParams);
    const { study, mail } = await transition(ctx, user, id, 'unlock', body(req, unlockSchema).reason);
    res.json({ status: study.status, mailSent: await sendAfterCommit(ctx, mail) });
  });

  api.get('/studies/:id/history', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await studyHistory(ctx, user, params(req, idParams).id));
  });

  api.post('/studies/:id/comments', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.status(201).json(await addComment(ctx, user, id, body(req, commentSchema).body));
  });
}
