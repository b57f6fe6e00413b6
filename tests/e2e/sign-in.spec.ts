import { expect, test } from '@playwright/test';

/**
 * Issue 4, done when: "a new user can sign in by e-mail link in the browser with nothing configured by
 * hand". The planner asks for a link, opens it from the local inbox (the development inbox page,
 * DEV_INBOX=1, set by the start and test commands) and lands in the workspace signed in.
 */
const PLANNER = 'planner@nivalen.example';

test('the planner signs in with an e-mail link read from the local inbox', async ({ page }) => {
  const startedAt = new Date().toISOString();
  await page.goto('/workspace');
  // Not signed in: sent to sign-in with the way back kept.
  await expect(page).toHaveURL(/\/sign-in\?returnTo=%2Fworkspace/);

  const linkForm = page.getByRole('form', { name: 'With an e-mail link' });
  await linkForm.getByLabel('E-mail address').fill('not-an-address');
  await linkForm.getByRole('button', { name: 'Send me a link' }).click();
  await expect(linkForm.getByText('Enter an e-mail address like name@example.org.')).toBeVisible();

  await linkForm.getByLabel('E-mail address').fill(PLANNER);
  await linkForm.getByRole('button', { name: 'Send me a link' }).click();
  await expect(page).toHaveURL(/\/sign-in\/check-email$/);
  await expect(page.getByRole('heading', { name: 'Check your e-mail' })).toBeVisible();

  // The local inbox, newest first; wait for the message sent after this test began.
  await page.getByRole('link', { name: 'Open the local inbox' }).click();
  await expect(page).toHaveURL(/\/dev\/inbox$/);
  let opened = false;
  for (let attempt = 0; attempt < 20 && !opened; attempt++) {
    await page.goto(`/dev/inbox?to=${encodeURIComponent(PLANNER)}`);
    const row = page.getByRole('row').filter({ hasText: 'Your Thawline sign-in link' }).first();
    if ((await row.count()) > 0) {
      const received = (await row.getByRole('cell').first().textContent())?.trim() ?? '';
      if (received.replace(' ', 'T') >= startedAt.slice(0, 19)) {
        await row.getByRole('link').click();
        opened = true;
        break;
      }
    }
    await page.waitForTimeout(250);
  }
  expect(opened, 'the sign-in message arrived in the local inbox').toBe(true);

  await page.getByRole('link', { name: /\/api\/auth\/callback\/nodemailer/ }).click();
  await expect(page).toHaveURL(/\/workspace$/);
  await expect(page.getByRole('heading', { name: /Welcome, Pekka Planner/ })).toBeVisible();
  await expect(page.getByText('planner@nivalen.example')).toBeVisible();

  // Signing out ends the session: the workspace asks to sign in again.
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in\?signedOut=1/);
  await page.goto('/workspace');
  await expect(page).toHaveURL(/\/sign-in/);
});
