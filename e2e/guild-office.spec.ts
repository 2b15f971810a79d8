import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { expect, test } from '@playwright/test';
import { caughtMail, demo, signIn } from './support/demo';

test('when the admin enrols a class from a roster file, then four invitees are mailed and one joins the course through the link, once', async ({
  page,
  browser,
}) => {
  // A long journey through four pages, a file upload and the mail service: more than the default minute.
  test.setTimeout(240_000);
  const stamp = Date.now();
  const className = `Winter Bench ${stamp}`;
  const people = [
    ['Tamsin Quarrell', `tamsin.${stamp}@example.test`],
    ['Jago Penhallow', `jago.${stamp}@example.test`],
    ['Wren Halloran', `wren.${stamp}@example`],
    ['Elias Brindlecombe', `elias.${stamp}@example.test`],
    ['Linnet Sowerby', `linnet.${stamp}@example.test`],
  ];
  const good = people.filter(([, email]) => email.endsWith('.test')).map(([, email]) => email);
  const csvFile = path.join(mkdtempSync(path.join(tmpdir(), 'tickwright-roster-')), 'winter-roster.csv');
  writeFileSync(csvFile, ['name,e-mail', ...people.map(([name, email]) => `${name},${email}`)].join('\n'));

  await signIn(page, demo.admin);
  await expect(page.getByRole('heading', { name: 'Guild office' })).toBeVisible();

  await page.getByRole('button', { name: 'New class' }).click();
  await page.getByLabel('Class name').fill(className);
  await page.getByLabel('Course').selectOption({ label: 'Going Train for a Wall Regulator' });
  await page.getByLabel('Starts on').fill('2027-01-04');
  await page.getByLabel('Ends on').fill('2027-03-26');
  await page.getByLabel('Capacity (apprentices)').fill('8');
  await page.getByRole('button', { name: 'Create class' }).click();
  await expect(page.getByRole('heading', { name: className })).toBeVisible();

  await page.getByRole('button', { name: 'Edit class' }).click();
  await page.getByRole('checkbox', { name: 'Odile Marchetti' }).check();
  await page.getByRole('button', { name: 'Save changes' }).click();
  await expect(page.getByRole('definition').filter({ hasText: 'Odile Marchetti' })).toBeVisible();

  await page.getByLabel('Roster file (CSV)').setInputFiles(csvFile);
  const preview = page.getByRole('table').filter({ hasText: 'Preview' });
  await expect(preview.getByRole('row')).toHaveCount(6);
  const flagged = preview.locator('tr[data-problem]');
  await expect(flagged).toHaveCount(1);
  await expect(flagged).toContainText('Wren Halloran');
  await expect(flagged).toContainText('Not a valid e-mail address.');

  await page.getByRole('button', { name: 'Import 4 people' }).click();
  await expect(page.getByText('4 of 4 addresses done.')).toBeVisible();
  await expect(page.getByRole('table', { name: 'Roster' }).getByText('Invited')).toHaveCount(4);

  let invitations: Awaited<ReturnType<typeof caughtMail>> = [];
  await expect(async () => {
    invitations = (await caughtMail()).filter((m) => m.subject === `Your invitation to ${className} on Tickwright`);
    expect(invitations.map((m) => m.to[0].address).sort()).toEqual([...good].sort());
  }).toPass({ timeout: 15_000 });

  const tamsinMail = invitations.find((m) => m.to[0].address === good[0])!;
  const link = /http:\/\/localhost:\d+\/invitation\/[A-Za-z0-9_-]+/.exec(tamsinMail.text)?.[0];
  expect(link).toBeDefined();

  const invitee = await (await browser.newContext()).newPage();
  await invitee.goto(link!);
  await expect(invitee.getByRole('heading', { name: `Join ${className}` })).toBeVisible();
  await expect(invitee.getByLabel('Your name')).toHaveValue('Tamsin Quarrell');
  await invitee.getByLabel('Choose a password').fill('brass-and-steel-arbor');
  await invitee.getByLabel('Password again').fill('brass-and-steel-arbor');
  await invitee.getByRole('button', { name: 'Accept and start' }).click();
  await expect(invitee).toHaveURL(/\/courses\/going-train-wall-regulator$/);
  await expect(invitee.getByRole('button', { name: 'Sign out' })).toBeVisible();

  await invitee.goto(link!);
  await expect(invitee.getByRole('heading', { name: 'This invitation link no longer works' })).toBeVisible();
  await expect(invitee.getByText(/Ask the guild office for a new one/)).toBeVisible();

  await page.reload();
  const roster = page.getByRole('table', { name: 'Roster' });
  await expect(roster.getByRole('row').filter({ hasText: 'Tamsin Quarrell' })).toContainText('Active');
  await expect(roster.getByText('Invited')).toHaveCount(3);

  // The office sees each invitation's e-mail leave the outbox.
  await page.goto('/guild-office');
  await page.getByRole('navigation', { name: 'Guild office' }).getByRole('link', { name: 'Outgoing mail' }).click();
  await expect(page.getByRole('heading', { name: 'Outgoing mail' })).toBeVisible();
  const jagoRow = page.getByRole('row').filter({ hasText: good[1] });
  await expect(jagoRow).toContainText(`Your invitation to ${className} on Tickwright`);
  await expect(jagoRow).toContainText('Sent');
});
