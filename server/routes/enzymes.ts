import type { Router } from 'express';
import { idParams } from '../../shared/schemas/common';
import {
  enzymeCreateSchema,
  enzymeUpdateSchema,
  preparationCreateSchema,
  preparationUpdateSchema,
  teamFilterQuery,
  variantCreateSchema,
  variantUpdateSchema,
} from '../../shared/schemas/enzymes';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import * as service from '../services/records/enzymes';
import { body, params, patch, query } from '../validate';

export function registerEnzymeRoutes(api: Router, { db }: AppContext) {
  api.get('/enzymes', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    const { teamId } = query(req, teamFilterQuery);
    res.json(await service.listEnzymes(db, user, teamId));
  });

  api.post('/enzymes', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    res.status(201).json(await service.createEnzyme(db, user, body(req, enzymeCreateSchema)));
  });

  api.get('/enzymes/:id', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await service.getEnzyme(db, user, params(req, idParams).id));
  });

  api.patch('/enzymes/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await service.updateEnzyme(db, user, id, patch(req, enzymeUpdateSchema)));
  });

  api.delete('/enzymes/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await service.deleteEnzyme(db, user, params(req, idParams).id);
    res.status(204).end();
  });

  api.post('/enzymes/:id/variants', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.status(201).json(await service.createVariant(db, user, id, body(req, variantCreateSchema)));
  });

  api.patch('/variants/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await service.updateVariant(db, user, id, patch(req, variantUpdateSchema)));
  });

  api.delete('/variants/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await service.deleteVariant(db, user, params(req, idParams).id);
    res.status(204).end();
  });

  api.post('/variants/:id/preparations', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.status(201).json(await service.createPreparation(db, user, id, body(req, preparationCreateSchema)));
  });

  api.patch('/preparations/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await service.updatePreparation(db, user, id, patch(req, preparationUpdateSchema)));
  });

  api.delete('/preparations/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await service.deletePreparation(db, user, params(req, idParams).id);
    res.status(204).end();
  });
}
