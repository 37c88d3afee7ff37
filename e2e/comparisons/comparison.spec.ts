// Comparisons on the demo seed's approved end-point study (generated data: FR1-D92N carries a real
// acid shift, FR1-E228Q one within error). The lead builds a comparison of three variants, sorts
// it by optimum, saves it, downloads the workbook and finds the screen's numbers in it, and prints
// the report; a viewer opens the shared link and finds no edit controls.
import ExcelJS from 'exceljs';
import { eq } from 'drizzle-orm';
import type { Locator } from '@playwright/test';
import { comparisons } from '../../server/db/schema';
import { expect, test } from '../fixtures';

const STUDY = 'FR1 end-point profile, approved round (demo)';
const DEMO_COMPARISON = 'FR1 acid-limb shortlist (demo)';

/** The first line of a cell (the value; its interval is on the second line). */
async function cellValue(table: Locator, row: Locator, header: string) {
  const headers = (await table.getByRole('columnheader').allInnerTexts()).map((h) =>
    h.replace(/\s+/g, ' ').trim(),
  );
  const index = headers.indexOf(header);
  expect(index, `column "${header}" in ${headers.join(' | ')}`).toBeGreaterThanOrEqual(0);
  return (await row.getByRole('cell').nth(index).innerText()).split('\n')[0].trim();
}

/** Variant names of the table's rows, top to bottom. */
const rowOrder = async (table: Locator) =>
  (await table.locator('tbody tr').allInnerTexts()).map((t) => t.split('\n')[0].trim());

