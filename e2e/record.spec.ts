import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { demo, signIn } from './support/demo';

async function seriousViolations(page: Page): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).analyze();
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

const skillCard = (page: Page, label: string) =>
  page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: label, level: 3 }) });

test('when Ned opens My record, then his skills show their status, evidence and hours against the class', async ({
  page,
}) => {
  await signIn(page, demo.ned);
  await page.getByRole('link', { name: 'My record' }).click();
  await expect(page.getByRole('heading', { name: 'My record', level: 1 })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Going Train for a Wall Regulator' })).toBeVisible();

  const layout = skillCard(page, 'Laying out, drilling and pinning plates');
  await expect(layout.getByText('Signed off', { exact: true })).toBeVisible();
  await expect(layout.getByText(/Signed off on .* by Odile Marchetti/)).toBeVisible();
  const pivots = skillCard(page, 'Turning and burnishing pivots');
  await expect(pivots.getByText('Ready for sign-off')).toBeVisible();
  await expect(pivots.getByRole('link', { name: 'Two burnished pivots on a practice arbor' })).toBeVisible();
  // Thumbnails are decorative beside the linked title (alt=""), so they are found as elements, not as images.
  await expect(pivots.locator('img[src*="size=thumb"]').first()).toBeVisible();
  // An apprentice never sees the mentor's actions.
  await expect(page.getByRole('button', { name: /^Sign off/ })).toHaveCount(0);

  await expect(page.getByRole('heading', { name: 'Bench hours in Autumn Bench 2026' })).toBeVisible();
  await expect(page.getByText(/behind by more than a week’s bench time/)).toBeVisible();
  await expect(page.locator('.recharts-surface').first()).toBeVisible();

  await page.getByRole('button', { name: 'Export portfolio' }).click();
  const download = await page.waitForEvent('download');
  expect(download.suggestedFilename()).toBe('portfolio-Ned-Pellow.zip');
  await expect(page.getByText(/Portfolio ready: .* MB/)).toBeVisible();

  expect(await seriousViolations(page)).toEqual([]);
});

test('when Odile signs off Ned’s pivots from the class roster, then she picks the evidence, writes a note and the skill is signed off', async ({
  page,
}) => {
  await signIn(page, demo.odile);
  await page.getByRole('link', { name: 'Classes' }).click();
  await page.getByRole('link', { name: 'Autumn Bench 2026' }).click();
  await page.getByRole('link', { name: 'Record of Ned Pellow' }).click();
  await expect(page.getByRole('heading', { name: 'Record of Ned Pellow' })).toBeVisible();

  await page.getByRole('button', { name: 'Sign off Turning and burnishing pivots' }).click();
  const dialog = page.getByRole('dialog', { name: /Sign off “Turning and burnishing pivots” for Ned Pellow/ });
  await expect(dialog).toBeVisible();
  const piece = dialog.getByRole('checkbox', { name: /Piece: Two burnished pivots on a practice arbor/ });
  await expect(piece).toBeChecked();
  await expect(piece).toBeFocused();
  await expect(dialog.getByRole('button', { name: 'Sign off' })).toBeDisabled();
  await dialog.getByLabel('Note for the record').fill('Square shoulders and a bright burnish on the second try.');
  await dialog.getByRole('button', { name: 'Sign off' }).click();
  await expect(dialog).toBeHidden();

  const pivots = skillCard(page, 'Turning and burnishing pivots');
  await expect(pivots.getByText('Signed off', { exact: true })).toBeVisible();
  await expect(pivots.getByText(/Signed off on .* by Odile Marchetti: “Square shoulders/)).toBeVisible();

  // Withdrawn with a reason, the skill is ready again and the withdrawal stays on the record.
  await pivots.getByRole('button', { name: 'Withdraw the sign-off of Turning and burnishing pivots' }).click();
  await pivots.getByLabel('Why is it withdrawn?').fill('Signed off on the wrong day; I will sign again.');
  await pivots.getByRole('button', { name: 'Withdraw', exact: true }).click();
  await expect(pivots.getByText('Ready for sign-off')).toBeVisible();
  await expect(pivots.getByText(/was withdrawn on .* by Odile Marchetti: Signed off on the wrong day/)).toBeVisible();
});

test('when the guild office opens the finished apprentice’s record, then the certificate downloads and its public check needs no sign-in', async ({
  page,
  browser,
}) => {
  await signIn(page, demo.admin);
  const list = await (await page.request.get('/api/certificates')).json();
  const cert = list.certificates.find(
    (c: { apprentice: { name: string } }) => c.apprentice.name === 'Morwenna Trelease',
  );
  await page.goto(`/apprentices/${cert.apprentice.id}/record`);
  await expect(page.getByRole('heading', { name: 'Record of Morwenna Trelease' })).toBeVisible();
  await expect(page.getByText('7 of 7 skills signed off')).toBeVisible();
  const row = page.getByRole('listitem').filter({ hasText: cert.code });
  await expect(row).toBeVisible();
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    row.getByRole('link', { name: 'Download PDF' }).click(),
  ]);
  expect(download.suggestedFilename()).toBe(`certificate-${cert.code}.pdf`);

  const context = await browser.newContext();
  const stranger = await context.newPage();
  await stranger.goto(`/verify/${cert.code}`);
  await expect(stranger.getByText('Valid certificate')).toBeVisible();
  await expect(stranger.getByText('Morwenna Trelease')).toBeVisible();
  await expect(stranger.getByText('Springs and Heat Treatment')).toBeVisible();
  await expect(stranger.getByText('Saltmarsh Guild of Clockmakers')).toBeVisible();
  expect(await seriousViolations(stranger)).toEqual([]);
  await stranger.goto('/verify/TW-00000-00000-00000-00000');
  await expect(stranger.getByText('No certificate has this code.', { exact: false })).toBeVisible();
  await context.close();
});
