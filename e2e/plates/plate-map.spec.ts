// The plate map editor and the import of reader files, as a scientist, a second editor and a
// viewer use them (issue 5). Reader files are the generated fixtures of tests/fixtures/readers.
import { expect, test } from '../fixtures';
import { createPlate, demoStudy, drag, firstPlateOf, readerFixture, well } from './helpers';

test('when a scientist builds a 96-well map by painting and filling, saves it and imports a kinetic and an end-point file, then the plate shows the map and both reads', async ({
  page,
  loginAs,
}) => {
  test.setTimeout(120_000);
  await loginAs('scientist');
  const study = await demoStudy(page.request, 'draft');
  const name = `E2E map ${Date.now()}`;
  await createPlate(page, study.id, name);

  // Triplicates down rows: two variants × 3 rows over 12 columns, then a row of blanks.
  await page.getByRole('button', { name: 'Replicate pattern…' }).click();
  const pattern = page.getByRole('dialog', { name: 'Replicate pattern' });
  await expect(pattern.getByLabel('FR1-WT')).toBeChecked();
  await expect(pattern.getByLabel('FR1-D92N', { exact: true })).toBeChecked();
  await expect(pattern.getByLabel('Replicates per variant')).toHaveValue('3');
  await pattern.getByLabel('Wells per row').fill('12');
  await pattern.getByRole('button', { name: 'Lay out' }).click();
  await expect(well(page, 'C12')).toHaveAccessibleName(/^C12, Sample, FR1-WT, replicate 3$/);
  await expect(well(page, 'F1')).toHaveAccessibleName(/^F1, Sample, FR1-D92N, replicate 3$/);
  await expect(well(page, 'G6')).toHaveAccessibleName(/^G6, Blank \(no enzyme\)/);

  // Paint row H as buffer-only wells by dragging with the Paint tool.
  await page.getByRole('group', { name: 'Brush' }).getByText('Paint', { exact: true }).click();
  await page.getByRole('group', { name: 'Brush' }).getByText('Buffer only').click();
  await drag(page, 'H1', 'H12');
  await expect(well(page, 'H1')).toHaveAccessibleName(/^H1, Buffer only/);
  await expect(well(page, 'H12')).toHaveAccessibleName(/^H12, Buffer only/);
  await expect(well(page, 'G12')).toHaveAccessibleName(/^G12, Blank/);

  // The pH series of the study's buffer series along the rows, over all eight rows.
  await page.getByRole('group', { name: 'Brush' }).getByText('Select', { exact: true }).click();
  await well(page, 'A1').click();
  await page.getByRole('button', { name: 'Fill pH series…' }).click();
  const fill = page.getByRole('dialog', { name: 'Fill pH series' });
  await fill.getByLabel('Number of rows to fill').fill('8');
  await expect(fill.getByRole('status')).toContainText('12 of 12 pH points fit from A1');
  await fill.getByRole('button', { name: 'Fill' }).click();
  await expect(well(page, 'A1')).toHaveAccessibleName(/^A1, Sample, FR1-WT, pH 2\.5, .+, replicate 1$/);
  await expect(well(page, 'F12')).toHaveAccessibleName(/^F12, Sample, FR1-D92N, pH 8, .+, replicate 3$/);
  await expect(well(page, 'H7')).toHaveAccessibleName(/^H7, Buffer only, pH 5\.5/);
  await expect(page.getByRole('region', { name: 'Checks' }).getByRole('status')).toHaveText('No problems');

  // Keyboard: type a pH into a well, undo it, redo it, undo again.
  await well(page, 'B2').click();
  await page.keyboard.type('6.1');
  await page.keyboard.press('Enter');
  await expect(well(page, 'B2')).toHaveAccessibleName(/pH 6\.1/);
  await expect(page.getByRole('region', { name: 'Checks' }).getByRole('status')).toHaveText('3 to look at');
  await page.keyboard.press('Control+z');
  await expect(well(page, 'B2')).toHaveAccessibleName(/pH 3,/);
  await page.keyboard.press('Control+Shift+z');
  await expect(well(page, 'B2')).toHaveAccessibleName(/pH 6\.1/);
  await page.keyboard.press('Control+z');

  await page.getByRole('button', { name: 'Save map' }).click();
  await expect(page.getByText('Saved · version 2')).toBeVisible();

  // A kinetic workbook: one time course found; import it as it is.
  await page.getByRole('link', { name: 'Import reader file' }).click();
  await page.getByLabel('Reader file').setInputFiles(readerFixture('kinetic-seconds.xlsx'));
  const kinetic = page.getByRole('article', { name: /^Block 1:/ });
  await expect(kinetic.getByText('Time course', { exact: true })).toBeVisible();
  await expect(kinetic.getByRole('img', { name: /Heat map of block 1/ })).toBeVisible();
  await kinetic.getByLabel('Wavelength (nm)').fill('410');
  await page.getByRole('button', { name: 'Import 1 read' }).click();
  const reads = page.getByRole('table', { name: 'Imported reads' });
  await expect(reads.getByRole('row')).toHaveCount(2);
  await expect(reads.getByRole('cell', { name: 'Time course', exact: true })).toBeVisible();
  await expect(page.getByRole('img', { name: /^Time course of / })).toBeVisible();

  // An end-point workbook: one grid; say what it is, then import.
  await page.getByRole('link', { name: 'Import reader file' }).click();
  await page.getByLabel('Reader file').setInputFiles(readerFixture('endpoint-96-single.xlsx'));
  const endpoint = page.getByRole('article', { name: /^Block 1:/ });
  await expect(endpoint.getByText('Single read', { exact: true })).toBeVisible();
  await expect(endpoint.getByText('96 wells', { exact: true })).toBeVisible();
  await endpoint.getByLabel('Read label').fill('End point after stop');
  await endpoint.getByLabel('Wavelength (nm)').fill('405');
  await page.getByRole('button', { name: 'Import 1 read' }).click();
  await expect(reads.getByRole('row')).toHaveCount(3);
  await expect(reads.getByRole('cell', { name: 'End point after stop', exact: true })).toBeVisible();
  await expect(reads.getByRole('cell', { name: '405', exact: true })).toBeVisible();
  await expect(page.getByRole('tab', { name: 'Reads (2)' })).toBeVisible();
  await expect(reads.getByRole('link', { name: /Raw file/ })).toHaveCount(2);

  // The plate list counts them.
  await page.goto(`/studies/${study.id}/plates`);
  const row = page.getByRole('row', { name: new RegExp(name) });
  await expect(row.getByRole('cell').nth(2)).toHaveText('2');
});

