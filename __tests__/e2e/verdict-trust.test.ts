/**
 * Issue 10 at the bike, on a phone (390×844): the lead resistance of a kΩ winding is taken in Ω and
 * remembered as a chip, the verdict stays beside the reading while the corrections are typed, and a
 * rest voltage with only a minimum passes without a false marginal.
 */
import type { Page } from 'playwright-core';
import { PHONE, SCREENSHOTS, screenshot, useWebApp } from '../helpers/browser';
import { expectText, expectVisible, step } from '../helpers/expect-visible';
import { useTestDatabase } from '../helpers/test-db';
import { AppDataSource } from '@/server/db/data-source';
import path from 'node:path';

useTestDatabase();
const app = useWebApp();

/** A published spec of the demo library (invented data), by its model and parameter. */
async function specId(model: string, parameter: string): Promise<number> {
  const [row] = await AppDataSource.query(
    `SELECT s.id FROM specs s JOIN components c ON c.id = s.component_id JOIN vehicle_models m ON m.id = c.model_id
     WHERE m.name = ? AND s.parameter = ? AND s.status = 'published' LIMIT 1`,
    [model, parameter],
  );
  if (!row) throw new Error(`no demo spec "${parameter}" on ${model}`);
  return row.id;
}

async function openCalculator(page: Page, model: string, parameter: string) {
  await page.goto(`${app.url}/specs/${await specId(model, parameter)}`);
  const calc = page.getByTestId('spec-screen').getByTestId('calculator');
  await expectVisible(calc, 'the spec card calculator');
  return calc;
}

/** The element's box lies within the phone's screen (the part a technician sees without scrolling). */
async function onScreen(page: Page, testId: string) {
  const box = await page.getByTestId('spec-screen').getByTestId(testId).boundingBox();
  return box !== null && box.y >= 0 && box.y + Math.min(box.height, 60) <= PHONE.height;
}

it('a kΩ secondary winding takes the leads in Ω; a minimum-only rest voltage of 12.8 V passes', async () => {
  const page = await app.browser.newPage({ viewport: PHONE });
  const calc = await step('open the kΩ secondary-winding spec', () =>
    openCalculator(page, '650 Moorland', 'Secondary winding resistance without plug cap'),
  );
  await step('the meter mode is the first instruction', () =>
    expectText(calc.getByTestId('mode-instruction'), 'Meter on resistance (Ω)', 'the mode instruction'),
  );
  await step('type 16.3 kΩ: the verdict appears right under the reading', async () => {
    await calc.getByLabel('Meter reading', { exact: true }).fill('16.3');
    await expectText(calc.getByTestId('verdict-word'), 'PASS', 'the verdict word');
    expect(await onScreen(page, 'verdict-summary')).toBe(true);
  });
  await step('open the optional corrections and type leads 0.4: 0.4 Ω is taken off, not 400 Ω', async () => {
    await calc.getByTestId('optional-toggle').click();
    const leads = calc.getByLabel('Test leads, probes shorted', { exact: true });
    await leads.fill('0.4');
    await expectText(calc.getByTestId('verdict-value'), '16.2996 kΩ', 'the corrected value');
    await expectText(calc.getByTestId('verdict-explanation'), 'after taking off 0.4 Ω for the leads', 'the words');
    await expectText(calc.getByTestId('verdict-word'), 'PASS', 'the verdict word');
    // The summary stays in view while the lead field is being typed in.
    await leads.focus();
    await leads.scrollIntoViewIfNeeded();
    expect(await onScreen(page, 'verdict-summary')).toBe(true);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'verdict-trust-leads-phone-view.png') });
    // …and when the last optional field, the meter's count, is scrolled to (the summary sticks to the top).
    const count = calc.getByLabel('One count is worth', { exact: true });
    await count.scrollIntoViewIfNeeded();
    await count.focus();
    expect(await onScreen(page, 'verdict-summary')).toBe(true);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'verdict-trust-meter-phone-view.png') });
  });
  await step('the working shows the subtraction in Ω with its result', async () => {
    await calc.getByTestId('show-working').click();
    await expectText(calc.getByTestId('verdict-steps'), 'R = 16.3 kΩ − 0.4 Ω = 16.2996 kΩ', 'the working');
    await screenshot(page, 'verdict-trust-secondary-phone');
  });

  await step('another kΩ spec offers the remembered leads as a chip, in Ω', async () => {
    const next = await openCalculator(page, '650 Moorland', 'Secondary winding resistance with plug cap');
    await expectText(next.getByTestId('memory-chips'), 'Leads 0.4 Ω — from your last check', 'the memory chip');
    await next.getByLabel('Meter reading', { exact: true }).fill('22');
    await expectText(next.getByTestId('verdict-value'), '21.9996 kΩ', 'the corrected value');
    await next.getByTestId('memory-clear-lead').click();
    await expectText(next.getByTestId('verdict-value'), /^22 kΩ/, 'the value without leads');
  });

  await step('a rest voltage with only a minimum: 12.8 V is a pass, with no remembered leads', async () => {
    const volts = await openCalculator(page, '900 Trail', 'Rest voltage');
    await expectText(volts.getByTestId('mode-instruction'), 'Meter on DC volts', 'the mode instruction');
    await volts.getByLabel('Meter reading', { exact: true }).fill('12.8');
    await expectText(volts.getByTestId('verdict-word'), 'PASS', 'the verdict word');
    await expectText(volts.getByTestId('verdict-explanation'), 'above the minimum', 'the words');
    expect(await volts.getByTestId('memory-chips').count()).toBe(0);
    expect(await onScreen(page, 'verdict-summary')).toBe(true);
    await screenshot(page, 'verdict-trust-rest-voltage-phone');
  });
  await page.close();
});
