// The scientist's first stop before any plate: register the enzyme and its variants, define the
// assay, design the buffer series, print its recipe sheet and start a study from it. A viewer then
// reads the study and finds nothing to change.
import { eq } from 'drizzle-orm';
import { enzymes, variants } from '../../server/db/schema';
import { expect, test } from '../fixtures';

test('when a scientist registers an enzyme, an assay and a series from pH 3 to 9 and saves it to a new study, then a viewer reads the study without edit controls', async ({
  page,
  context,
  loginAs,
  db,
}) => {
  // A long story, and designs are computed by the server: give a busy test machine time.
  test.setTimeout(240_000);
  const designed = { timeout: 45_000 };
  const stamp = Date.now();
  const enzymeName = `Xylanase XT${stamp} (test, generated)`;
  const assayName = `XT${stamp} kinetic 405 nm (test)`;
  const studyName = `XT${stamp} pH profile (test)`;
  await loginAs('scientist');

  // The enzyme, its parent and one variant; a malformed mutation list is refused on its field.
  await page.goto('/enzymes');
  await page.getByRole('button', { name: 'New enzyme' }).click();
  const enzymeDialog = page.getByRole('dialog', { name: 'New enzyme' });
  await enzymeDialog.getByLabel('Name', { exact: true }).fill(enzymeName);
  await enzymeDialog.getByRole('button', { name: 'Create enzyme' }).click();
  await expect(page.getByRole('heading', { level: 1, name: enzymeName })).toBeVisible();

  await page.getByRole('button', { name: 'Add variant' }).click();
  let variantDialog = page.getByRole('dialog', { name: `New variant of ${enzymeName}` });
  await variantDialog.getByLabel('Variant name').fill('XT-WT');
  await variantDialog.getByLabel(/Parent \(wild type\)/).check();
  await variantDialog.getByRole('button', { name: 'Add variant' }).click();
  await expect(page.getByRole('region', { name: 'Variant XT-WT' })).toBeVisible();

  await page.getByRole('button', { name: 'Add variant' }).click();
  variantDialog = page.getByRole('dialog', { name: `New variant of ${enzymeName}` });
  await variantDialog.getByLabel('Variant name').fill('XT-D45N/K80R');
  const mutations = variantDialog.getByLabel('Mutations');
  await mutations.fill('D45N/K80');
  await variantDialog.getByRole('button', { name: 'Add variant' }).click();
  await expect(variantDialog.getByText('"K80" is not a substitution like D92N')).toBeVisible();
  await expect(mutations).toHaveAttribute('aria-invalid', 'true');
  const [enzyme] = await db.select().from(enzymes).where(eq(enzymes.name, enzymeName));
  expect(await db.$count(variants, eq(variants.enzymeId, enzyme.id))).toBe(1);

  await mutations.fill('D45N/K80R');
  await variantDialog.getByRole('button', { name: 'Add variant' }).click();
  const variant = page.getByRole('region', { name: 'Variant XT-D45N/K80R' });
  await expect(variant.getByLabel('Mutations D45N, K80R')).toBeVisible();
  expect(await db.$count(variants, eq(variants.enzymeId, enzyme.id))).toBe(2);

  // The assay.
  await page.goto('/assays/new');
  await page.getByLabel('Name', { exact: true }).fill(assayName);
  await page.getByLabel('Substrate', { exact: true }).fill('4-nitrophenyl xyloside (test)');
  await page.getByLabel('Concentration (mM)').fill('2');
  await page.getByLabel('Extinction coefficient ε').fill('18300');
  await page.getByRole('button', { name: 'Create assay' }).click();
  await expect(page.getByRole('heading', { level: 1, name: assayName })).toBeVisible();

  // The series: pH 3 to 9 in steps of 0.5, one point overridden.
  await page.goto('/buffer-series/new');
  await page.getByLabel('Start pH').fill('3');
  await page.getByLabel('Stop pH').fill('9');
  await page.getByLabel('Step', { exact: true }).fill('0.5');
  const design = page.getByRole('table', { name: 'Buffer series design' });
  await expect(page.getByRole('heading', { name: /^Design: 13 pH points at 37 °C/ })).toBeVisible(designed);
  const at5 = design.getByLabel('Buffer system at pH 5.00');
  const proposed = await at5.inputValue();
  const alternative = await at5.locator('option').nth(1).getAttribute('value');
  expect(alternative).toBeTruthy();
  expect(alternative).not.toBe(proposed);
  await at5.selectOption(alternative!);
  await expect(design.getByText('your choice')).toHaveCount(1, designed);
  await expect(at5).toHaveValue(alternative!);
  await expect(page.getByText('Designing…')).toHaveCount(0, designed);

  // The recipe sheet on paper: the cautions are there, the navigation is not.
  await page.emulateMedia({ media: 'print' });
  const sheet = page.getByRole('article', { name: 'Recipe sheet' });
  await expect(sheet).toBeVisible();
  for (const caution of [
    'Wear eye protection and gloves.',
    'Add acid to water, never water to acid.',
    'Follow your site’s chemical-safety rules and the suppliers’ safety data sheets.',
    'Results are research data, not a release test of any product.',
  ]) {
    await expect(sheet.getByText(caution, { exact: true })).toBeVisible();
  }
  // A header, the 13 points, and a row for each overlap point.
  await expect(sheet.getByRole('row').filter({ hasNotText: 'overlap point' })).toHaveCount(1 + 13);
  expect(await sheet.getByRole('row').filter({ hasText: 'overlap point' }).count()).toBeGreaterThan(0);
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeHidden();
  await expect(design).toBeHidden();
  await page.screenshot({ path: 'test-results/records/recipe-sheet-print.png', fullPage: true });
  await page.emulateMedia({ media: 'screen' });
  await expect(sheet).toBeHidden();

  // Saved into a new study.
  await page.getByRole('button', { name: 'Save series…' }).click();
  const saveDialog = page.getByRole('dialog', { name: 'Save buffer series' });
  await saveDialog.getByLabel('Series name').fill(`XT${stamp} pH 3–9 at 37 °C (test)`);
  await saveDialog.getByLabel('A new study created from this series').check();
  await saveDialog.getByRole('button', { name: 'Save series' }).click();
  await expect(page).toHaveURL(/\/studies\/new\?bufferSeriesId=/);
  await page.getByLabel('Study name').fill(studyName);
  await page.getByLabel('Enzyme').selectOption({ label: enzymeName });
  await expect(page.getByRole('checkbox', { name: /XT-D45N\/K80R/ })).toBeChecked();
  await expect(page.getByLabel('Reference variant')).toHaveValue(
    (await db.select().from(variants).where(eq(variants.name, 'XT-WT')))[0].id,
  );
  await page.getByLabel('Assay').selectOption({ label: assayName });
  await expect(page.getByLabel('Buffer series')).toHaveValue(/[0-9a-f-]{36}/);
  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page.getByRole('heading', { level: 1, name: studyName })).toBeVisible();
  const studyUrl = page.url();
  const variantsTable = page.getByRole('table', { name: 'Variants in this study' });
  await expect(variantsTable.getByRole('row', { name: /XT-WT/ }).getByText('Reference')).toBeVisible();
  await expect(page.getByRole('link', { name: `XT${stamp} pH 3–9 at 37 °C (test)` })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Edit study' })).toBeVisible();

  // A viewer of the team reads it and can change nothing.
  await context.clearCookies();
  await loginAs('viewer');
  await page.goto(studyUrl);
  await expect(page.getByRole('heading', { level: 1, name: studyName })).toBeVisible();
  await expect(page.getByText('Draft', { exact: true }).first()).toBeVisible();
  await expect(page.getByRole('button', { name: /Edit|Delete/ })).toHaveCount(0);
  await page.getByRole('navigation', { name: 'Study' }).getByRole('link', { name: 'Buffers' }).click();
  await expect(page.getByRole('table', { name: 'Buffer series design' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Buffer series design' }).getByRole('combobox')).toHaveCount(
    0,
  );
  await expect(page.getByRole('link', { name: /Design a buffer series/ })).toHaveCount(0);
});
