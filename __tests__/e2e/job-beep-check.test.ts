/**
 * A diode checked on a meter that only beeps goes on the job sheet like any other reading:
 * the spec card offers the two-way test beside the forward-voltage calculator, at phone size.
 * Trade fact (common practice, no published source): a sound diode conducts one way only.
 */
import { PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { expectText, expectVisible, step } from '../helpers/expect-visible';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';
import { AppDataSource } from '@/server/db/data-source';

useTestDatabase();
const app = useWebApp();

it('a beep-only diode check on a diode spec is added to the job and shown on its sheet in words', async () => {
  const tech = await e2eAccount('contributor', 'ira.probe');
  const [diode] = await AppDataSource.query(
    "SELECT id, parameter FROM specs WHERE mode = 'diode_forward' AND status = 'published' ORDER BY id LIMIT 1",
  );
  expect(diode).toBeDefined();
  const context = await app.browser.newContext({ viewport: PHONE });
  const page = await context.newPage();
  await signInThroughApi(page, app.url, tech.email);
  let jobId = 0;

  await step('open a job for a machine that is not in the library', async () => {
    await page.getByTestId('home-my-jobs').click();
    await page.getByTestId('jobs-screen').getByTestId('new-job').click();
    const form = page.getByTestId('new-job-form');
    await expectVisible(form, 'the new-job form');
    await form.getByRole('radio', { name: 'Not in the library' }).click();
    await form.getByLabel('Machine description', { exact: true }).fill('Customer trail bike, charging fault');
    await form.getByTestId('create-job').click();
    await expectVisible(page.getByTestId('job-sheet').getByTestId('job-summary'), 'the new job’s summary');
    jobId = Number(new URL(page.url()).pathname.split('/').pop());
    expect(jobId).toBeGreaterThan(0);
  });

  await step('on the diode spec card, test both ways, see PASS, add it to the job', async () => {
    await page.goto(`${app.url}/specs/${diode.id}?job=${jobId}`);
    const check = page.getByTestId('spec-screen').getByTestId('qualitative-check');
    await expectVisible(check, 'the beep-only diode test on the spec card');
    await check
      .getByRole('radiogroup', { name: 'Red probe on anode, black on cathode' })
      .getByRole('radio', { name: 'Conducts' })
      .click();
    await check.getByRole('radiogroup', { name: 'Probes swapped' }).getByRole('radio', { name: 'Open' }).click();
    await expectText(check.getByTestId('qualitative-result'), /PASS/);
    const button = check.getByTestId('add-to-job-button');
    await button.scrollIntoViewIfNeeded();
    await expect(button.innerText()).resolves.toBe(`Add to job #${jobId}`);
    await button.click();
    await expectText(check.getByTestId('add-to-job-outcome'), `Added to job #${jobId}`);
    await check.scrollIntoViewIfNeeded();
    await screenshot(page, 'job-beep-check-phone');
  });

  await step('the job sheet lists it under its component, in words, counted as a pass', async () => {
    await page.goto(`${app.url}/jobs/${jobId}`);
    const sheet = page.getByTestId('job-sheet');
    const card = sheet.locator('[data-testid^="job-reading-"]').first();
    await expectText(card, 'Forward conducts, reverse open');
    await expectText(card, diode.parameter);
    await expectText(page.getByTestId('verdict-counts'), /1 pass/);
    await screenshot(page, 'job-beep-check-sheet-phone');
  });
  await context.close();
});
