/**
 * Offline after one visit (issue 11), in Chromium with `context.setOffline(true)`: the
 * service worker serves the app, the query cache kept in IndexedDB serves what was seen,
 * the session survives without a signal, and readings queue and land exactly once.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';
import { expectHidden, expectText, expectVisible, step } from '../helpers/expect-visible';
import { AppDataSource } from '@/server/db/data-source';
import { bearerFor } from '../helpers/auth';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';
import type { JobDetailDto } from '@/lib/contracts/jobs';

useTestDatabase();
/** Offline pages render from the service worker and IndexedDB; on a busy machine that takes a while. */
const SLOW = 30_000;
const app = useWebApp();

type SpecRow = { id: number; componentId: number; modelId: number; min: number; max: number };
async function primarySpec(): Promise<SpecRow> {
  const [row] = await AppDataSource.query(
    `SELECT s.id, s.component_id AS componentId, c.model_id AS modelId, s.min_value AS min, s.max_value AS max
       FROM specs s JOIN components c ON c.id = s.component_id JOIN vehicle_models vm ON vm.id = c.model_id
       JOIN makes mk ON mk.id = vm.make_id
      WHERE mk.name = 'Kestrel Moto' AND vm.name = '900 Trail' AND vm.year_from = 2016
        AND c.name = 'ignition coil (rear)' AND s.parameter = 'primary winding resistance'`,
  );
  expect(row).toBeDefined();
  return row as SpecRow;
}

/** The app is installed: the service worker controls the page and the query cache has been written. */
async function installed(page: Page) {
  // Polled with evaluate: waitForFunction's string form needs eval, which the app's CSP refuses.
  for (let i = 0; !(await page.evaluate('!!navigator.serviceWorker && !!navigator.serviceWorker.controller')); i++) {
    if (i > 60) throw new Error('the service worker never took control of the page');
    await page.waitForTimeout(500);
  }
  await page.waitForTimeout(1500); // the persister writes at most once a second
}

async function api<T>(user: User, path: string, init: RequestInit = {}): Promise<T> {
  const res = await fetch(`${app.url}${path}`, {
    ...init,
    headers: { ...(await bearerFor(user)), 'Content-Type': 'application/json' },
  });
  expect(res.ok).toBe(true);
  return (await res.json()) as T;
}

async function firstReading(user: User, jobId: number): Promise<number> {
  return (await api<JobDetailDto>(user, `/api/jobs/${jobId}`)).readings[0].id;
}

