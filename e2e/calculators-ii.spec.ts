import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { demo, signIn } from './support/demo';

// Ruth rather than Ned: another spec switches Ned to inches, and both specs share one database.
async function openCalculator(page: Page, name: string) {
  await signIn(page, demo.ruth);
  await page.goto(`/calculators/${name}`);
  await page.getByRole('radio', { name: /Metric/ }).check({ force: true });
}

test('when five adjusting-rod readings are entered, then the spring and fusee torque curves and the radii appear', async ({
  page,
}) => {
  await openCalculator(page, 'fusee');
  await expect(page.getByText('Example readings')).toBeVisible();
  await page.getByRole('button', { name: 'Clear the example' }).click();
  await expect(
    page.getByText('Enter adjusting-rod readings to see the torque curve and the fusee radii.'),
  ).toBeVisible();
  // The same weight at rising distances: the torques rise as 45 : 60 : 75 : 90 : 112.5 (computed).
  const distances = ['45', '60', '75', '90', '112.5'];
  for (const [i, x] of distances.entries()) {
    await page.getByLabel(`Turn ${i + 1} weight (g)`).fill('100');
    await page.getByLabel(`Turn ${i + 1} balance distance (mm)`).fill(x);
  }
  await page.getByLabel(/^Largest fusee radius/).fill('10');

  const plot = page.getByTestId('torque-plot');
  await expect(plot.locator('.recharts-line')).toHaveCount(2);
  await expect(plot.locator('.recharts-line-curve')).toHaveCount(2);
  await expect(plot.getByText('Spring torque (at the barrel)')).toBeVisible();
  await expect(plot.getByText('Torque at the fusee arbor')).toBeVisible();
  // TRADE.md §6: r = r_max·T_min/T, so the radii fall as the torque rises: 10, 7.5, 6, 5, 4 mm, shown to 0.01 mm
  // (computed).
  const radii = page.getByTestId('radius-row').locator('td:nth-child(4)');
  await expect(radii).toHaveText(['10.00', '7.50', '6.00', '5.00', '4.00']);
  await expect(page).toHaveURL(/readings=/);
});

test('when three arbors are planted, then the drawing prints at 1:1 and downloads as an SVG with the arbors', async ({
  page,
}) => {
  await openCalculator(page, 'planting');
  const editors = page.getByTestId('arbor-editor');
  // Start from one arbor and plant the other two by hand.
  await editors.nth(2).getByRole('button', { name: 'Remove Escape' }).click();
  await editors.nth(1).getByRole('button', { name: 'Remove Third' }).click();
  await expect(editors).toHaveCount(1);
  const stamp = String(Date.now()).slice(-5);
  const names = [`Pillar ${stamp}`, `Wheel ${stamp}`, `Pinion ${stamp}`];

  await editors.nth(0).getByLabel('Name').fill(names[0]);
  await editors.nth(0).getByLabel('X from the datum line (mm)').fill('20');
  await editors.nth(0).getByLabel('Y from the datum line (mm)').fill('20');

  await page.getByRole('button', { name: 'Add an arbor' }).click();
  await editors.nth(1).getByLabel('Name').fill(names[1]);
  await editors.nth(1).getByLabel('From arbor').selectOption(names[0]);
  await editors.nth(1).getByLabel('Centre distance (mm)').fill('40');
  await editors
    .nth(1)
    .getByLabel(/^Angle/)
    .fill('0');

  await page.getByRole('button', { name: 'Add an arbor' }).click();
  const third = editors.nth(2);
  await third.getByLabel('Name').fill(names[2]);
  await third.getByLabel('First arbor').selectOption(names[0]);
  await third.getByLabel('Second arbor').selectOption(names[1]);
  const distances = third.getByLabel('Centre distance to it (mm)');
  await distances.nth(0).fill('25');
  await distances.nth(1).fill('30');
  await third.getByLabel(/^Pitch radius/).fill('5');

  // TRADE.md §8: 25 mm from A and 30 mm from B 40 mm away is (16.5625, 18.7265) from A (computed).
  const rows = page.getByTestId('drilling-row');
  await expect(rows).toHaveCount(3);
  await expect(rows.nth(2)).toContainText('36.5625');
  await expect(rows.nth(2)).toContainText('38.7265');

  const drawing = page.getByTestId('planting-drawing');
  const widthMm = parseFloat((await drawing.getAttribute('width')) ?? '');
  expect(widthMm).toBeGreaterThan(0);
  await page.emulateMedia({ media: 'print' });
  const printed = await page.getByTestId('planting-drawing-print').boundingBox();
  // CSS has 96 px to the inch, so a true-size sheet is widthMm × 96/25.4 px wide.
  expect(printed?.width).toBeCloseTo((widthMm * 96) / 25.4, 0);
  await page.emulateMedia({ media: 'screen' });

  const downloading = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Download SVG' }).click();
  const download = await downloading;
  expect(download.suggestedFilename()).toMatch(/^planting-\d{4}-\d{2}-\d{2}\.svg$/);
  const svg = await readFile((await download.path()) as string, 'utf8');
  expect(svg.startsWith('<svg')).toBe(true);
  for (const name of names) expect(svg).toContain(name);
  expect(svg).toContain('<circle');
  expect(svg).toMatch(/width="[\d.]+mm"/);
});
