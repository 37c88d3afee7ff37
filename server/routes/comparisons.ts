import type { Response, Router } from 'express';
import { idParams } from '../../shared/schemas/common';
import { availableProfilesQuery, comparisonInputSchema, comparisonSaveSchema, comparisonUpdateSchema } from '../../shared/schemas/comparisons';
import { teamFilterQuery } from '../../shared/schemas/enzymes';
import { requirePermission } from '../auth/authorize';
import type { AppContext } from '../context';
import * as comparisons from '../services/comparisons/comparisons';
import { comparisonCsv, comparisonWorkbook } from '../services/exports/comparison-export';
import { studyCsv, studyWorkbook } from '../services/exports/study-export';
import { homeView } from '../services/home/home';
import { body, params, query } from '../validate';

const fileName = (name: string, ext: string) => `${name.replace(/[^\w.-]+/g, '-').replace(/-+/g, '-').slice(0, 80) || 'bellwether'}.${ext}`;

function sendXlsx(res: Response, name: string, buffer: Buffer) {
  res.set('Content-Type', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
  res.set('Content-Disposition', `attachment; filename="${fileName(name, 'xlsx')}"`);
  res.send(buffer);
}

function sendCsv(res: Response, name: string, csv: string) {
  res.set('Content-Type', 'text/csv; charset=utf-8');
  res.set('Content-Disposition', `attachment; filename="${fileName(name, 'csv')}"`);
  res.send(`\uFEFF${csv}`);
}

export function registerComparisonRoutes(api: Router, { db }: AppContext) {
  api.get('/home', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await homeView(db, user));
  });

  api.get('/comparisons/profiles', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await comparisons.availableProfiles(db, user, query(req, availableProfilesQuery)));
  });

  api.post('/comparisons/preview', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await comparisons.computeComparison(db, user, body(req, comparisonInputSchema)));
  });

  api.get('/comparisons', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await comparisons.listComparisons(db, user, query(req, teamFilterQuery).teamId));
  });

  api.post('/comparisons', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    res.status(201).json(await comparisons.saveComparison(db, user, body(req, comparisonSaveSchema)));
  });

  api.get('/comparisons/:id', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    res.json(await comparisons.getComparison(db, user, params(req, idParams).id));
  });

  api.put('/comparisons/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    const { id } = params(req, idParams);
    res.json(await comparisons.updateComparison(db, user, id, body(req, comparisonUpdateSchema)));
  });

  api.delete('/comparisons/:id', async (req, res) => {
    const user = requirePermission(req, 'records:write');
    await comparisons.deleteComparison(db, user, params(req, idParams).id);
    res.status(204).end();
  });

  api.get('/comparisons/:id/export.xlsx', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    const file = await comparisonWorkbook(db, user, params(req, idParams).id);
    sendXlsx(res, file.name, file.buffer);
  });

  api.get('/comparisons/:id/export.csv', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    const file = await comparisonCsv(db, user, params(req, idParams).id);
    sendCsv(res, file.name, file.csv);
  });

  api.get('/studies/:id/export.xlsx', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    const file = await studyWorkbook(db, user, params(req, idParams).id);
    sendXlsx(res, file.name, file.buffer);
  });

  api.get('/studies/:id/export.csv', async (req, res) => {
    const user = requirePermission(req, 'records:read');
    const file = await studyCsv(db, user, params(req, idParams).id);
    sendCsv(res, file.name, file.csv);
  });
}
