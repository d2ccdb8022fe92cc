/**
 * The demo no-spark plan run end to end at phone size: search "no spark" finds the plan
 * first, a technician starts it from the job sheet, answers each step (readings judged on
 * the server), the pickup coil reads far over its limit, the run ends at the pickup coil
 * finding, and the customer report shows the plan summary.
 */
import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { expectHidden, expectText, expectVisible, step } from '../helpers/expect-visible';
import { bearerFor } from '../helpers/auth';
import type { RunDto } from '@/lib/contracts/plans';
import { modelIdOf } from '../helpers/plans';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';
import { AppDataSource } from '@/server/db/data-source';
import { Job } from '@/server/modules/jobs/job.entity';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';

useTestDatabase();
const app = useWebApp();

async function jobFor(email: string): Promise<number> {
  const user = await AppDataSource.getRepository(User).findOneByOrFail({ emailKey: emailKey(email) });
  const job = await AppDataSource.getRepository(Job).save({
    ownerId: user.id,
    modelId: await modelIdOf('650 Moorland', 2014),
    machineLabel: '',
    machineId: 'KM650-14-000777',
    customerRef: 'WO-NOSPARK',
    notes: 'Cranks, no spark.',
  });
  return job.id;
}

/** Types the reading (and the corrections) and judges it; the answer names the step and its verdict. */
async function measure(page: Page, title: string, value: string, extra: Record<string, string> = {}, verdict = 'PASS') {
  const run = page.getByTestId('plan-run');
  await expectText(run.getByTestId('run-step'), new RegExp(title), `the step "${title}"`);
  const check = run.getByTestId('step-check');
  await check.getByLabel('Meter reading', { exact: true }).fill(value);
  for (const [label, v] of Object.entries(extra)) await check.getByLabel(label, { exact: true }).fill(v);
  await check.getByTestId('step-submit').click();
  await expectText(
    run.getByTestId('last-result'),
    new RegExp(`${title}[\\s\\S]*${verdict}`),
    `the verdict of "${title}"`,
  );
}

it('runs the demo no-spark plan on a job at 390×844 to the pickup coil finding, and the report shows it', async () => {
  const { email } = await e2eAccount('contributor', 'plan-runner');
  const jobId = await jobFor(email);
  const context = await app.browser.newContext({ viewport: PHONE });
  const page = await context.newPage();
  const run = page.getByTestId('plan-run');
  await signInThroughApi(page, app.url, email);

  await step('search "no spark": the test plan comes first', async () => {
    await page.goto(app.url);
    await page.getByTestId('search-input').fill('no spark');
    const hits = page.getByTestId('search-plans');
    await expectVisible(hits, 'the test plans above the spec results');
    await expectText(hits.locator('[data-testid^="plan-item-"]').first(), /No spark on one or all cylinders/);
    await screenshot(page, 'plans-search-phone');
  });

  await step('from the job sheet: Diagnose → symptom → start the no-spark plan', async () => {
    await page.goto(`${app.url}/jobs/${jobId}`);
    await page.getByTestId('job-diagnose').click();
    const picker = page.getByTestId('job-plans');
    await picker.getByLabel('Symptom', { exact: true }).fill('no spark');
    await picker.getByRole('button', { name: 'Start: No spark on one or all cylinders' }).click();
    await expectText(run.getByTestId('run-step'), /Step 1 of 11[\s\S]*Battery rest voltage/, 'the first step');
    await expectVisible(run.getByTestId('caution-battery'), 'the battery caution on the first step');
    await screenshot(page, 'plan-run-step1-phone');
  });

  await step(
    'battery, fuses, supply at the coil (connector face), primary and secondary windings: all pass',
    async () => {
      await measure(page, 'Battery rest voltage', '13.1');
      await expectText(run.getByTestId('run-step'), /Main and ignition fuses/);
      await run.getByTestId('outcome-pass').click();
      await expectText(run.getByTestId('run-step'), /Supply voltage at the coil/);
      await expectVisible(run.getByTestId('connector-face'), 'the ignition coil connector face');
      await expectText(run.getByTestId('probe-pin-1'), /Pin 1: Supply \(\+\) \(black\/yellow wire\)/);
      await screenshot(page, 'plan-run-connector-phone');
      await measure(page, 'Supply voltage at the coil', '12.4');
      await measure(page, 'Coil primary winding', '2.4', { 'Test leads, probes shorted': '0.2' });
      await measure(page, 'Coil secondary winding through the resistor cap', '22.5', {
        'Series resistor (cap or suppressor)': '5',
      });
    },
  );

  await step('pickup coil far over its limit: FAIL, and the run ends at the pickup coil finding', async () => {
    await measure(page, 'Pickup coil resistance', '1450', {}, 'FAIL');
    await expectText(run.getByTestId('run-finding'), /Pickup coil[\s\S]*Replace the pickup coil/, 'the finding');
    await expectText(run.getByTestId('run-history'), /6\. Pickup coil resistance/);
    await screenshot(page, 'plan-run-finding-phone');
    await page.setViewportSize(DESKTOP);
    await screenshot(page, 'plan-run-finding-desktop');
    await page.setViewportSize(PHONE);
  });

  await step('the customer report shows the plan summary: symptom, steps with verdicts, finding', async () => {
    await run.getByTestId('run-report').click();
    const report = page.getByTestId('job-report');
    await expectText(report, /Diagnosis: No spark on one or all cylinders[\s\S]*Symptom: No spark/, 'the plan summary');
    await expectText(report.getByTestId('report-finding'), /Finding: Pickup coil\. Replace the pickup coil/);
    await screenshot(page, 'plan-report-phone');
  });

  await context.close();
});

