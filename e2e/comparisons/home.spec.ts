// The home page per role: a lead finds the studies waiting for their review, a scientist their own
// drafts. The expected studies are read from the database (other browser tests may have moved the
// demo studies on), and the scientist's draft is made here.
import { and, eq, inArray, ne } from 'drizzle-orm';
import { studies, users } from '../../server/db/schema';
import { demoUser, expect, test } from '../fixtures';

test('when a lead opens the home page, then the studies awaiting their review are listed with a count', async ({
  page,
  loginAs,
  db,
}) => {
  const [lead] = await db
    .select()
    .from(users)
    .where(eq(users.email, demoUser('lead').email));
  const inReview = await db
    .select({ name: studies.name })
    .from(studies)
    .where(and(eq(studies.status, 'in_review'), ne(studies.ownerId, lead.id)));
  expect(inReview.length).toBeGreaterThan(0);
  await loginAs('lead');
  await page.goto('/');
  await expect(page.getByRole('heading', { level: 1, name: `Welcome, ${lead.name}` })).toBeVisible();
  const review = page.getByRole('region', { name: /Awaiting my review/ });
  for (const s of inReview) await expect(review.getByRole('link', { name: s.name })).toBeVisible();
  await expect(page.getByRole('list', { name: 'Counts' }).getByText('Awaiting my review')).toBeVisible();
});

test('when a scientist opens the home page, then their drafts are listed and nobody else’s', async ({
  page,
  loginAs,
  db,
}) => {
  await loginAs('scientist');
  // A draft of the scientist's own, made like the study form makes one, from the approved demo study.
  const list = (await (await page.request.get('/api/studies')).json()) as { id: string; status: string }[];
  const template = list.find((s) => s.status === 'approved')!;
  const detail = await (await page.request.get(`/api/studies/${template.id}`)).json();
  const me = await (await page.request.get('/api/me')).json();
  const name = `Home page draft ${Date.now()} (e2e)`;
  const created = await page.request.post('/api/studies', {
    headers: { 'X-CSRF-Token': me.csrfToken },
    data: {
      teamId: detail.teamId,
      name,
      enzymeId: detail.enzymeId,
      variantIds: detail.variants.map((v: { id: string }) => v.id),
      referenceVariantId: detail.referenceVariantId,
      assayId: detail.assayId,
      notes: 'Browser test draft.',
    },
  });
  expect(created.status()).toBe(201);

  await page.goto('/');
  const drafts = page.getByRole('region', { name: /Drafts of mine/ });
  await expect(drafts.getByRole('link', { name })).toBeVisible();
  const others = await db
    .select({ name: studies.name })
    .from(studies)
    .where(and(inArray(studies.status, ['draft', 'returned']), ne(studies.ownerId, me.id)));
  for (const s of others) await expect(drafts.getByRole('link', { name: s.name })).toHaveCount(0);
  // A scientist reviews nothing: no review list.
  await expect(page.getByRole('region', { name: /Awaiting my review/ })).toHaveCount(0);
});
