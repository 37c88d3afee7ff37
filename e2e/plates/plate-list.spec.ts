// Looking after a study's plates and the team's templates, as a scientist does (issue 5): a plate
// renamed from the list, and a template saved, then deleted when the team no longer uses it.
import { expect, test } from '../fixtures';
import { createPlate, demoStudy } from './helpers';

test('when a scientist renames a plate, then the list and the plate page show the new name', async ({ page, loginAs }) => {
  await loginAs('scientist');
  const study = await demoStudy(page.request, 'draft');
  const name = `E2E rename ${Date.now()}`;
  await createPlate(page, study.id, name);

  await page.goto(`/studies/${study.id}/plates`);
  await page.getByRole('button', { name: `Rename ${name}` }).click();
  const dialog = page.getByRole('dialog', { name: `Rename ${name}` });
  await dialog.getByLabel('Plate name').fill('');
  await dialog.getByRole('button', { name: 'Rename' }).click();
  await expect(dialog.getByText('Plate name is required.')).toBeVisible(); // refused in place
  const renamed = `${name} (pH 2.5–8 row fill)`;
  await dialog.getByLabel('Plate name').fill(renamed);
  await dialog.getByRole('button', { name: 'Rename' }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByRole('status').filter({ hasText: `renamed to “${renamed}”` })).toBeVisible();
  const table = page.getByRole('table', { name: 'Plates of the study' });
  await table.getByRole('link', { name: renamed, exact: true }).click();
  await expect(page.getByRole('heading', { name: renamed })).toBeVisible();
});

test('when a scientist saves a map as a template and later deletes it, then it is no longer offered', async ({ page, loginAs }) => {
  await loginAs('scientist');
  const study = await demoStudy(page.request, 'draft');
  await createPlate(page, study.id, `E2E template source ${Date.now()}`);
  const template = `E2E template ${Date.now()}`;

  await page.getByRole('button', { name: 'Save as template…' }).click();
  const save = page.getByRole('dialog', { name: 'Save as template' });
  await save.getByLabel('Template name').fill(template);
  await save.getByRole('button', { name: 'Save template' }).click();
  await expect(save).toBeHidden();

  await page.getByRole('button', { name: 'Apply template…' }).click();
  const apply = page.getByRole('dialog', { name: 'Apply a template' });
  await apply.getByRole('radio', { name: new RegExp(template) }).check();
  await apply.getByRole('button', { name: 'Delete template…' }).click();
  await expect(apply.getByText(`Delete “${template}” for the whole team?`)).toBeVisible();
  await apply.getByRole('button', { name: `Delete “${template}”` }).click();
  await expect(apply.getByRole('radio', { name: new RegExp(template) })).toHaveCount(0);
  await expect(page.getByRole('status').filter({ hasText: `Template “${template}” deleted` })).toBeVisible();
});