test('when the lead compares three variants, sorts by optimum, saves, exports the workbook and prints the report, then the numbers agree everywhere', async ({
  page,
  loginAs,
}) => {
  test.setTimeout(120_000);
  await loginAs('lead');
  await page.goto('/comparisons');
  await page.getByRole('link', { name: 'New comparison' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'New comparison' })).toBeVisible();

  const study = page.getByRole('group', { name: STUDY });
  for (const variant of ['FR1-WT', 'FR1-D92N', 'FR1-E228Q'])
    await study.getByLabel(variant, { exact: true }).check();
  // The reference defaults to the parent of the first chosen study.
  await expect(page.getByLabel('Reference profile').locator('option:checked')).toHaveText(
    `FR1-WT — ${STUDY}`,
  );

  const table = page.getByRole('table', { name: 'Comparison of profiles' });
  await expect(table.locator('tbody tr')).toHaveCount(3);
  await expect(page.getByRole('figure', { name: 'Relative activity against pH' })).toBeVisible();
  // The real acid shift is highlighted; the shift within error is not.
  const d92n = table.getByRole('row', { name: /FR1-D92N/ });
  const e228q = table.getByRole('row', { name: /FR1-E228Q/ });
  const headers = (await table.getByRole('columnheader').allInnerTexts()).map((h) =>
    h.replace(/\s+/g, ' ').trim(),
  );
  const deltaPka1 = headers.indexOf('Δ pKa1');
  await expect(d92n.getByRole('cell').nth(deltaPka1).locator('[data-clear]')).toHaveCount(1);
  await expect(e228q.getByRole('cell').nth(deltaPka1).locator('[data-clear]')).toHaveCount(0);

  // Sorted by optimum, one way and then the other: the acid-shifted D92N at one end.
  const optimumHeader = table.getByRole('columnheader', { name: 'pH optimum', exact: true });
  for (let click = 0; click < 2; click += 1) {
    await optimumHeader.getByRole('button').click();
    const direction = await optimumHeader.getAttribute('aria-sort');
    expect(direction).toMatch(/^(ascending|descending)$/);
    const order = await rowOrder(table);
    const optima = (
      await Promise.all(
        order.map((v) => cellValue(table, table.getByRole('row', { name: new RegExp(v) }), 'pH optimum')),
      )
    ).map(Number);
    const sorted = [...optima].sort((a, b) => (direction === 'ascending' ? a - b : b - a));
    expect(optima).toEqual(sorted);
    expect(direction === 'ascending' ? order[0] : order.at(-1)).toBe('FR1-D92N');
  }

  // Saved under a name, it opens at its own address.
  const name = `Acid-limb check ${Date.now()} (e2e)`;
  await page.getByRole('button', { name: 'Save comparison…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Save comparison' });
  await dialog.getByLabel('Name').fill(name);
  await dialog.getByLabel('Notes').fill('Browser test: three variants of the approved demo round.');
  await dialog.getByRole('button', { name: 'Save comparison' }).click();
  await expect(page).toHaveURL(/\/comparisons\/[0-9a-f-]{36}$/);
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();

  const saved = page.getByRole('table', { name: 'Comparison of profiles' });
  const screenPka1 = await cellValue(saved, saved.getByRole('row', { name: /FR1-D92N/ }), 'apparent pKa1');
  const screenShift = await cellValue(saved, saved.getByRole('row', { name: /FR1-D92N/ }), 'Δ pKa1');

  // The workbook, downloaded and read back, holds the numbers on the screen.
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Workbook (xlsx)' }).click(),
  ]);
  expect(download.suggestedFilename()).toMatch(/\.xlsx$/);
  const book = new ExcelJS.Workbook();
  await book.xlsx.readFile(await download.path());
  const sheet = book.getWorksheet('Comparison')!;
  const header = (sheet.getRow(1).values as unknown[]).slice(1);
  const col = (title: string) => header.indexOf(title) + 1;
  const row = sheet
    .getRows(2, sheet.rowCount - 1)!
    .find(
      (r) =>
        r.getCell(col('variant')).value === 'FR1-D92N' &&
        r.getCell(col('quantity')).value === 'apparent pKa1',
    )!;
  expect(row).toBeTruthy();
  expect(Number(row.getCell(col('value')).value).toFixed(2)).toBe(screenPka1);
  const shift = Number(row.getCell(col('vs_reference_value')).value);
  expect(screenShift).toBe(`${shift < 0 ? '−' : '+'}${Math.abs(shift).toFixed(2)}`);
  expect(row.getCell(col('clear_difference')).value).toBe(true);

  // The printable report: Print calls the browser's print; on paper no navigation, the cautions kept.
  await page.getByRole('link', { name: 'Printable report' }).click();
  await expect(page.getByRole('article', { name })).toBeVisible();
  await page.evaluate(() => {
    (window as unknown as { printed: number }).printed = 0;
    window.print = () => {
      (window as unknown as { printed: number }).printed += 1;
    };
  });
  await page.getByRole('button', { name: 'Print' }).click();
  expect(await page.evaluate(() => (window as unknown as { printed: number }).printed)).toBe(1);
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeHidden();
  await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
  await expect(page.getByText('Results are research data, not a release test of any product.')).toBeVisible();
  await expect(
    page.getByRole('table', { name: 'Differences to the reference with their 95 % intervals' }),
  ).toBeVisible();
  await page.screenshot({ path: 'test-results/comparison-report-print.png', fullPage: true });
});

test('when a viewer opens the shared link of a saved comparison, then it reads the comparison without edit controls', async ({
  page,
  loginAs,
  db,
}) => {
  const [demo] = await db.select().from(comparisons).where(eq(comparisons.name, DEMO_COMPARISON));
  await loginAs('viewer');
  await page.goto(`/comparisons/${demo.id}`);
  await expect(page.getByRole('heading', { level: 1, name: DEMO_COMPARISON })).toBeVisible();
  const table = page.getByRole('table', { name: 'Comparison of profiles' });
  await expect(table.locator('tbody tr')).toHaveCount(3);
  await expect(page.getByRole('figure', { name: 'Relative activity against pH' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Copy link' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Workbook (xlsx)' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Edit' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Delete' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: /^Save (comparison|changes)/ })).toHaveCount(0);
  // The editor is not open to the role either, even by its address.
  await page.goto(`/comparisons/${demo.id}/edit`);
  await expect(page.getByRole('heading', { name: 'This page is not open to your role' })).toBeVisible();
});
