// Teams by role: admins create teams and choose members; leads invite into their teams;
// viewers read their teams and change nothing.
import { demo, demoUser, expect, test } from '../fixtures';

test('when an admin creates a team and adds a member, then the member is listed in it', async ({
  page,
  loginAs,
}) => {
  const name = `Heat tolerance ${Date.now()}`;
  const scientist = demoUser('scientist');
  await loginAs('admin');
  await page.goto('/teams');
  await page.getByRole('button', { name: 'New team' }).click();
  const dialog = page.getByRole('dialog', { name: 'New team' });
  await dialog.getByLabel('Team name').fill(name);
  await dialog.getByRole('button', { name: 'Create team' }).click();

  const team = page.getByRole('region', { name });
  await expect(team).toBeVisible();
  await team
    .getByLabel('Add a member')
    .selectOption({ label: `${scientist.name} · Scientist · ${scientist.email}` });
  await team.getByRole('button', { name: 'Add', exact: true }).click();
  const members = page.getByRole('table', { name: `Members of ${name}` });
  await expect(members.getByRole('cell', { name: scientist.name, exact: true })).toBeVisible();

  await team.getByRole('button', { name: `Remove ${scientist.name} from ${name}` }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Remove' }).click();
  await expect(members.getByText('No members yet.')).toBeVisible();
});

test('when a lead opens Teams, then they may invite into their team but not manage members', async ({
  page,
  loginAs,
}) => {
  await loginAs('lead');
  await page.goto('/teams');
  await expect(page.getByRole('button', { name: 'Invite into this team' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'New team' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: /^Remove/ })).toHaveCount(0);
  await page.getByRole('button', { name: 'Invite into this team' }).click();
  const roles = page.getByRole('dialog').getByLabel('Role').getByRole('option');
  await expect(roles).toHaveText(['Group lead', 'Scientist', 'Viewer']);
});

test('when a viewer opens Teams, then the team and its members are shown read-only', async ({
  page,
  loginAs,
}) => {
  await loginAs('viewer');
  await page.goto('/teams');
  await expect(page.getByRole('heading', { name: 'Acid tolerance' })).toBeVisible();
  const members = page.getByRole('table', { name: 'Members of Acid tolerance' });
  for (const person of demo.people.filter((p) => p.inTeam)) {
    await expect(members.getByRole('cell', { name: person.name, exact: true })).toBeVisible();
  }
  // Only the sortable column titles are buttons: nothing to invite, add or remove.
  await expect(page.getByRole('main').getByRole('button')).toHaveText(['Name', 'E-mail', 'Role']);
});
