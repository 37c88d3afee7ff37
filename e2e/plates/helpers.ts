// Shared steps of the plate browser tests: find the demo studies, make a plate, paint by mouse.
import path from 'node:path';
import type { APIRequestContext, Page } from '@playwright/test';
import { expect } from '../fixtures';

export const readerFixture = (name: string) => path.resolve('tests/fixtures/readers', name);

type StudyRow = { id: string; name: string; status: string };

/** The demo seed's studies (their names end in "(demo)"), read with the signed-in page's session.
 *  Other browser tests make studies of their own; those are never picked. */
export async function demoStudy(request: APIRequestContext, status: 'draft' | 'in_review' | 'approved') {
  const res = await request.get('/api/studies');
  expect(res.ok()).toBe(true);
  const study = ((await res.json()) as StudyRow[]).find((s) => s.status === status && s.name.endsWith('(demo)'));
  if (!study) throw new Error(`the demo seed has no ${status} study`);
  return study;
}

export async function firstPlateOf(request: APIRequestContext, studyId: string) {
  const res = await request.get(`/api/studies/${studyId}/plates`);
  const [plate] = (await res.json()) as { id: string; name: string }[];
  return plate;
}

/** Creates a plate through the "New plate" dialog and waits for its editor. */
export async function createPlate(page: Page, studyId: string, name: string, format: 96 | 384 = 96) {
  await page.goto(`/studies/${studyId}/plates`);
  await page.getByRole('button', { name: 'New plate' }).click();
  const dialog = page.getByRole('dialog', { name: 'New plate' });
  await dialog.getByLabel('Plate name').fill(name);
  await dialog.getByLabel(format === 96 ? /96 wells/ : /384 wells/).check();
  await dialog.getByRole('button', { name: 'Create plate' }).click();
  await expect(page.getByRole('heading', { name })).toBeVisible();
  await expect(page.getByRole('grid', { name: `Plate map of ${name}` })).toBeVisible();
}

export const well = (page: Page, name: string) => page.locator(`[role="gridcell"][data-well="${name}"]`);

/** Presses on one well, drags to another and lets go (a rectangle). */
export async function drag(page: Page, from: string, to: string) {
  const a = await well(page, from).boundingBox();
  const b = await well(page, to).boundingBox();
  if (!a || !b) throw new Error('wells not on screen');
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move((a.x + b.x) / 2 + a.width / 2, (a.y + b.y) / 2 + a.height / 2, { steps: 4 });
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 4 });
  await page.mouse.up();
}