it('with no signal the run goes on: steps judged on the device, sent once each when the connection returns', async () => {
  const { email } = await e2eAccount('contributor', 'plan-offline');
  const jobId = await jobFor(email);
  const user = await AppDataSource.getRepository(User).findOneByOrFail({ emailKey: emailKey(email) });
  const auth = { ...(await bearerFor(user)), 'Content-Type': 'application/json' };
  const [{ id: planId }] = await AppDataSource.query(
    `SELECT id FROM plans WHERE title = 'No spark on one or all cylinders' AND status = 'published' LIMIT 1`,
  );
  const started = await fetch(`${app.url}/api/jobs/${jobId}/runs`, {
    method: 'POST',
    headers: auth,
    body: JSON.stringify({ planId }),
  });
  expect(started.status).toBe(201);
  const runId = ((await started.json()) as RunDto).id;
  const serverRun = async () =>
    (await (await fetch(`${app.url}/api/jobs/${jobId}/runs/${runId}`, { headers: auth })).json()) as RunDto;
  const context = await app.browser.newContext({ viewport: PHONE });
  const page = await context.newPage();
  const run = page.getByTestId('plan-run');

  await step('online: the run opened once (the app and the run are kept on the device)', async () => {
    await signInThroughApi(page, app.url, email);
    await page.goto(`${app.url}/jobs/${jobId}/runs/${runId}`);
    await expectText(run.getByTestId('run-step'), /Battery rest voltage/, 'the first step');
    for (let i = 0; !(await page.evaluate('!!navigator.serviceWorker && !!navigator.serviceWorker.controller')); i++) {
      if (i > 60) throw new Error('the service worker never took control of the page');
      await page.waitForTimeout(500);
    }
    await page.waitForTimeout(1500); // the persister writes at most once a second
  });

  await step('offline, reloaded: two steps answered and judged on the device, the run at step 3', async () => {
    await context.setOffline(true);
    await page.reload();
    await expectText(run.getByTestId('run-step'), /Battery rest voltage/, 'the first step offline', 30_000);
    await measure(page, 'Battery rest voltage', '13.1');
    await expectText(run.getByTestId('run-step'), /Main and ignition fuses/);
    await run.getByTestId('outcome-pass').click();
    await expectText(run.getByTestId('run-step'), /Step 3 of 11[\s\S]*Supply voltage at the coil/);
    await expectText(run.getByTestId('run-waiting'), /^2 step results judged on this device, waiting to be sent/);
    await expectText(page.getByTestId('header-queue'), /2 readings waiting to be sent/);
    await screenshot(page, 'plan-run-offline-phone');
    expect((await serverRun()).results).toHaveLength(0);
  });

  await step('back online: both results land once, in order; the server run is at step 3', async () => {
    await context.setOffline(false);
    // The sync sends on "online" and every 10 s; the session resumes first.
    let r = await serverRun();
    for (let i = 0; r.results.length < 2 && i < 60; i++) {
      await page.waitForTimeout(500);
      r = await serverRun();
    }
    expect(r.results.map((x) => [x.stepId, x.outcome])).toEqual([
      ['battery', 'pass'],
      ['fuses', 'pass'],
    ]);
    expect(r.currentStep?.id).toBe('coil-supply');
    const readings = await AppDataSource.query('SELECT COUNT(*) AS n FROM readings WHERE job_id = ?', [jobId]);
    expect(Number(readings[0].n)).toBe(2);
    await expectHidden(run.getByTestId('run-waiting'), 'the waiting notice', 30_000);
    await expectText(run.getByTestId('run-step'), /Step 3 of 11[\s\S]*Supply voltage at the coil/);
    await page.waitForTimeout(11_000); // another sync round sends nothing twice
    expect((await serverRun()).results).toHaveLength(2);
    await screenshot(page, 'plan-run-back-online-phone');
  });
  await context.close();
});
