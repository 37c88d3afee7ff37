import type { Router } from 'express';
import { z } from 'zod';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import * as library from '../services/buffers/library';
import { params } from '../validate';

const slugParams = z.object({ id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'Not a buffer system id.').max(60) });

export function registerBufferRoutes(api: Router, { db }: AppContext) {
  api.get('/buffers', async (req, res) => {
    requirePermission(req, 'buffers:read');
    res.json(await library.listBuffers(db));
  });

  api.get('/buffers/:id', async (req, res) => {
    requirePermission(req, 'buffers:read');
    res.json(await library.getBuffer(db, params(req, slugParams).id));
  });

  // Lab-added systems: the body is a whole buffer system, validated by shared/chemistry's schema.
  api.post('/buffers', async (req, res) => {
    const user = requirePermission(req, 'buffers:manage');
    res.status(201).json(await library.createBuffer(db, user, req.body));
  });

  api.put('/buffers/:id', async (req, res) => {
    const user = requirePermission(req, 'buffers:manage');
    res.json(await library.updateBuffer(db, user, params(req, slugParams).id, req.body));
  });

  api.delete('/buffers/:id', async (req, res) => {
    const user = requirePermission(req, 'buffers:manage');
    await library.deleteBuffer(db, user, params(req, slugParams).id);
    res.status(204).end();
  });
}
