import type { SpecDetailDto } from '@/lib/contracts/library';
import { DESKTOP, PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';

useTestDatabase();
const app = useWebApp();

describe.each([
  ['phone', PHONE],
  ['desktop', DESKTOP],
])('search → spec card at %s size', (name, viewport) => {
  it('a query with typos in model and parameter opens the right spec card and shows its value', async () => {
    const page = await app.browser.newPage({ viewport });
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    await page.goto(app.url);
    const search = page.getByTestId('search-screen');
    await search.getByLabel('Search specs').fill('kestrl 900 primry');
    const firstHit = search.getByTestId('search-results').locator('[data-testid^="hit-"]').first();
    await firstHit.waitFor();
    await expect(firstHit.innerText()).resolves.toMatch(/primary/i);
    await screenshot(page, `search-${name}`);

    await firstHit.click();
    const card = page.getByTestId('spec-screen');
    await card.waitFor();
    await expect(card.getByTestId('spec-values').innerText()).resolves.toMatch(/primary/i);
    const shown = await card.getByTestId('spec-display').innerText();
    expect(shown).toMatch(/^\d[\d.]*–\d[\d.]* Ω/);
    const specId = Number(new URL(page.url()).pathname.split('/').pop());
    const api = (await (await fetch(`${app.url}/api/specs/${specId}`)).json()) as SpecDetailDto;
    expect(api.parameter).toMatch(/primary winding/i);
    expect(`${api.model.make.name} ${api.model.name}`).toMatch(/kestrel.*900/i);
    expect(shown).toBe(api.display);
    await expect(card.getByTestId('spec-citation').innerText()).resolves.toMatch(/Page/);
    await expect(card.getByTestId('caution-high-voltage').isVisible()).resolves.toBe(true);
    await screenshot(page, `spec-${name}`);

    // A deep link to the same card works on a fresh load (single-page fallback).
    const deepLink = page.url();
    await page.goto(deepLink);
    await page.getByTestId('spec-display').waitFor();
    expect(errors).toEqual([]);
    await page.close();
  });
});

it('the model sheet lists components with inline values', async () => {
  const page = await app.browser.newPage({ viewport: PHONE });
  await page.goto(app.url);
  // A demo model by name: other files in this worker's database add makes of their own.
  await page
    .getByTestId('model-list')
    .getByRole('link', { name: /Open model sheet Kestrel Moto 900 Trail/ })
    .first()
    .click();
  const sheet = page.getByTestId('model-screen');
  await sheet.waitFor();
  await expect(sheet.locator('[data-testid^="component-"]').count()).resolves.toBeGreaterThan(2);
  await screenshot(page, 'model-phone');
  await page.close();
});
