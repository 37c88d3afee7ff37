// Bad input in the designer is refused on the field it concerns, and nothing is saved.
import { bufferSeries } from '../../server/db/schema';
import { expect, test } from '../fixtures';

test('when the designer gets pH 15, 150 °C, a negative concentration or no pH point, then the fields say what is wrong and nothing is saved', async ({
  page,
  loginAs,
  db,
}) => {
  // Designs are computed by the server; on a busy test machine the first one can take a while.
  test.setTimeout(120_000);
  const designed = { timeout: 45_000 };
  const before = await db.$count(bufferSeries);
  await loginAs('scientist');
  await page.goto('/buffer-series/new');
  await expect(page.getByRole('heading', { name: /^Design: \d+ pH points/ })).toBeVisible(designed);
  const save = page.getByRole('button', { name: 'Save series…' });
  await expect(save).toBeEnabled();

  await page.getByLabel('A list').check();
  const points = page.getByLabel('pH points', { exact: true });
  await points.fill('3, 4, 15');
  await expect(page.getByText('pH must be between 0 and 14.')).toBeVisible();
  await expect(points).toHaveAttribute('aria-invalid', 'true');
  await expect(save).toBeDisabled();
  await expect(page.getByText('Fix the fields marked in red to see the design.')).toBeVisible();
  await expect(page.getByRole('table', { name: 'Buffer series design' })).toHaveCount(0);

  await points.fill('');
  await expect(page.getByText('Give at least one pH point.')).toBeVisible();
  await expect(save).toBeDisabled();

  await points.fill('4, 5');
  await page.getByLabel('Assay at (°C)').fill('150');
  await page.getByLabel('Buffer (mM)').fill('-5');
  await expect(page.getByText('Temperature must be 0–100 °C.')).toBeVisible();
  await expect(page.getByLabel('Assay at (°C)')).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByText('Concentration must be above zero.')).toBeVisible();
  await expect(page.getByLabel('Buffer (mM)')).toHaveAttribute('aria-invalid', 'true');
  await expect(save).toBeDisabled();

  // Fixed again, the design comes back.
  await page.getByLabel('Assay at (°C)').fill('37');
  await page.getByLabel('Buffer (mM)').fill('50');
  await expect(page.getByRole('heading', { name: /^Design: 2 pH points at 37 °C/ })).toBeVisible(designed);
  await expect(save).toBeEnabled();
  expect(await db.$count(bufferSeries)).toBe(before);
});
