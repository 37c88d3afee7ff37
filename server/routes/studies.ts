import type { Router } from 'express';
import { idParams } from '../../shared/schemas/common';
import { studyCreateSchema, studyListQuery, studyUpdateSchema } from '../../shared/schemas/studies';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import * as service from '../services/records/studies';
import { body, params, patch, query } from '../validate';

export function registerStudyRoutes(api: Router, { db }: AppContext) {
  api.get('/studies', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await service.listStudies(db, user, query(req, studyListQuery)));
  });

  api.post('/studies', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    res.status(201).json(await service.createStudy(db, user, body(req, studyCreateSchema)));
  });

  api.get('/studies/:id', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await service.getStudy(db, user, params(req, idParams).id));
  });

  api.patch('/studies/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await service.updateStudy(db, user, id, patch(req, studyUpdateSchema)));
  });

  api.delete('/studies/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await service.deleteStudy(db, user, params(req, idParams).id);
    res.status(204).end();
  });
}
