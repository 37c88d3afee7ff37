// An admin invites someone, reads the message in the Outbox, follows its link; the new person
// accepts, lands on the sign-in page with the e-mail filled in, and signs in.
import { demoUser, expect, test } from '../fixtures';

test('when an admin invites someone, then the e-mailed link creates an account that can sign in', async ({
  page,
  loginAs,
}) => {
  const email = `new-colleague-${Date.now()}@example.org`;
  const password = 'a-fresh-password-42';
  await loginAs('admin');

  await page.goto('/admin/people');
  await page.getByRole('button', { name: 'Invite someone' }).click();
  const invite = page.getByRole('dialog', { name: 'Invite someone' });
  await invite.getByLabel('E-mail').fill(email);
  await invite.getByLabel('Role').selectOption({ label: 'Scientist' });
  await invite.getByLabel('Team').selectOption({ label: 'Acid tolerance' });
  await invite.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByRole('status').filter({ hasText: `Invitation sent to ${email}` })).toBeVisible();

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox' }).click();
  await page.getByRole('row', { name: new RegExp(email) }).click();
  const message = page.getByRole('article', { name: 'You are invited to Bellwether' });
  await expect(message).toContainText(`${demoUser('admin').name} invited you to Bellwether as scientist`);
  const link = message.getByRole('link', { name: /\/invitation\// });
  const href = await link.getAttribute('href');
  await link.click();

  await expect(page.getByRole('heading', { name: 'Welcome to Bellwether' })).toBeVisible();
  const main = page.getByRole('main');
  await expect(main.getByText(email, { exact: true })).toBeVisible();
  await expect(main.getByText('Scientist', { exact: true })).toBeVisible();
  await expect(main.getByText('Acid tolerance', { exact: true })).toBeVisible();
  await page.getByLabel('Your name').fill('Ines Calder');
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByLabel('Repeat the password').fill(password);
  await page.getByRole('button', { name: 'Create my account' }).click();

  // The admin was signed in on this browser: they are signed out, and the new account signs in.
  await expect(page).toHaveURL(/\/sign-in$/);
  await expect(page.getByText('Account created. Sign in with your new password.')).toBeVisible();
  await expect(page.getByLabel('E-mail')).toHaveValue(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { name: 'Welcome, Ines Calder' })).toBeVisible();
  await expect(page.getByRole('banner').getByText('Scientist', { exact: true })).toBeVisible();

  // The link works once.
  await page.goto(href!);
  await expect(page.getByRole('alert')).toContainText('not valid any more');
});
