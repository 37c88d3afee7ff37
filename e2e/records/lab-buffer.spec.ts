// The buffer library: an admin adds a lab buffer (checked by the shared schema before it is sent);
// a scientist sees it but cannot add one.
import { expect, test } from '../fixtures';

test('when an admin adds a lab buffer, then a scientist sees it in the library but has no add button', async ({
  page,
  context,
  loginAs,
}) => {
  const name = `Glycinamide ${Date.now()} (lab, test)`;
  await loginAs('admin');
  await page.goto('/buffers');
  await page.getByRole('link', { name: 'Add a lab buffer' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Add a lab buffer' })).toBeVisible();

  await page.getByLabel('Name', { exact: true }).fill(name);
  await expect(page.getByLabel('Id', { exact: true })).toHaveValue(/^glycinamide-\d+-lab-test$/);
  await page.getByLabel(/Offered by the series designer/).uncheck();
  await page.getByLabel('Charge of the acid form').fill('1');
  await page.getByLabel('ΔH (kJ/mol)').fill('40');
  await page.getByLabel('Source of pKa').fill('lab titration, 2026 (generated for a test)');
  await page.getByLabel('Source of ΔH').fill('[memory]');
  await page.getByLabel('Form name').fill('Glycinamide hydrochloride');
  await page.getByLabel('Form id').fill('glycinamide-hydrochloride');
  await page.getByLabel('Formula', { exact: true }).fill('C2H6N2O·HCl');
  await page.getByRole('button', { name: 'From formula' }).click();
  // 2 × 12.011 + 7 × 1.008 + 2 × 14.007 + 15.999 + 35.45 = 110.541 (IUPAC abridged standard atomic weights)
  await expect(page.getByLabel('Formula weight (g/mol)')).toHaveValue('110.541');
  await page.getByLabel('Cl per formula unit').fill('1');
  await page.getByLabel('Titrate: start form').selectOption({ label: 'Glycinamide hydrochloride' });

  // No pKa yet: the shared schema's message lands on the field, nothing is sent.
  await page.getByRole('button', { name: 'Add lab buffer' }).click();
  const pKa = page.getByLabel('pKa at 25 °C, I = 0');
  await expect(pKa).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByText('Some values are not valid: see the fields marked in red.')).toBeVisible();

  await pKa.fill('8.2');
  await page.getByRole('button', { name: 'Add lab buffer' }).click();
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
  await expect(page.getByText('Lab', { exact: true })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Edit lab buffer' })).toBeVisible();

  await context.clearCookies();
  await loginAs('scientist');
  await page.goto('/buffers');
  const table = page.getByRole('table', { name: 'Buffer systems' });
  await expect(table.getByRole('link', { name })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Add a lab buffer' })).toHaveCount(0);
  await table.getByRole('link', { name }).click();
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
  await expect(page.getByText('lab titration, 2026 (generated for a test)').first()).toBeVisible();
  await expect(page.getByRole('link', { name: 'Edit lab buffer' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Delete lab buffer' })).toHaveCount(0);
});
