import { expect, test, type Page } from '@playwright/test';
import { caughtMail, demo, DEMO_PASSWORD, signIn, signOut } from './support/demo';
import { E2E } from './support/env';

// Every sign-in runs a deliberately slow password check; these tests sign in several times each.
test.describe.configure({ timeout: 120_000 });

const openAccount = async (page: Page) => {
  // The name and role in the header lead to the account page.
  await page.getByRole('banner').locator('a[href="/account"]').click();
  await expect(page.getByRole('heading', { name: 'My account' })).toBeVisible();
};

test('when the three demo people sign in, then each reaches their own account page with their role', async ({
  page,
}) => {
  for (const [email, name, role] of [
    [demo.admin, /./, 'Guild office'],
    [demo.odile, 'Odile Marchetti', 'Mentor'],
    [demo.ned, 'Ned Pellow', 'Apprentice'],
  ] as const) {
    await signIn(page, email);
    await openAccount(page);
    await expect(page.getByText(email, { exact: true })).toBeVisible();
    await expect(page.getByRole('definition').filter({ hasText: role })).toBeVisible();
    await expect(page.getByLabel('Name')).toHaveValue(name);
    await signOut(page);
  }
});

test('when an apprentice opens their account, then the room their photos take is shown against the quota', async ({
  page,
}) => {
  await signIn(page, demo.ned);
  await openAccount(page);
  await expect(page.getByRole('heading', { name: 'Photo storage' })).toBeVisible();
  await expect(page.getByText(/^\d+(\.\d)? MB of 500 MB used$/)).toBeVisible();
  await expect(page.getByRole('progressbar', { name: 'Photo storage used' })).toBeVisible();
  await signOut(page);
  await signIn(page, demo.odile);
  await openAccount(page);
  await expect(page.getByRole('heading', { name: 'Photo storage' })).toHaveCount(0);
  await signOut(page);
});

test('when the admin asks where development mail goes, then the fake mail service inbox is named', async ({ page }) => {
  await signIn(page, demo.admin);
  const reply = await page.request.get('/api/dev-mail');
  expect(await reply.json()).toEqual({ inboxUrl: `http://localhost:${E2E.mailWebPort}` });
});

test('when a password is forgotten, then the e-mailed link sets a new one, once only', async ({ page }) => {
  const email = 'hollis@saltmarsh-guild.test';
  const fresh = `winding-arbor-${Date.now()}`;
  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgotten your password?' }).click();
  await page.getByLabel('E-mail').fill(email.toUpperCase());
  await page.getByRole('button', { name: 'Send me a link' }).click();
  await expect(page.getByText('Check your inbox')).toBeVisible();

  let link = '';
  await expect(async () => {
    const mine = (await caughtMail()).filter((m) => m.to.some((to) => to.address === email));
    link = /\/reset-password\/[A-Za-z0-9_-]+/.exec(mine.at(-1)?.text ?? '')?.[0] ?? '';
    expect(link).not.toBe('');
  }).toPass({ timeout: 10_000 });

  await page.goto(link);
  await page.getByLabel('New password', { exact: true }).fill('too-short');
  await page.getByLabel('New password again').fill('too-short');
  await page.getByRole('button', { name: 'Set new password' }).click();
  await expect(page.getByText('Use at least 10 characters.')).toBeVisible();
  await page.getByLabel('New password', { exact: true }).fill(fresh);
  await page.getByLabel('New password again').fill(fresh);
  await page.getByRole('button', { name: 'Set new password' }).click();
  await expect(page.getByText('Your new password is set.')).toBeVisible();

  await signIn(page, email, fresh);
  // Put the demo password back through "my account", which also needs the current password.
  await openAccount(page);
  await page.getByLabel('Current password').fill(fresh);
  await page.getByLabel('New password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByLabel('New password again').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Change password' }).click();
  await expect(page.getByText(/Password changed/)).toBeVisible();
  await signOut(page);
  await signIn(page, email);
  await signOut(page);

  // A spent link says so on arrival, before anything is typed.
  await page.goto(link);
  await expect(page.getByText('This link no longer works')).toBeVisible();
  await expect(page.getByLabel('New password', { exact: true })).toHaveCount(0);
});
