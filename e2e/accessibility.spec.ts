import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { demo, signIn } from './support/demo';

const CALCULATORS = [
  'broach-taper',
  'pivot-burnish',
  'spring-temper',
  'wheel-pinion',
  'train-pendulum',
  'fusee',
  'dividing',
  'planting',
];

/** Script errors seen while the page is open; a failed request for an expected 401 or 404 is not one of them. */
function watchErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (err) => errors.push(`${page.url()}: ${err.message}`));
  return errors;
}

async function settle(page: Page) {
  await page.waitForLoadState('networkidle');
  await expect(page.locator('h1').first()).toBeVisible();
  // The tab carries the page's own name, not only the product's.
  await expect(page).toHaveTitle(/ · Tickwright$/);
}

/** The serious and critical axe findings on the page as it stands, one line each, so a failure reads clearly. */
async function seriousViolations(page: Page): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).analyze();
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${new URL(page.url()).pathname} ${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

async function checkPages(page: Page, addresses: string[]): Promise<string[]> {
  const found: string[] = [];
  for (const address of addresses) {
    await page.goto(address);
    await settle(page);
    found.push(...(await seriousViolations(page)));
  }
  return found;
}

/** Opens the first entry of the bench log on screen, whichever it is: other specs add their own. */
async function openFirstEntry(page: Page) {
  await page.getByRole('heading', { level: 3 }).getByRole('link').first().click();
  await settle(page);
}

test('when a visitor opens the pages reached without signing in, then axe finds nothing serious', async ({ page }) => {
  const errors = watchErrors(page);
  const found = await checkPages(page, [
    '/sign-in',
    '/forgot-password',
    '/reset-password/not-a-real-token',
    '/invitation/not-a-real-token',
  ]);
  expect(found).toEqual([]);
  expect(errors).toEqual([]);
});

test('when an apprentice goes through Today, account, calculators and bench log, then axe finds nothing serious', async ({
  page,
}) => {
  test.setTimeout(180_000);
  const errors = watchErrors(page);
  await signIn(page, demo.ned);
  const found = await checkPages(page, [
    '/',
    '/account',
    '/calculators',
    '/calculators/saved',
    ...CALCULATORS.map((name) => `/calculators/${name}`),
    '/bench-log',
  ]);
  await openFirstEntry(page);
  found.push(...(await seriousViolations(page)));
  expect(found).toEqual([]);
  expect(errors).toEqual([]);
});

test('when a mentor goes through Today, classes and the bench logs, then axe finds nothing serious', async ({
  page,
}) => {
  test.setTimeout(180_000);
  const errors = watchErrors(page);
  await signIn(page, demo.odile);
  const found = await checkPages(page, ['/', '/account', '/classes', '/bench-log', '/calculators/broach-taper']);
  await page.goto('/classes');
  await page.getByRole('link', { name: 'Autumn Bench 2026' }).click();
  await settle(page);
  found.push(...(await seriousViolations(page)));
  await page.getByRole('link', { name: 'Bench log' }).first().click();
  await settle(page);
  found.push(...(await seriousViolations(page)));
  await page.goto('/bench-log');
  await page.getByRole('link', { name: 'Ned Pellow' }).click();
  await settle(page);
  await openFirstEntry(page);
  found.push(...(await seriousViolations(page)));
  expect(found).toEqual([]);
  expect(errors).toEqual([]);
});

test('when the guild office goes through its pages and a class, then axe finds nothing serious', async ({ page }) => {
  test.setTimeout(180_000);
  const errors = watchErrors(page);
  await signIn(page, demo.admin);
  const found = await checkPages(page, [
    '/guild-office',
    '/guild-office/people',
    '/guild-office/invitations',
    '/guild-office/activity',
    '/guild-office/mail',
    '/account',
    '/calculators',
  ]);
  await page.goto('/guild-office');
  await page.getByRole('link', { name: 'Spring Bench 2027' }).click();
  await settle(page);
  found.push(...(await seriousViolations(page)));
  // On a class page the guild office is still the section the office is in.
  await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Guild office' })).toHaveClass(
    /bg-brass/,
  );
  expect(found).toEqual([]);
  expect(errors).toEqual([]);
});

test('when the guild office arrows through a role list and opens a confirm step by keyboard, then nothing changes and focus stays put', async ({
  page,
}) => {
  await signIn(page, demo.admin);
  await page.goto('/guild-office/people');
  const role = page.getByLabel('Role of Hollis Dunstable');
  await expect(role).toHaveValue('apprentice');
  await role.focus();
  await page.keyboard.press('ArrowDown');
  // The choice waits for its own button: a reload shows the role unchanged.
  await expect(page.getByRole('button', { name: 'Make Hollis Dunstable mentor' })).toBeVisible();
  await page.reload();
  await expect(page.getByLabel('Role of Hollis Dunstable')).toHaveValue('apprentice');

  const deactivate = page.getByRole('button', { name: 'Deactivate Hollis Dunstable' });
  await deactivate.focus();
  await page.keyboard.press('Enter');
  await expect(page.getByRole('group', { name: /Sign Hollis out everywhere/ })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Keep', exact: true })).toBeFocused();
  await page.keyboard.press('Escape');
  await expect(deactivate).toBeFocused();
  await expect(page.getByRole('row').filter({ hasText: 'Hollis Dunstable' })).toContainText('Active');
});
