import type { Router } from 'express';
import { idParams } from '../../shared/schemas/common';
import { teamFilterQuery } from '../../shared/schemas/enzymes';
import { seriesInputSchema, seriesSaveSchema, seriesUpdateSchema } from '../../shared/schemas/buffer-series';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import { recipeWorkbook } from '../services/buffers/recipe-workbook';
import * as series from '../services/buffers/series';
import { body, params, query } from '../validate';

export function registerBufferSeriesRoutes(api: Router, { db }: AppContext) {
  // Designing computes; nothing is stored until the series is saved.
  api.post('/buffer-series/design', async (req, res) => {
    requirePermission(req, 'records:read');
    res.json(await series.designPreview(db, body(req, seriesInputSchema)));
  });

  api.get('/buffer-series', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await series.listSeries(db, user, query(req, teamFilterQuery).teamId));
  });

  api.post('/buffer-series', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    res.status(201).json(await series.saveSeries(db, user, body(req, seriesSaveSchema)));
  });

  api.get('/buffer-series/:id', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await series.getSeries(db, user, params(req, idParams).id));
  });

  api.patch('/buffer-series/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await series.updateSeries(db, user, id, body(req, seriesUpdateSchema)));
  });

  api.delete('/buffer-series/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await series.deleteSeries(db, user, params(req, idParams).id);
    res.status(204).end();
  });

  api.get('/buffer-series/:id/recipes.xlsx', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    const row = await series.getSeries(db, user, params(req, idParams).id);
    const file = await recipeWorkbook(row.name, row.design, row.input.volumeMl);
    const safeName = row.name.replace(/[^\w.-]+/g, '-').slice(0, 60) || 'series';
    res.set('Content-Type', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    res.set('Content-Disposition', `attachment; filename="${safeName}-recipes.xlsx"`);
    res.send(file);
  });
}
