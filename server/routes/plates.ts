import type { Router } from 'express';
import { z } from 'zod';
import { idParams } from '../../shared/schemas/common';
import {
  importSelectionSchema,
  plateCopySchema,
  plateCreateSchema,
  plateMapSaveSchema,
  plateRenameSchema,
  templateCreateSchema,
  templateListQuery,
} from '../../shared/schemas/plates';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import * as plates from '../services/plates/plates';
import * as readsService from '../services/plates/reads';
import * as templates from '../services/plates/templates';
import { receiveFile } from '../upload';
import { body, params, parseWith, query } from '../validate';

const selectionField = z.string({ message: 'Send the chosen blocks in a "selection" field.' }).transform((text, ctx) => {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    ctx.addIssue({ code: 'custom', message: 'The "selection" field is not valid JSON.' });
    return z.NEVER;
  }
});

export function registerPlateRoutes(api: Router, { db }: AppContext) {
  api.get('/studies/:id/plates', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await plates.listPlates(db, user, params(req, idParams).id));
  });

  api.post('/studies/:id/plates', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.status(201).json(await plates.createPlate(db, user, id, body(req, plateCreateSchema)));
  });

  api.get('/plates/:id', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await plates.getPlate(db, user, params(req, idParams).id));
  });

  api.patch('/plates/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await plates.renamePlate(db, user, id, body(req, plateRenameSchema).name));
  });

  api.put('/plates/:id/map', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    const { version, map } = body(req, plateMapSaveSchema);
    res.json(await plates.saveMap(db, user, id, version, map));
  });

  api.post('/plates/:id/copy', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.status(201).json(await plates.copyPlate(db, user, id, body(req, plateCopySchema)));
  });

  api.delete('/plates/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await plates.deletePlate(db, user, params(req, idParams).id);
    res.status(204).end();
  });

  api.post('/plates/:id/reads/preview', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    const upload = await receiveFile(req, res);
    res.json(await readsService.previewImport(db, user, id, upload));
  });

  api.post('/plates/:id/reads', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    const upload = await receiveFile(req, res);
    const selection = parseWith(importSelectionSchema, parseWith(selectionField, (req.body as { selection?: unknown }).selection, 'selection'), 'selection');
    res.status(201).json(await readsService.importReads(db, user, id, upload, selection, upload.contentType));
  });

  api.get('/plates/:id/reads', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await readsService.listReads(db, user, params(req, idParams).id));
  });

  api.get('/reads/:id', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await readsService.getRead(db, user, params(req, idParams).id));
  });

  api.delete('/reads/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await readsService.deleteRead(db, user, params(req, idParams).id);
    res.status(204).end();
  });

  api.get('/reader-files/:id/raw', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    const file = await readsService.rawFile(db, user, params(req, idParams).id);
    res.set('Content-Type', file.contentType);
    res.set('Content-Disposition', `attachment; filename*=UTF-8''${encodeURIComponent(file.fileName)}`);
    res.set('X-Content-SHA256', file.sha256);
    res.send(file.content);
  });

  api.get('/plate-templates', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await templates.listTemplates(db, user, query(req, templateListQuery)));
  });

  api.post('/plate-templates', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    res.status(201).json(await templates.createTemplate(db, user, body(req, templateCreateSchema)));
  });

  api.delete('/plate-templates/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await templates.deleteTemplate(db, user, params(req, idParams).id);
    res.status(204).end();
  });
}