test('when a map is saved from a stale copy, then the editor says someone saved since and offers to reload, keeping the copy to paste back', async ({
  page,
  loginAs,
  context,
}) => {
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  await loginAs('scientist');
  const study = await demoStudy(page.request, 'draft');
  const name = `E2E stale ${Date.now()}`;
  await createPlate(page, study.id, name);
  const plateId = page.url().split('/').pop()!;

  // Someone else saves version 2 while this editor still holds version 1.
  const me = (await (await page.request.get('/api/me')).json()) as { csrfToken: string };
  const other = await page.request.put(`/api/plates/${plateId}/map`, {
    headers: { 'X-CSRF-Token': me.csrfToken },
    data: { version: 1, map: { replicatesRequired: 3, wells: { A1: { role: 'blank', pH: 5 } } } },
  });
  expect(other.status()).toBe(200);

  await well(page, 'D4').click();
  await page.keyboard.press('x');
  await expect(well(page, 'D4')).toHaveAccessibleName('D4, Unused');
  await page.getByRole('button', { name: 'Save map' }).click();
  const dialog = page.getByRole('dialog', { name: 'Someone saved since' });
  await expect(dialog).toContainText('saved by someone else since you opened it');
  await dialog.getByRole('button', { name: 'Copy mine to the clipboard and reload' }).click();
  await expect(dialog).toBeHidden();
  await expect(well(page, 'A1')).toHaveAccessibleName(/^A1, Blank \(no enzyme\), pH 5/);
  await expect(well(page, 'D4')).toHaveAccessibleName('D4, no role');
  await expect(page.getByText('Saved · version 2')).toBeVisible();

  // Paste puts this editor's version back; saving it now builds on version 2.
  await well(page, 'A1').click();
  await page.keyboard.press('Control+v');
  await expect(well(page, 'D4')).toHaveAccessibleName('D4, Unused');
  await expect(well(page, 'A1')).toHaveAccessibleName('A1, no role');
  await page.getByRole('button', { name: 'Save map' }).click();
  await expect(page.getByText('Saved · version 3')).toBeVisible();
});

test('when a viewer opens a plate, then the map is read-only and there is no upload', async ({
  page,
  loginAs,
}) => {
  await loginAs('viewer');
  const study = await demoStudy(page.request, 'draft');
  const plate = await firstPlateOf(page.request, study.id);

  await page.goto(`/studies/${study.id}/plates`);
  await expect(page.getByRole('link', { name: plate.name })).toBeVisible();
  await expect(page.getByRole('button', { name: 'New plate' })).toHaveCount(0);
  await expect(page.getByRole('link', { name: /^Import/ })).toHaveCount(0);

  await page.getByRole('link', { name: plate.name }).click();
  await expect(page.getByText('Your role can look at plate maps but not change them.')).toBeVisible();
  await expect(page.getByRole('grid', { name: `Plate map of ${plate.name}` })).toBeVisible();
  await expect(page.getByRole('group', { name: 'Brush' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Save map' })).toHaveCount(0);
  await expect(page.getByRole('link', { name: 'Import reader file' })).toHaveCount(0);

  // Keys change nothing; the inspector shows but does not edit.
  const before = await well(page, 'A1').getAttribute('aria-label');
  await well(page, 'A1').click();
  await page.keyboard.press('b');
  await page.keyboard.press('Delete');
  await expect(well(page, 'A1')).toHaveAttribute('aria-label', before!);
  await expect(page.getByRole('region', { name: /^Well A1/ }).getByLabel('Role')).toBeDisabled();

  await page.getByRole('tab', { name: /^Reads/ }).click();
  const reads = page.getByRole('table', { name: 'Imported reads' });
  await expect(reads.getByRole('link', { name: /Raw file/ }).first()).toBeVisible();
  await expect(reads.getByRole('button', { name: /^Delete/ })).toHaveCount(0);
  await page.goto(`/studies/${study.id}/plates/${plate.id}/import`);
  await expect(page.getByText('Your role can look at plate maps but not change them.')).toBeVisible();
  await expect(page.getByLabel('Reader file')).toHaveCount(0);
});

test('when the study is in review, then a scientist sees the map read-only', async ({ page, loginAs }) => {
  await loginAs('scientist');
  const study = await demoStudy(page.request, 'in_review');
  const plate = await firstPlateOf(page.request, study.id);
  await page.goto(`/studies/${study.id}/plates/${plate.id}`);
  await expect(page.getByText('Read-only: the study is in review')).toBeVisible();
  await expect(page.getByRole('group', { name: 'Brush' })).toHaveCount(0);
});
