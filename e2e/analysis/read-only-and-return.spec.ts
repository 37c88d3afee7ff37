// Read-only analysis for a viewer, and a lead returning a study with a required comment that the
// author then reads on every tab of the study. Demo seed data (generated).
import { eq } from 'drizzle-orm';
import { studies } from '../../server/db/schema';
import { expect, test } from '../fixtures';

const KINETIC = 'FR1 variants, kinetic pH profile (demo)';
const IN_REVIEW = 'FR1 end-point screen, round 1 (demo)';

test('when a viewer opens the analysis, then the profiles, wells and QC read without any edit control', async ({
  page,
  loginAs,
  db,
}) => {
  const [study] = await db.select().from(studies).where(eq(studies.name, KINETIC));
  await loginAs('viewer');
  await page.goto(`/studies/${study.id}/analysis`);
  await expect(page.getByRole('note')).toContainText('Your role can read the analysis');
  await expect(page.getByRole('table', { name: 'Fitted parameters of every variant' })).toContainText(
    'apparent pKa1',
  );
  await expect(page.getByRole('figure', { name: 'FR1-WT: log activity against pH' })).toBeVisible();
  await expect(page.getByRole('button', { name: /^Bootstrap intervals/ })).toHaveCount(0);
  await page.getByRole('button', { name: 'Wells', exact: true }).click();
  await page.getByRole('row', { name: /^B6 outlier/ }).click();
  const dialog = page.getByRole('dialog', { name: 'Well B6' });
  await expect(dialog.getByText(/^Excluded:/)).toBeVisible();
  await expect(dialog.getByRole('button', { name: /Include|Exclude|Apply window/ })).toHaveCount(0);
  await dialog.getByRole('button', { name: 'Close' }).click();
  await page.getByRole('button', { name: /^Plate QC/ }).click();
  await expect(page.getByRole('region', { name: /^QC of Plate 1/ })).toContainText('Blanks across pH');
  await page.getByRole('button', { name: 'Settings', exact: true }).click();
  await expect(page.getByLabel('Model for FR1-WT')).toBeDisabled();
  await expect(page.getByRole('button', { name: 'Save settings and refit' })).toHaveCount(0);
});

test('when a lead returns a study, then a comment is required and the author reads it on the study', async ({
  page,
  loginAs,
  db,
}) => {
  test.setTimeout(120_000);
  const [study] = await db.select().from(studies).where(eq(studies.name, IN_REVIEW));
  try {
    await loginAs('lead');
    await page.goto(`/studies/${study.id}/review`);
    await page.getByRole('button', { name: 'Return with comments…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Return the study' });
    await dialog.getByRole('button', { name: 'Return the study' }).click();
    await expect(dialog.getByText('Comment is required.')).toBeVisible();
    await dialog
      .getByLabel('Comments for the author')
      .fill('Plate 1 B6 is an outlier: exclude it with a reason.');
    await dialog.getByRole('button', { name: 'Return the study' }).click();
    await expect(page.getByRole('status', { name: 'Review state' })).toContainText('Returned by Daniel Osei');

    await loginAs('scientist', 1);
    await page.goto(`/studies/${study.id}/analysis`);
    await expect(page.getByRole('status', { name: 'Review state' })).toContainText(
      '“Plate 1 B6 is an outlier: exclude it with a reason”',
    );
    // Returned: the author may edit again.
    await expect(page.getByRole('button', { name: /^Bootstrap intervals/ })).toBeVisible();
  } finally {
    // Other browser tests expect this demo study in review: put its status back.
    await db.update(studies).set({ status: 'in_review' }).where(eq(studies.id, study.id));
  }
});
