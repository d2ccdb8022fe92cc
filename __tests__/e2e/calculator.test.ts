import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { AppDataSource } from '@/server/db/data-source';

useTestDatabase();
const app = useWebApp();

async function openPrimaryWindingCard(page: Page) {
  await page.goto(app.url);
  await page.getByTestId('search-screen').getByLabel('Search specs').fill('kestrl 900 primry');
  await page.getByTestId('search-results').locator('[data-testid^="hit-"]').first().click();
  await page.getByTestId('spec-screen').getByTestId('calculator').waitFor();
}

describe.each([
  ['phone', PHONE],
  ['desktop', DESKTOP],
])('inline calculator at %s size', (name, viewport) => {
  it('a reading with lead resistance and meter accuracy gives a verdict, the band picture and the steps', async () => {
    const page = await app.browser.newPage({ viewport });
    await openPrimaryWindingCard(page);
    const specId = Number(new URL(page.url()).pathname.split('/').pop());
    const [spec] = await AppDataSource.query('SELECT min_value AS min, max_value AS max FROM specs WHERE id = ?', [
      specId,
    ]);
    const calc = page.getByTestId('spec-screen').getByTestId('calculator');
    // A raw reading of the middle of the band plus 0.5 Ω of test leads: inside after the leads are subtracted.
    const middle = (spec.min + spec.max) / 2;
    await calc.getByLabel('Meter reading', { exact: true }).fill(String(middle + 0.5));
    await calc.getByTestId('optional-toggle').click(); // the corrections are collapsed until asked for
    await calc.getByLabel('Test leads, probes shorted', { exact: true }).fill('0,5');
    await calc.getByLabel('% of reading', { exact: true }).fill('1');
    await calc.getByLabel('Counts', { exact: true }).fill('2');
    await calc.getByLabel('One count is worth', { exact: true }).fill('0.01');
    await expect(calc.getByTestId('verdict-word').innerText()).resolves.toBe('PASS');
    // The picture is drawn once its width is known (after layout): wait for it, then there is one.
    await calc.getByTestId('band-picture').locator('svg').first().waitFor({ state: 'attached' });
    await expect(calc.getByTestId('band-picture').locator('svg').count()).resolves.toBe(1);
    await calc.getByTestId('show-working').click();
    const steps = await calc.getByTestId('verdict-steps').innerText();
    expect(steps).toMatch(/lead/i);
    expect(steps).toMatch(/√3|k = 2|U =/);
    await screenshot(page, `calculator-${name}`);

    // Far outside the band: fail, said in words.
    await calc.getByLabel('Meter reading', { exact: true }).fill(String(spec.max * 4));
    await expect(calc.getByTestId('verdict-word').innerText()).resolves.toBe('FAIL');
    await page.close();
  });
});

it('the standalone calculator judges limits typed by hand and remembers the meter accuracy on the device', async () => {
  const page = await app.browser.newPage({ viewport: PHONE });
  await page.goto(`${app.url}/calculator`);
  const screen = page.getByTestId('calculator-screen');
  await screen.getByLabel('Minimum', { exact: true }).fill('0.7');
  await screen.getByLabel('Maximum', { exact: true }).fill('0.8');
  await screen.getByRole('radio', { name: 'What are you checking?: Gap' }).click();
  await screen.getByRole('radio', { name: 'Spec unit: mm' }).click();
  const calc = screen.getByTestId('standalone-calculator');
  // 0.030 in = 0.762 mm, inside 0.7–0.8 mm → pass. Source: NIST SP 811 (2008) App. B; limits: common practice, no published source
  await calc.getByLabel('Meter reading', { exact: true }).fill('0.030');
  await calc.getByRole('radio', { name: 'Meter reading unit: in' }).click();
  await expect(calc.getByTestId('verdict-word').innerText()).resolves.toBe('PASS');
  await expect(calc.getByTestId('verdict-summary').innerText()).resolves.toMatch(/0\.762 mm/);
  await calc.getByTestId('optional-toggle').click();
  await calc.getByLabel('% of reading', { exact: true }).fill('2.5');
  await screenshot(page, 'calculator-standalone-phone');
  await page.reload();
  await page.getByTestId('calculator-screen').getByTestId('standalone-calculator').waitFor();
  // Remembered under the quantity it was typed on (a gap): choosing Gap again offers it as a chip.
  await page.getByTestId('calculator-screen').getByRole('radio', { name: 'What are you checking?: Gap' }).click();
  await page.getByTestId('standalone-calculator').getByTestId('memory-chips').waitFor();
  await expect(page.getByTestId('standalone-calculator').getByTestId('memory-chips').innerText()).resolves.toMatch(
    /2\.5 %.*from your last check/,
  );
  await page.getByTestId('standalone-calculator').getByTestId('optional-toggle').click();
  const percent = page.getByTestId('standalone-calculator').getByLabel('% of reading', { exact: true });
  // The remembered value arrives from device storage just after the first render.
  await page
    .waitForFunction((el) => (el as { value?: string } | null)?.value === '2.5', await percent.elementHandle(), {
      timeout: 5000,
    })
    .catch(() => undefined);
  await expect(percent.inputValue()).resolves.toBe('2.5');
  await page.close();
});
