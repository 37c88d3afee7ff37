import type { Router } from 'express';
import { assayCreateSchema, assayUpdateSchema } from '../../shared/schemas/assays';
import { idParams } from '../../shared/schemas/common';
import { teamFilterQuery } from '../../shared/schemas/enzymes';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import * as service from '../services/records/assays';
import { body, params, patch, query } from '../validate';

export function registerAssayRoutes(api: Router, { db }: AppContext) {
  api.get('/assays', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await service.listAssays(db, user, query(req, teamFilterQuery).teamId));
  });

  api.post('/assays', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    res.status(201).json(await service.createAssay(db, user, body(req, assayCreateSchema)));
  });

  api.get('/assays/:id', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await service.getAssay(db, user, params(req, idParams).id));
  });

  api.patch('/assays/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await service.updateAssay(db, user, id, patch(req, assayUpdateSchema)));
  });

  api.delete('/assays/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await service.deleteAssay(db, user, params(req, idParams).id);
    res.status(204).end();
  });
}
