import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { expect, test, type Browser, type Page } from '@playwright/test';
import sharp from 'sharp';
import { caughtMail, demo, signIn } from './support/demo';

const LESSON = '/courses/going-train-wall-regulator/form-cutters-and-cutting-teeth';
const PROJECT = 'A wheel cutter and a test blank';

/** A small JPEG made for the test: a brass-coloured blank on a dark bench. */
async function photoFile(name: string, hue: string) {
  const dir = mkdtempSync(path.join(tmpdir(), 'tickwright-photo-'));
  const file = path.join(dir, name);
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="900" height="600"><rect width="900" height="600" fill="#3b3026"/><circle cx="450" cy="300" r="200" fill="${hue}"/><circle cx="450" cy="300" r="30" fill="#111"/></svg>`;
  writeFileSync(file, await sharp(Buffer.from(svg)).jpeg({ quality: 85 }).toBuffer());
  return file;
}

async function as(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signIn(page, email);
  return page;
}

async function scoreEvery(page: Page, score: RegExp) {
  const choices = page.getByRole('radio', { name: score });
  const count = await choices.count();
  expect(count).toBeGreaterThanOrEqual(3);
  for (let i = 0; i < count; i += 1) await choices.nth(i).check();
}

test('a piece goes from the apprentice to the mentor, comes back for rework with a pin, and passes on version 2', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const ned = await as(browser, demo.ned);

  // The apprentice starts from the lesson's project and uploads a photo; the upload is held back a moment so that
  // its progress bar can be seen.
  await ned.goto(LESSON);
  await ned.getByRole('link', { name: 'Send for review' }).click();
  await expect(ned.getByRole('heading', { name: PROJECT })).toBeVisible();
  await ned.route('**/api/uploads', async (route) => {
    await new Promise((r) => setTimeout(r, 1200));
    await route.continue();
  });
  await ned.getByLabel('Add photos').setInputFiles(await photoFile('blank.jpg', '#c99f4a'));
  await expect(ned.getByRole('progressbar', { name: 'Uploading photo 1' })).toBeVisible();
  await expect(ned.getByRole('progressbar')).toHaveCount(0, { timeout: 15_000 });
  await ned.unroute('**/api/uploads');
  await ned.getByLabel('Caption for photo 1').fill('Test blank, cut with the new cutter');
  await ned
    .getByRole('textbox', { name: 'Notes for your mentor' })
    .fill('Cut **six** test teeth; the profile matches the gauge.');
  await ned.getByRole('button', { name: 'Send version 1 for review' }).click();
  await expect(ned.getByText('Waiting for review').first()).toBeVisible();
  const pieceUrl = ned.url();
  expect(pieceUrl).toMatch(/\/pieces\/\d+$/);

  await expect
    .poll(async () =>
      (await caughtMail()).some((m) => m.subject.includes('Ned Pellow sent') && m.subject.includes(PROJECT)),
    )
    .toBe(true);

  // The mentor finds it in the queue, drops a pin, scores every criterion and asks for rework.
  const odile = await as(browser, demo.odile);
  await odile.getByRole('link', { name: /To review/ }).click();
  const row = odile.getByRole('row').filter({ hasText: 'Ned Pellow' }).filter({ hasText: PROJECT });
  await row.getByRole('link', { name: /Review/ }).click();
  const photo = odile.getByRole('img', { name: /Click on the photo to drop a pin/ });
  const box = (await photo.boundingBox())!;
  await odile.mouse.click(box.x + box.width * 0.3, box.y + box.height * 0.4);
  await odile.getByLabel('Note for pin 1 (photo 1)').fill('Ragged flank on this tooth');
  const pin = odile.getByRole('button', { name: /Pin 1: Ragged flank/ });
  await expect(pin).toBeVisible();
  // Dragged a little to the right, to where the flank really is.
  await pin.hover();
  const here = (await photo.boundingBox())!;
  await odile.mouse.down();
  await odile.mouse.move(here.x + here.width * 0.45, here.y + here.height * 0.5, { steps: 5 });
  await odile.mouse.up();
  await scoreEvery(odile, /^2 nearly/);
  await expect(odile.getByText('below the pass mark')).toBeVisible();
  await expect(odile.getByRole('radio', { name: /^Passed/ })).toBeDisabled();
  await odile.getByRole('radio', { name: 'Rework' }).check();
  await odile.getByRole('textbox', { name: 'Comment' }).fill('The profile is right; clean up the flanks.');
  const reviewUrl = odile.url();
  await odile.getByRole('button', { name: 'Send review' }).click();
  await expect(odile.getByRole('heading', { name: 'To review' })).toBeVisible();
  const stored = await (await odile.request.get(`/api/submissions/${reviewUrl.split('/').pop()}`)).json();
  const [storedPin] = stored.versions[0].review.pins;
  expect(storedPin.x).toBeCloseTo(0.45, 1);
  expect(storedPin.y).toBeCloseTo(0.5, 1);

  // The apprentice sees the pin and the scores, then sends a new version.
  await ned.goto(pieceUrl);
  await expect(ned.getByRole('button', { name: /Pin 1: Ragged flank on this tooth/ })).toBeVisible();
  await expect(ned.getByRole('row').filter({ hasText: '2 nearly' }).first()).toBeVisible();
  await expect(ned.getByText('The profile is right; clean up the flanks.')).toBeVisible();
  await ned.getByRole('link', { name: 'Send a new version' }).first().click();
  await ned.getByLabel('Add photos').setInputFiles(await photoFile('blank-2.jpg', '#d9b25a'));
  await expect(ned.getByRole('img', { name: 'Photo 2' })).toBeVisible();
  await expect(ned.getByRole('progressbar')).toHaveCount(0, { timeout: 15_000 });
  await ned.getByRole('button', { name: 'Move photo 2 up' }).click();
  await ned.getByLabel('Caption for photo 1').fill('Flanks after stoning');
  await ned.getByRole('button', { name: 'Send version 2 for review' }).click();
  await expect(ned.getByText('Waiting for review').first()).toBeVisible();

  // The mentor passes the new version.
  await odile.reload();
  await odile
    .getByRole('row')
    .filter({ hasText: 'Ned Pellow' })
    .filter({ hasText: PROJECT })
    .getByRole('link', { name: /Review/ })
    .click();
  await expect(odile.getByText(/version 2/).first()).toBeVisible();
  await scoreEvery(odile, /^3 sound/);
  await odile.getByRole('radio', { name: /^Passed/ }).check();
  await odile.getByRole('button', { name: 'Send review' }).click();
  await expect(odile.getByRole('heading', { name: 'To review' })).toBeVisible();

  await ned.goto(pieceUrl);
  await expect(ned.getByText('Passed').first()).toBeVisible();
  await ned.getByRole('button', { name: 'Side by side' }).click();
  await expect(ned.getByRole('heading', { name: 'Version 1' })).toBeVisible();
  await expect(ned.getByRole('heading', { name: 'Version 2' })).toBeVisible();
});

test('the pieces, queue and review pages have no accessibility violations that axe can find', async ({ browser }) => {
  // Three sign-ins and axe on five pages: more than the default minute on a busy 2-core machine.
  test.setTimeout(150_000);
  const { default: AxeBuilder } = await import('@axe-core/playwright');
  const check = async (page: Page, url: string, ready: RegExp) => {
    await page.goto(url);
    await expect(page.getByRole('heading', { name: ready }).first()).toBeVisible();
    const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa']).analyze();
    expect(violations.map((v) => `${url}: ${v.id} ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
  };
  const ned = await as(browser, demo.ned);
  await check(ned, '/pieces', /My pieces/);
  await ned.getByRole('link', { name: 'A pair of upright pivot holes' }).click();
  await ned.waitForURL(/\/pieces\/\d+$/);
  await check(ned, ned.url(), /A pair of upright pivot holes/);
  await check(ned, '/notifications', /Notifications/);
  const odile = await as(browser, demo.odile);
  await check(odile, '/review', /To review/);
  await odile
    .getByRole('row')
    .filter({ hasText: 'Ruth Ashdown' })
    .getByRole('link', { name: /Review/ })
    .click();
  await odile.waitForURL(/\/review\/\d+$/);
  await check(odile, odile.url(), /A pair of upright pivot holes/);
});