it('after one visit the app works offline, keeps the session, queues a reading and sends it once', async () => {
  const spec = await primarySpec();
  const account = await e2eAccount('contributor', 'offline-tech');
  const user = (await AppDataSource.getRepository(User).findOneByOrFail({ emailKey: emailKey(account.email) }))!;
  // A job opened earlier (on another device): this device has never shown a job list.
  const job = await api<JobDetailDto>(user, '/api/jobs', {
    method: 'POST',
    body: JSON.stringify({ modelId: spec.modelId, machineId: 'ZKM900T-16-OFF001' }),
  });
  const context: BrowserContext = await app.browser.newContext({ viewport: PHONE });
  const page = await context.newPage();
  const name = page.getByTestId('header-account').filter({ hasText: account.displayName }).first();
  const calc = page.getByTestId('spec-screen').getByTestId('calculator');
  const reading = String((spec.min + spec.max) / 2);

  await step('one visit online: home, a search, the spec card, its model sheet, the calculator', async () => {
    await signInThroughApi(page, app.url, account.email);
    await page.getByTestId('search-input').fill('kestrel primary');
    await expectVisible(page.getByTestId('search-results'), 'the search results');
    await page.goto(`${app.url}/specs/${spec.id}`);
    await expectVisible(calc, 'the spec card’s calculator');
    await page.goto(`${app.url}/models/${spec.modelId}`);
    // Seen means its answer arrived (the screen alone shows while it loads).
    await expectVisible(
      page.getByTestId('model-screen').getByTestId(`component-${spec.componentId}`),
      'the model sheet',
    );
    await page.goto(`${app.url}/calculator`);
    await expectVisible(page.getByTestId('calculator-screen'), 'the calculator');
    await page.goto(`${app.url}/jobs/${job.id}`);
    await expectVisible(page.getByTestId('job-sheet').getByTestId('job-summary'), 'the job sheet');
    await installed(page);
  });

  await step('offline, reloaded: home, the spec card with a verdict, the model sheet, the calculator', async () => {
    await context.setOffline(true);
    await page.goto(app.url);
    await expectVisible(page.getByTestId('search-screen'), 'the search home offline', SLOW);
    await expectText(page.getByTestId('offline-line'), /^Offline — showing what was saved/);
    await expectVisible(name, 'the signed-in name offline');
    await screenshot(page, 'offline-home-phone');
    await page.goto(`${app.url}/models/${spec.modelId}`);
    await expectVisible(
      page.getByTestId('model-screen').getByTestId(`component-${spec.componentId}`),
      'the model sheet',
      SLOW,
    );
    await page.goto(`${app.url}/calculator`);
    await expectVisible(page.getByTestId('calculator-screen'), 'the calculator offline', SLOW);
    await page.goto(`${app.url}/specs/${spec.id}`);
    await expectVisible(calc, 'the spec card’s calculator offline', SLOW);
    await calc.getByLabel('Meter reading', { exact: true }).fill(reading);
    await expect(calc.getByTestId('verdict-word').innerText()).resolves.toBe('PASS');
    await screenshot(page, 'offline-spec-phone');
  });

  await step('Add to job offline: the kept job list, the reading queued, the notices say so', async () => {
    await calc.getByTestId('add-to-job-button').scrollIntoViewIfNeeded();
    await calc.getByTestId('add-to-job-button').click();
    await calc.getByTestId(`pick-job-${job.id}`).click();
    await expectText(calc.getByTestId('add-to-job-outcome'), 'Queued — will send when online');
    await expectText(page.getByTestId('header-queue'), /^1 reading waiting to be sent/);
    await screenshot(page, 'offline-queued-phone');
  });

  await step('back online: the session resumes, the reading lands once, "Queued" turns to sent', async () => {
    await context.setOffline(false);
    await expectText(calc.getByTestId('add-to-job-outcome'), `Sent — added to job #${job.id}`, undefined, 30_000);
    await expectHidden(page.getByTestId('header-queue'), 'the header’s queue notice');
    await expectVisible(name, 'the signed-in name online');
    const stored = await api<JobDetailDto>(user, `/api/jobs/${job.id}`);
    expect(stored.readings).toHaveLength(1);
    expect(stored.readings[0].verdict).toBe('pass');
    await screenshot(page, 'online-sent-phone');
  });

  await step('offline again: the job sheet from the device; Back never signs out', async () => {
    await page.goto(`${app.url}/jobs/${job.id}`);
    await expectVisible(
      page.getByTestId('job-sheet').getByTestId('job-reading-' + (await firstReading(user, job.id))),
      'the reading on the sheet',
      SLOW,
    );
    await context.setOffline(true);
    await page.reload();
    const sheet = page.getByTestId('job-sheet');
    await expectVisible(sheet.getByTestId('job-summary'), 'the job sheet offline', SLOW);
    await expectVisible(sheet.getByTestId('job-reading-' + (await firstReading(user, job.id))), 'the kept reading');
    await screenshot(page, 'offline-job-sheet-phone');
    await page.goBack();
    await expectVisible(page.getByTestId('spec-screen'), 'the spec card after Back');
    await expectVisible(name, 'the signed-in name after Back');
    await expect(page.getByText('Sign in to keep readings on a job').count()).resolves.toBe(0);
  });

  await step('online once more: still signed in, and the API answers for the session (My jobs)', async () => {
    await context.setOffline(false);
    await page.goto(`${app.url}/jobs`);
    await expectVisible(page.getByTestId('jobs-screen').getByText('ZKM900T-16-OFF001').first(), 'the job in My jobs');
    await expectVisible(name, 'the signed-in name');
  });
  await context.close();
});

