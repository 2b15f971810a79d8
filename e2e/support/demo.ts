import { expect, type Page } from '@playwright/test';
import { E2E } from './env';

export const DEMO_PASSWORD = 'tickwright-demo';
export const demo = {
  admin: 'office@saltmarsh-guild.test',
  odile: 'odile@saltmarsh-guild.test',
  bram: 'bram@saltmarsh-guild.test',
  ned: 'ned@saltmarsh-guild.test',
  ruth: 'ruth@saltmarsh-guild.test',
  mabli: 'mabli@saltmarsh-guild.test',
} as const;

/** Signs in through the real form and waits for the signed-in shell. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
}

export async function signOut(page: Page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
}

/** Messages caught by the local fake mail service (maildev's REST API). */
export async function caughtMail(): Promise<{ subject: string; text: string; to: { address: string }[] }[]> {
  const res = await fetch(`http://localhost:${E2E.mailWebPort}/api/email`);
  return res.json();
}
