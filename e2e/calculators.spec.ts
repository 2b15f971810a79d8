import { expect, test, type Page } from '@playwright/test';
import { demo, signIn, signOut } from './support/demo';

/** The figure beside a result's name, as the apprentice reads it. */
const result = (page: Page, label: string) =>
  page.locator('dt', { hasText: label }).locator('xpath=following-sibling::dd[1]');

async function fill(page: Page, label: RegExp, value: string) {
  await page.getByRole('textbox', { name: label }).fill(value);
}

test('when an apprentice types into the broach calculator, then the insertion depth follows and the units stay as chosen', async ({
  page,
}) => {
  await signIn(page, demo.ned);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Calculators' }).click();
  await page.getByRole('link', { name: 'Broach taper' }).click();
  await expect(page.getByRole('heading', { name: 'Broach taper', level: 1 })).toBeVisible();

  await fill(page, /Taper of the broach/, '0.02');
  await fill(page, /Broach diameter at your reference mark/, '0.50');
  await page
    .getByRole('combobox', { name: /Section of the cutting broach/ })
    .selectOption({ label: 'Round, or readings already cutting diameters' });
  await fill(page, /Target hole diameter/, '1.2');
  // Round broach, 2 mm plate opened from both faces: (1.2 − 0.5) / 0.02 + 2/2 = 36 mm (computed)
  await expect(result(page, 'Insertion depth')).toHaveText(/^36\s*mm$/);
  await page
    .getByRole('combobox', { name: /Section of the cutting broach/ })
    .selectOption({ label: 'Five sides (read corner to flat)' });
  await fill(page, /Target hole diameter/, '1.05');
  // The broaching lesson's five-sided broach: 1.05 mm at mid-plate -> 23.49 mm (computed; tests/shared/calc)
  await expect(result(page, 'Insertion depth')).toHaveText(/^23\.49\s*mm$/);
  await expect(page).toHaveURL(/targetDiameterMm=1\.05/);
  await expect(result(page, 'Hole at the entry face')).toHaveText(/^1\.072\s*mm$/);

  await page.getByRole('radio', { name: /Imperial/ }).check();
  await expect(result(page, 'Insertion depth')).toHaveText(/^0\.9247\s*in$/); // 23.487 mm / 25.4 (computed)
  await page.reload();
  await expect(result(page, 'Insertion depth')).toHaveText(/^0\.9247\s*in$/);
  await page.getByRole('radio', { name: /Metric/ }).check();
  await expect(result(page, 'Insertion depth')).toHaveText(/^23\.49\s*mm$/);
});

test('when an apprentice saves a result, then it is there after signing in anew and reopens with its inputs', async ({
  page,
}) => {
  const title = `Third wheel hole ${Date.now()}`;
  await signIn(page, demo.ned);
  await page.goto('/calculators/broach-taper');
  await fill(page, /Taper of the broach/, '0.02');
  await fill(page, /Broach diameter at your reference mark/, '0.5');
  await fill(page, /Target hole diameter/, '1.05');
  await fill(page, /Plate thickness/, '2');
  await fill(page, /Pivot diameter/, '1');
  await expect(result(page, 'Insertion depth')).toHaveText(/^23\.49\s*mm$/);
  await page.getByRole('button', { name: 'Save result' }).click();
  await page.getByRole('textbox', { name: 'Title for this result' }).fill(title);
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByRole('link', { name: 'See your saved results' })).toBeVisible();

  await signOut(page);
  await signIn(page, demo.ned);
  await page.goto('/calculators');
  await page.getByRole('link', { name: 'Saved results' }).click();
  const item = page.getByRole('listitem').filter({ hasText: title });
  await expect(item).toContainText('Broach taper');
  await item.getByRole('link', { name: `Reopen ${title}` }).click();
  await expect(page).toHaveURL(/\/calculators\/broach-taper\?/);
  await expect(page.getByRole('textbox', { name: /Target hole diameter/ })).toHaveValue('1.05');
  await expect(result(page, 'Insertion depth')).toHaveText(/^23\.49\s*mm$/);

  await page.goBack();
  await item.getByRole('button', { name: `Delete ${title}` }).click();
  await item.getByRole('button', { name: 'Yes, delete' }).click();
  await expect(page.getByText(title)).toHaveCount(0);
});
