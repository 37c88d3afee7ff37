import type { Router } from 'express';
import { bootstrapStartSchema, exclusionCreateSchema, exclusionLiftSchema, settingsSaveSchema } from '../../shared/schemas/analysis';
import { idParams } from '../../shared/schemas/common';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import * as analysis from '../services/analysis/analysis';
import * as jobs from '../services/analysis/jobs';
import { body, params } from '../validate';

export function registerAnalysisRoutes(api: Router, ctx: AppContext) {
  const { db } = ctx;

  api.get('/studies/:id/analysis', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await analysis.getAnalysis(db, user, params(req, idParams).id));
  });

  api.put('/studies/:id/analysis/settings', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    const { version, settings } = body(req, settingsSaveSchema);
    res.json(await analysis.saveSettings(db, user, id, version, settings));
  });

  api.post('/studies/:id/exclusions', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.status(201).json(await analysis.excludeWells(db, user, id, body(req, exclusionCreateSchema)));
  });

  api.post('/exclusions/:id/lift', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await analysis.liftExclusion(db, user, id, body(req, exclusionLiftSchema).reason));
  });

  // Recomputes from the stored inputs and compares with the stored result; stores nothing.
  api.post('/studies/:id/analysis/recompute', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await analysis.recomputeAndCompare(db, user, params(req, idParams).id));
  });

  api.post('/studies/:id/analysis/bootstrap', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.status(202).json(await jobs.startBootstrap(ctx, user, id, body(req, bootstrapStartSchema).resamples));
  });

  api.get('/analysis-jobs/:id', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await jobs.getJob(db, user, params(req, idParams).id));
  });
}
