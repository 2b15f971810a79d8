import { expect, test, type Page } from '@playwright/test';
import sharp from 'sharp';
import { formatMinutes } from '../shared/schemas/log-entry';
import { demo, signIn, signOut } from './support/demo';

/** This week's bench time as the log page shows it, in minutes. */
async function weekMinutes(page: Page): Promise<number> {
  const text = (await page.getByTestId('week-hours').textContent()) ?? '';
  const h = Number(/(\d+) h/.exec(text)?.[1] ?? 0);
  const m = Number(/(\d+) min/.exec(text)?.[1] ?? 0);
  return h * 60 + m;
}

test('an apprentice logs time with a photo and a reading, the mentor comments and grades, the apprentice sees it', async ({
  page,
}) => {
  const title = `Depthed the fourth wheel ${Date.now()}`;
  const photo = await sharp({ create: { width: 320, height: 240, channels: 3, background: '#a8802f' } })
    .jpeg()
    .toBuffer();

  await signIn(page, demo.ned);
  await page.getByRole('link', { name: 'Bench log' }).click();
  await expect(page.getByRole('heading', { name: 'Bench log', level: 1 })).toBeVisible();
  await expect(page.getByTestId('week-hours')).toBeVisible();
  const before = await weekMinutes(page);

  // The timer keeps running through a reload; stopping it fills the time fields.
  const form = page.getByRole('form', { name: 'New log entry' });
  await form.getByRole('button', { name: 'Start timer' }).click();
  await page.reload();
  await expect(form.getByRole('button', { name: 'Pause' })).toBeVisible();
  await form.getByRole('button', { name: 'Stop and use the time' }).click();
  await expect(form.getByLabel('Minutes', { exact: true })).toHaveValue('1');

  await form.getByLabel('Title').fill(title);
  await form.getByLabel('Hours').fill('1');
  await form.getByLabel('Minutes', { exact: true }).fill('25');
  await form.getByLabel('Notes').fill('Set the depthing tool, then **planted** the fourth wheel.');
  await form.getByRole('button', { name: 'Add a measurement' }).click();
  await form.getByLabel('What (row 1)').fill('end shake');
  await form.getByLabel('Value').fill('0.15');
  await form.getByLabel('Unit').fill('mm');
  await form
    .getByLabel('Add photos')
    .setInputFiles({ name: 'fourth-wheel.jpg', mimeType: 'image/jpeg', buffer: photo });
  await expect(form.getByRole('img', { name: 'Attached photo: fourth-wheel.jpg' })).toBeVisible();
  await form.getByRole('button', { name: 'Add to the log' }).click();

  await expect(page.getByRole('link', { name: title })).toBeVisible();
  await expect(page.getByTestId('week-hours')).toHaveText(formatMinutes(before + 85));

  await page.getByRole('link', { name: title }).click();
  await expect(page.getByRole('cell', { name: '0.15 mm' })).toBeVisible();
  await expect(page.getByRole('img', { name: new RegExp(`Photo 1 of 1 for “${title}”`) })).toBeVisible();
  await expect(page.locator('strong', { hasText: 'planted' })).toBeVisible();
  await signOut(page);

  await signIn(page, demo.odile);
  const toRead = page.getByRole('link', { name: title });
  await expect(toRead).toBeVisible();
  await toRead.click();
  await expect(page.getByRole('heading', { name: title })).toBeVisible();
  await page.getByLabel('Your comment').fill('Measure the end shake again once the plates are pinned.');
  await page.getByRole('button', { name: 'Add comment' }).click();
  await expect(
    page.getByText('Measure the end shake again once the plates are pinned.', { exact: true }),
  ).toBeVisible();
  const grade = page.getByRole('form', { name: 'Grade this entry' });
  await grade.getByRole('group', { name: 'Completeness' }).getByLabel('3 sound').check();
  await grade.getByRole('group', { name: 'Measurements' }).getByLabel('4 exemplary').check();
  await grade.getByRole('group', { name: 'Photos' }).getByLabel('2 nearly').check();
  await grade.getByLabel('Comment with the grade').fill('A clear record; one more photo from the side.');
  await grade.getByRole('button', { name: 'Save grade' }).click();
  await expect(page.getByText('graded on version 1')).toBeVisible();
  await signOut(page);

  await signIn(page, demo.ned);
  await page.getByRole('link', { name: 'Bench log' }).click();
  await page.getByRole('link', { name: title }).click();
  const given = page.getByRole('article', { name: 'Grade from Odile Marchetti' });
  await expect(given).toContainText('graded on version 1');
  await expect(given).toContainText('4 exemplary');
  await expect(page.getByText('A clear record; one more photo from the side.')).toBeVisible();

  // An edit after the grade is marked, and the grade keeps the version it was given for.
  await page.getByRole('button', { name: 'Edit' }).click();
  await page.getByLabel('Notes').fill('Set the depthing tool, then planted the fourth wheel. Pinned the plates.');
  await page.getByRole('button', { name: 'Save changes' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Changed after grading at' })).toContainText('version 2');
  await expect(given).toContainText('(the entry is now at version 2)');

  const csv = await page.request.get('/api/log-entries/export.csv');
  expect(csv.status()).toBe(200);
  const text = await csv.text();
  expect(text).toContain(title);
  expect(text).toContain('end shake 0.15 mm');
  expect(text).toContain('1 h 25 min');
});
