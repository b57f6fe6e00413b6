import { expect, test } from '@playwright/test';

test('the home page renders with the demo notice and the caution', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { level: 1 })).toContainText('Thawline');
  await expect(page.getByRole('note').first()).toContainText('invented');
  await expect(page.getByText('not a design basis')).toBeVisible();
});

test('a new visitor finds the way to sign in, and a draft language says it is not yet reviewed', async ({ page, context }) => {
  await page.goto('/');
  await page.getByRole('link', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await context.addCookies([{ name: 'thawline_locale', value: 'nb', url: page.url() }]);
  await page.goto('/');
  await expect(page.getByText('ikke gjennomgått ennå')).toBeVisible();
});

test('/api/health reports every part ok', async ({ request }) => {
  const res = await request.get('/api/health');
  expect(res.status()).toBe(200);
  expect(await res.json()).toMatchObject({ ok: true, database: 'ok', migrations: 'current', mail: 'ok' });
});
