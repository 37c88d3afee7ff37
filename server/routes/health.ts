import type { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { AppContext } from '../context';

export function registerHealthRoutes(api: Router, { db }: AppContext) {
  api.get('/health', async (_req, res) => {
    await db.execute(sql`select 1`);
    res.json({ ok: true });
  });
}
