import { expect, test } from '@playwright/test';
import { demo, signIn } from './support/demo';

test('when a visitor opens the home page, then the styled sign-in screen appears with shipped fonts only', async ({
  page,
}) => {
  const outside: string[] = [];
  page.on('request', (req) => {
    if (!req.url().startsWith('http://localhost')) outside.push(req.url());
  });
  await page.goto('/');
  await expect(page).toHaveURL(/\/sign-in/);
  await expect(page.getByText('Tickwright').first()).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  const background = await page.evaluate(() => getComputedStyle(document.documentElement).backgroundColor);
  expect(background).toBe('rgb(247, 243, 234)');
  await page.evaluate(() => document.fonts.ready);
  const fonts = await page.evaluate(() =>
    [...document.fonts].filter((f) => f.status === 'loaded').map((f) => f.family),
  );
  expect(fonts.join(' ')).toMatch(/Inter/);
  expect(outside).toEqual([]);
});

test('when each demo role signs in, then the navigation shows only that role’s areas', async ({ page }) => {
  await signIn(page, demo.ned);
  const nav = page.getByRole('navigation', { name: 'Main' });
  await expect(nav.getByRole('link')).toHaveText([
    'Today',
    'Courses',
    'Calculators',
    'Bench log',
    'My pieces',
    'My record',
  ]);
  await page.getByRole('button', { name: 'Sign out' }).click();
  await signIn(page, demo.odile);
  await expect(nav.getByRole('link')).toHaveText([/Today/, /To review/, 'Classes', 'Courses', 'Calculators']);
  await page.getByRole('button', { name: 'Sign out' }).click();
  await signIn(page, demo.admin);
  await expect(nav.getByRole('link')).toHaveText(['Guild office', 'Courses', 'Calculators']);
});
