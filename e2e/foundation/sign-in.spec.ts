// Sign-in errors stay generic; a signed-out visitor returns to the page they were headed to.
import { demo, demoUser, expect, test } from '../fixtures';

const generic = 'E-mail or password is not correct.';

test('when the password is wrong, then the form shows the generic error and stays signed out', async ({
  page,
}) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(demoUser('viewer').email);
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert')).toHaveText(generic);
  await expect(page.getByRole('navigation', { name: 'Main' })).toHaveCount(0);
});

test('when the address has no account, then the error is the same generic one', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('nobody-here@example.org');
  await page.getByLabel('Password').fill('whatever-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert')).toHaveText(generic);
});

test('when a signed-out visitor opens the Account page, then after signing in they land on it', async ({
  page,
}) => {
  await page.goto('/account');
  await expect(page).toHaveURL(/\/sign-in\?redirectTo=%2Faccount$/);
  await page.getByLabel('E-mail').fill(demoUser('lead').email);
  await page.getByLabel('Password').fill(demo.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/account$/);
  await expect(page.getByRole('heading', { name: 'Account', exact: true })).toBeVisible();
});

test('when the reset form is sent, then the answer does not say whether the address exists', async ({
  page,
}) => {
  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await page.getByLabel('E-mail').fill('nobody-here@example.org');
  await page.getByRole('button', { name: 'Send the reset link' }).click();
  await expect(page.getByText(/If an account uses this address/)).toBeVisible();
});

test('when an invitation link is not valid, then the page says so plainly', async ({ page }) => {
  await page.goto('/invitation/abcdefghijklmnopqrstuvwxyz012345');
  await expect(page.getByRole('alert')).toContainText('not valid any more');
});
