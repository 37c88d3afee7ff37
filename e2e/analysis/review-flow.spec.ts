// The analysis and review story on the demo seed's kinetic study (generated data): a scientist
// adjusts a rate window, excludes an outlier with a reason and sees the curve and the parameter
// table change, then submits; the lead opens the link from the e-mail and approves; the scientist
// then finds no edit controls, and an edit sent straight to the API is refused with 409.
import { eq } from 'drizzle-orm';
import type { Page } from '@playwright/test';
import { studies } from '../../server/db/schema';
import { expect, test } from '../fixtures';

const STUDY = 'FR1 variants, kinetic pH profile (demo)';
const REASON = 'Trace far above its replicates at pH 8; pipetting error suspected (e2e test).';

/** The text of one variant's row in the parameter table. */
const parameterRow = (page: Page, variant: string) =>
  page
    .getByRole('table', { name: 'Fitted parameters of every variant' })
    .getByRole('row', { name: new RegExp(`^${variant} `) });

/** A mutation straight to the API with the signed-in page's session and CSRF token. */
async function apiPost(page: Page, path: string, data: object) {
  const me = await (await page.request.get('/api/me')).json();
  return page.request.post(path, { data, headers: { 'X-CSRF-Token': me.csrfToken } });
}

test('when a scientist adjusts a window and excludes an outlier, then submits, the lead approves from the e-mailed link and the study locks', async ({
  page,
  loginAs,
  latestMailTo,
  db,
}) => {
  test.setTimeout(180_000);
  const [study] = await db.select().from(studies).where(eq(studies.name, STUDY));
  try {
    await loginAs('scientist');

    // The profile of FR1-D92N before: one exclusion in the study (B6 of FR1-WT), none for D92N.
    await page.goto(`/studies/${study.id}/analysis`);
    await expect(page.getByRole('heading', { level: 1, name: STUDY })).toBeVisible();
    await page
      .getByRole('group', { name: 'Variant shown' })
      .getByRole('button', { name: 'FR1-D92N', exact: true })
      .click();
    const chart = page.getByRole('figure', { name: 'FR1-D92N: activity against pH' });
    await expect(chart).toBeVisible();
    await expect(chart.locator('[data-excluded-well]')).toHaveCount(0);
    const rowBefore = await parameterRow(page, 'FR1-D92N').innerText();

    // A rate window for one well: B5 of plate 1 fits reads 40–200 s only.
    await page.getByRole('button', { name: 'Wells', exact: true }).click();
    await page.getByRole('row', { name: /^B5 / }).click();
    let dialog = page.getByRole('dialog', { name: 'Well B5' });
    await expect(dialog.getByRole('figure', { name: 'B5: time course' })).toBeVisible();
    await dialog.getByLabel('Start (s)').fill('40');
    await dialog.getByLabel('End (s)').fill('200');
    await dialog.getByRole('radio', { name: 'This well (B5)' }).check();
    await dialog.getByRole('button', { name: 'Apply window' }).click();
    await expect(
      page.getByRole('status').filter({ hasText: 'Window 40–200 s set for well B5.' }),
    ).toBeVisible();
    await expect(dialog.getByText('40–200 s, set for this well')).toBeVisible();
    await expect(dialog.locator('[data-rate-window="40-200"]')).toHaveCount(1);
    await dialog.getByRole('button', { name: 'Close' }).click();
    await expect(page.getByRole('row', { name: /^B5 / })).toContainText('well40–200');

    // Exclude the outlier D12 (FR1-D92N at pH 8): a reason is required.
    await page.getByRole('row', { name: /^D12 outlier/ }).click();
    dialog = page.getByRole('dialog', { name: 'Well D12' });
    await dialog.getByRole('button', { name: 'Exclude D12…' }).click();
    const reasonDialog = page.getByRole('dialog', { name: 'Exclude from the fit' });
    await reasonDialog.getByRole('button', { name: 'Exclude and refit' }).click();
    await expect(reasonDialog.getByText('Reason is required.')).toBeVisible();
    await reasonDialog.getByLabel('Reason').fill(REASON);
    await reasonDialog.getByRole('button', { name: 'Exclude and refit' }).click();
    await expect(reasonDialog).toBeHidden();
    await expect(dialog.getByText(`Excluded: ${REASON}`)).toBeVisible();
    await dialog.getByRole('button', { name: 'Close' }).click();

    // The curve and the table changed: D12 is drawn hollow with its reason, the fit moved.
    await page.getByRole('button', { name: 'Profiles', exact: true }).click();
    await page
      .getByRole('group', { name: 'Variant shown' })
      .getByRole('button', { name: 'FR1-D92N', exact: true })
      .click();
    await expect(chart.locator('[data-excluded-well]')).toHaveCount(1);
    await expect(chart.locator('[data-excluded-well] title')).toContainText(REASON);
    await expect.poll(() => parameterRow(page, 'FR1-D92N').innerText()).not.toBe(rowBefore);
    await page.getByRole('button', { name: /^Exclusions/ }).click();
    await expect(page.getByRole('table', { name: 'Exclusions of this study' })).toContainText(REASON);

    // Submit for review with a message.
    await page.getByRole('link', { name: 'Review', exact: true }).click();
    await page.getByRole('button', { name: 'Submit for review…' }).click();
    const submit = page.getByRole('dialog', { name: 'Submit for review' });
    await submit.getByLabel('Message to the reviewers').fill('D12 excluded (pipetting); B5 window 40–200 s.');
    await submit.getByRole('button', { name: 'Submit for review' }).click();
    await expect(page.getByRole('status', { name: 'Review state' })).toContainText(
      'In review: submitted by Priya Raman',
    );

    // The lead's e-mail carries a link that opens the study.
    let mail: Awaited<ReturnType<typeof latestMailTo>>;
    await expect
      .poll(async () => (mail = await latestMailTo('lead@example.org'))?.subject)
      .toBe(`Review requested: ${STUDY}`);
    const link = /https?:\/\/\S+/.exec(mail!.text)?.[0];
    expect(link).toMatch(new RegExp(`/studies/${study.id}$`));

    await loginAs('lead');
    await page.goto(link!);
    await expect(page.getByRole('heading', { level: 1, name: STUDY })).toBeVisible();
    await expect(page.getByRole('status', { name: 'Review state' })).toContainText('In review');
    await page.getByRole('link', { name: 'Review and history' }).click();
    await expect(page.getByRole('list', { name: 'Review history' })).toContainText(
      'D12 excluded (pipetting)',
    );
    await page.getByRole('button', { name: 'Approve…' }).click();
    const approve = page.getByRole('dialog', { name: 'Approve the study' });
    await approve.getByLabel('Comment').fill('Window and exclusion are justified; fits look sound.');
    await approve.getByRole('button', { name: 'Approve and lock' }).click();
    await expect(page.getByRole('status', { name: 'Review state' })).toContainText(
      'Approved and locked: approved by Daniel Osei',
    );

    // The scientist can no longer edit: no controls, and the API refuses with 409.
    await loginAs('scientist');
    await page.goto(`/studies/${study.id}/analysis?view=wells`);
    await expect(page.getByText('Read-only and frozen: the result stored at approval')).toBeVisible();
    await expect(page.getByRole('button', { name: /^Bootstrap intervals/ })).toHaveCount(0);
    await page.getByRole('row', { name: /^B5 / }).click();
    dialog = page.getByRole('dialog', { name: 'Well B5' });
    await expect(dialog.getByRole('figure', { name: 'B5: time course' })).toBeVisible();
    await expect(dialog.getByRole('button', { name: 'Apply window' })).toHaveCount(0);
    await expect(dialog.getByRole('button', { name: /^Exclude/ })).toHaveCount(0);
    await dialog.getByRole('button', { name: 'Close' }).click();
    await page.getByRole('link', { name: 'Review', exact: true }).click();
    await expect(page.getByRole('button', { name: /Submit for review|Withdraw/ })).toHaveCount(0);
    const plates = await (await page.request.get(`/api/studies/${study.id}/plates`)).json();
    const refused = await apiPost(page, `/api/studies/${study.id}/exclusions`, {
      plateId: plates[0].id,
      wells: ['A1'],
      reason: 'late',
    });
    expect(refused.status()).toBe(409);
  } finally {
    // Other browser tests expect the demo study as a draft: put its status back.
    await db.update(studies).set({ status: 'draft' }).where(eq(studies.id, study.id));
  }
});
