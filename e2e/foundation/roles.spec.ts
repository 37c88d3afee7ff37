// Each demo role signs in through the form, sees the navigation of its role, and signs out.
import type { Role } from '../../shared/permissions';
import { demo, demoUser, expect, test } from '../fixtures';

// Every role reads the science records and comparisons; only admins see the administration pages.
const science = ['Studies', 'Enzymes', 'Assays', 'Buffer series', 'Buffer library', 'Comparisons'];
const everyone = ['Home', ...science, 'Teams', 'Account'];
const adminOnly = ['People', 'Outbox', 'Audit log'];

const roleLabel: Record<Role, string> = {
  admin: 'Admin',
  lead: 'Group lead',
  scientist: 'Scientist',
  viewer: 'Viewer',
};

for (const role of ['admin', 'lead', 'scientist', 'viewer'] as const) {
  test(`when the ${role} signs in, then the navigation shows what the role may open, and sign-out ends the session`, async ({
    page,
  }) => {
    const person = demoUser(role);
    await page.goto('/');
    await expect(page).toHaveURL(/\/sign-in$/);
    await page.getByLabel('E-mail').fill(person.email);
    await page.getByLabel('Password').fill(demo.password);
    await page.getByRole('button', { name: 'Sign in' }).click();

    await expect(page.getByRole('heading', { name: `Welcome, ${person.name}` })).toBeVisible();
    const banner = page.getByRole('banner');
    await expect(banner.getByText(person.name, { exact: true })).toBeVisible();
    await expect(banner.getByText(roleLabel[role], { exact: true })).toBeVisible();

    const nav = page.getByRole('navigation', { name: 'Main' });
    const expected =
      role === 'admin' ? ['Home', ...science, 'Teams', 'People', 'Outbox', 'Audit log', 'Account'] : everyone;
    await expect(nav.getByRole('link')).toHaveText(expected);
    for (const label of adminOnly) {
      await expect(nav.getByRole('link', { name: label })).toHaveCount(role === 'admin' ? 1 : 0);
    }

    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page).toHaveURL(/\/sign-in$/);
    await expect(page.getByRole('heading', { name: 'Sign in to Bellwether' })).toBeVisible();
    // The session is gone on the server too: a protected page sends us back to sign in.
    await page.goto('/account');
    await expect(page).toHaveURL(/\/sign-in\?redirectTo=%2Faccount$/);
  });
}

test('when a scientist opens an admin page by its address, then the page says it is not open to the role', async ({
  page,
  loginAs,
}) => {
  await loginAs('scientist');
  await page.goto('/admin/people');
  await expect(page.getByRole('heading', { name: 'This page is not open to your role' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'People' })).toHaveCount(0);
});