it('a job started with no connection takes a reading, and both land once when the connection returns', async () => {
  const spec = await primarySpec();
  const account = await e2eAccount('contributor', 'offline-new-job');
  const user = (await AppDataSource.getRepository(User).findOneByOrFail({ emailKey: emailKey(account.email) }))!;
  const vin = `OFFNEW-${Date.now().toString(36).toUpperCase()}`;
  const context: BrowserContext = await app.browser.newContext({ viewport: PHONE });
  const page = await context.newPage();
  const name = page.getByTestId('header-account').filter({ hasText: account.displayName }).first();
  const calc = page.getByTestId('spec-screen').getByTestId('calculator');
  const jobsWithVin = async () =>
    (await api<JobDetailDto[]>(user, `/api/jobs?q=${encodeURIComponent(vin)}`)).filter((j) => j.machineId === vin);

  await step('one visit online: home (the library’s models), the spec card, My jobs', async () => {
    await signInThroughApi(page, app.url, account.email);
    await expectVisible(page.getByTestId('model-list'), 'the library’s models');
    await page.goto(`${app.url}/specs/${spec.id}`);
    await expectVisible(calc, 'the spec card’s calculator');
    await page.goto(`${app.url}/jobs`);
    await expectVisible(page.getByTestId('jobs-screen'), 'My jobs');
    await page.goto(`${app.url}/specs/${spec.id}`);
    await expectVisible(calc, 'the spec card’s calculator');
    await installed(page);
  });

  await step('offline: a new job from Add to job, with the reading on it, both queued', async () => {
    await context.setOffline(true);
    await page.reload();
    await expectVisible(calc, 'the spec card’s calculator offline', SLOW);
    await calc.getByLabel('Meter reading', { exact: true }).fill(String((spec.min + spec.max) / 2));
    await calc.getByTestId('add-to-job-button').scrollIntoViewIfNeeded();
    await calc.getByTestId('add-to-job-button').click();
    await calc.getByTestId('pick-new-job').click();
    const form = calc.getByTestId('add-to-job-new');
    await expectVisible(form, 'the new job form offline');
    await form.getByTestId('job-machine-id').fill(vin);
    await form.getByRole('button', { name: 'Create the job' }).click();
    await expectText(calc.getByTestId('add-to-job-outcome'), 'Queued — will send when online');
    await expectText(page.getByTestId('header-queue'), /^1 job and 1 reading waiting to be sent/);
    await screenshot(page, 'offline-new-job-queued-phone');
    await calc.getByTestId('add-to-job-open').click();
    const sheet = page.getByTestId('job-sheet');
    await expectText(sheet.getByTestId('queued-job-status'), /^Waiting to be sent/);
    await expectVisible(sheet.getByTestId('queue-waiting'), 'the reading waiting on the new sheet');
    await expectText(sheet.getByTestId('job-machine'), /Kestrel Moto 900 Trail/);
    expect(new URL(page.url()).pathname).toMatch(/^\/jobs\/-\d+$/);
    await screenshot(page, 'offline-new-job-sheet-phone');
    expect(await jobsWithVin()).toHaveLength(0);
  });

  await step(
    'back online: one job, one reading on it, the sheet moves to the job’s number, still signed in',
    async () => {
      await context.setOffline(false);
      await page.waitForURL(/\/jobs\/\d+$/, { timeout: 30_000 });
      const [stored, ...more] = await jobsWithVin();
      expect(more).toHaveLength(0);
      expect(new URL(page.url()).pathname).toBe(`/jobs/${stored.id}`);
      expect(stored.modelId).toBe(spec.modelId);
      await waitForReadings(user, stored.id, 1);
      const sheet = page.getByTestId('job-sheet');
      await expectVisible(sheet.getByTestId('job-summary'), 'the sent job’s sheet');
      await expectHidden(page.getByTestId('header-queue'), 'the header’s queue notice');
      await expectVisible(name, 'the signed-in name online');
      await screenshot(page, 'online-new-job-sent-phone');
      // A few more sync rounds send nothing twice.
      await page.waitForTimeout(11_000);
      expect(await jobsWithVin()).toHaveLength(1);
      expect((await api<JobDetailDto>(user, `/api/jobs/${stored.id}`)).readings).toHaveLength(1);
    },
  );
  await context.close();
});

async function waitForReadings(user: User, jobId: number, count: number) {
  for (let i = 0; ; i++) {
    const job = await api<JobDetailDto>(user, `/api/jobs/${jobId}`);
    if (job.readings.length >= count) return expect(job.readings).toHaveLength(count);
    if (i > 40) throw new Error(`job ${jobId} has ${job.readings.length} readings, expected ${count}`);
    await new Promise((r) => setTimeout(r, 500));
  }
}
