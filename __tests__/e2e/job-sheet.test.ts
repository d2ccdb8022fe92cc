import fs from 'node:fs';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { DESKTOP, PHONE, SCREENSHOTS, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { expectCount, expectHidden, expectText, expectVisible, step } from '../helpers/expect-visible';
import { AppDataSource } from '@/server/db/data-source';
import { bearerFor } from '../helpers/auth';
import { hashPassword } from '@/server/modules/accounts/passwords';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';
import type { JobDetailDto } from '@/lib/contracts/jobs';

useTestDatabase();
const app = useWebApp();

const EMAIL = 'tech.jobsheet@test.specbench.example';
const PASSWORD = 'coil-and-stator-on-the-bench';

async function technician(): Promise<User> {
  const repo = AppDataSource.getRepository(User);
  const found = await repo.findOneBy({ emailKey: emailKey(EMAIL) });
  if (found) return found;
  return repo.save({
    email: EMAIL,
    emailKey: emailKey(EMAIL),
    displayName: 'Dana Wrench',
    passwordHash: await hashPassword(PASSWORD),
    role: 'contributor',
    emailVerifiedAt: new Date(),
  });
}

type SpecRow = { id: number; componentId: number; modelId: number; parameter: string; min: number; max: number };
/** A spec of the demo Kestrel 900 Trail (2016–2021), chosen by component and parameter. */
async function kestrelSpec(component: string, parameter: string): Promise<SpecRow> {
  const [row] = await AppDataSource.query(
    `SELECT s.id, s.component_id AS componentId, c.model_id AS modelId, s.parameter, s.min_value AS min, s.max_value AS max
       FROM specs s JOIN components c ON c.id = s.component_id JOIN vehicle_models vm ON vm.id = c.model_id JOIN makes mk ON mk.id = vm.make_id
      WHERE mk.name = 'Kestrel Moto' AND vm.name = '900 Trail' AND vm.year_from = 2016 AND c.name = ? AND s.parameter = ?`,
    [component, parameter],
  );
  expect(row).toBeDefined();
  return row as SpecRow;
}

async function signIn(page: Page) {
  await page.goto(`${app.url}/sign-in`);
  const form = page.getByTestId('sign-in-form');
  await form.getByLabel('E-mail address', { exact: true }).fill(EMAIL);
  await form.getByLabel('Password', { exact: true }).fill(PASSWORD);
  await form.getByTestId('sign-in-submit').click();
  await expectVisible(page.getByTestId('search-screen'), 'the search screen after signing in');
  await expect(page.getByTestId('header-account').first().innerText()).resolves.toBe('Dana Wrench');
}

/** Scrolls a button into view and clicks it, as a thumb would. */
async function activate(button: Locator) {
  await button.scrollIntoViewIfNeeded();
  await button.click();
}

/** Screens scroll inside views: back to the top of each before a picture. */
async function toTop(page: Page) {
  await page.evaluate('document.querySelectorAll("*").forEach((el) => { if (el.scrollTop) el.scrollTop = 0; })');
}

/** Types a reading into the spec card's calculator and adds it to the job through the "Add to job" panel. */
async function takeReading(page: Page, value: number, verdictWord: string) {
  const calc = page.getByTestId('spec-screen').getByTestId('calculator');
  await calc.getByLabel('Meter reading', { exact: true }).fill(String(value));
  await expect(calc.getByTestId('verdict-word').innerText()).resolves.toBe(verdictWord);
  await activate(calc.getByTestId('add-to-job-button'));
  return calc.getByTestId('add-to-job-outcome');
}

it('a technician keeps readings on a job sheet, offline too, and prints the report', async () => {
  const user = await technician();
  const primary = await kestrelSpec('ignition coil (rear)', 'primary winding resistance');
  const pickup = await kestrelSpec('pickup coil', 'pickup coil resistance');
  const stator = await kestrelSpec('stator', 'stator winding resistance');
  const context: BrowserContext = await app.browser.newContext({ viewport: PHONE, acceptDownloads: true });
  const page = await context.newPage();
  const sheet = page.getByTestId('job-sheet');
  const readings = sheet.locator('[data-testid^="job-reading-"]');
  let jobId = 0;
  let failedId = 0;
  await signIn(page);

  await step('open a job: My jobs → New job → the model from the library, VIN, customer, notes', async () => {
    await page.getByTestId('home-my-jobs').click();
    await page.getByTestId('jobs-screen').getByTestId('new-job').click();
    const form = page.getByTestId('new-job-form');
    await form.getByLabel('Find the model', { exact: true }).fill('kestrel 900');
    await form.getByRole('radio', { name: /^Model: Kestrel Moto 900 Trail \(2016–2021/ }).click();
    await form.getByLabel('VIN or frame number', { exact: true }).fill('ZKM900T-16-004211');
    await form.getByLabel('Customer reference', { exact: true }).fill('WO-2231');
    await form.getByLabel('Notes', { exact: true }).fill('Misfires when hot; customer reports hard starting.');
    await screenshot(page, 'job-new-phone');
    await form.getByTestId('create-job').click();
    await expectVisible(sheet.getByTestId('job-summary'), 'the new job’s summary');
    jobId = Number(new URL(page.url()).pathname.split('/').pop());
    expect(jobId).toBeGreaterThan(0);
    await expectText(page.getByTestId('verdict-counts'), /No readings yet/);
  });

  await step('1. pass, mid-band: from the model sheet to the spec card, picking the job from the list', async () => {
    await page.getByTestId('job-open-model').click();
    await page
      .getByTestId(`component-${primary.componentId}`)
      .getByRole('link', { name: /^primary winding resistance:/i })
      .click();
    const calc = page.getByTestId('spec-screen').getByTestId('calculator');
    await expectVisible(calc, 'the spec card’s calculator');
    await calc.getByLabel('Meter reading', { exact: true }).fill(String((primary.min + primary.max) / 2));
    await expect(calc.getByTestId('verdict-word').innerText()).resolves.toBe('PASS');
    await activate(calc.getByTestId('add-to-job-button'));
    await activate(calc.getByTestId(`pick-job-${jobId}`));
    await expect(calc.getByTestId('add-to-job-outcome').innerText()).resolves.toBe(`Added to job #${jobId}`);
    await calc.getByTestId('add-to-job').screenshot({ path: `${SCREENSHOTS}/job-add-to-job-phone.png` });
  });

  await step(
    '2. marginal, exactly on the upper limit; 3. fail, four times the maximum (?job= preselects)',
    async () => {
      for (const [spec, value, word] of [
        [pickup, pickup.max, 'MARGINAL'],
        [stator, stator.max * 4, 'FAIL'],
      ] as const) {
        await page.goto(`${app.url}/specs/${spec.id}?job=${jobId}`);
        await expectVisible(page.getByTestId('spec-screen').getByTestId('calculator'), 'the spec card’s calculator');
        const outcome = await takeReading(page, value, word);
        await expect(outcome.innerText()).resolves.toBe(`Added to job #${jobId}`);
      }
      await page.goto(`${app.url}/jobs/${jobId}`);
      await expectText(sheet.getByTestId('verdict-counts'), /1 pass · 1 marginal · 1 fail/);
      await expectCount(readings, 3, 'readings on the sheet');
    },
  );

  await step('4. offline: re-take the failed stator reading; it waits on the device, marked as waiting', async () => {
    const [failed] = await AppDataSource.query("SELECT id FROM readings WHERE job_id = ? AND verdict = 'fail'", [
      jobId,
    ]);
    failedId = failed.id;
    await sheet.getByTestId(`job-reading-${failedId}`).getByTestId('reading-retake').click();
    await expectVisible(page.getByTestId('spec-screen').getByTestId('calculator'), 'the spec card’s calculator');
    const calc = page.getByTestId('spec-screen').getByTestId('calculator');
    await calc.getByLabel('Meter reading', { exact: true }).fill(String((stator.min + stator.max) / 2));
    await expectText(calc.getByTestId('add-to-job-retake'), `on job #${jobId}`, 'the re-take line');
    await context.setOffline(true);
    const queued = await takeReading(page, (stator.min + stator.max) / 2, 'PASS');
    await expect(queued.innerText()).resolves.toBe('Queued — will send when online');
    await activate(page.getByTestId('spec-screen').getByTestId('add-to-job-open'));
    await expectText(
      sheet.getByTestId('queue-waiting'),
      /1 reading waiting to be sent — it will go when the connection returns/,
    );
    await expectText(sheet.getByTestId('pending-reading'), /Waiting to be sent/);
    await expectCount(readings, 3, 'readings on the sheet');
    await toTop(page);
    await screenshot(page, 'job-sheet-offline-phone');
  });

  await step(
    'back online: the queue flushes by itself; four readings, each once, the fail struck through',
    async () => {
      await context.setOffline(false);
      await expectHidden(sheet.getByTestId('pending-reading'), 'the waiting reading', 30_000);
      await expectCount(readings, 4, 'readings on the sheet');
      await expect(sheet.getByTestId('queue-waiting').count()).resolves.toBe(0);
      await expectText(sheet.getByTestId('verdict-counts'), /2 pass · 1 marginal · 0 fail/);
      await expect(
        sheet.getByTestId(`job-reading-${failedId}`).getByTestId('reading-retaken').innerText(),
      ).resolves.toBe('re-taken');
      const res = await fetch(`${app.url}/api/jobs/${jobId}`, {
        headers: await bearerFor(user),
      });
      const job = (await res.json()) as JobDetailDto;
      expect(job.readings.map((r) => r.verdict)).toEqual(['pass', 'marginal', 'fail', 'pass']);
      expect(new Set(job.readings.map((r) => r.idempotencyKey)).size).toBe(4);
      expect(job.readings[2].supersededBy).toBe(job.readings[3].id);
      await toTop(page);
      await screenshot(page, 'job-sheet-phone');
    },
  );

  await step('the CSV comes down with the session’s token', async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), sheet.getByTestId('job-csv').click()]);
    expect(download.suggestedFilename()).toBe(`job-${jobId}-readings.csv`);
    const csv = fs
      .readFileSync((await download.path())!, 'utf8')
      .trim()
      .split(/\r\n/);
    expect(csv).toHaveLength(5);
  });

  await step(
    'the printable report: header, notes, counts, readings with source and working, the liability note',
    async () => {
      await sheet.getByTestId('job-report-link').click();
      const report = page.getByTestId('job-report');
      await expectVisible(report.getByTestId('report-header'), 'the report header');
      const text = await report.innerText();
      expect(text).toMatch(/Specbench job report/);
      expect(text).toMatch(/ZKM900T-16-004211/);
      expect(text).toMatch(/WO-2231/);
      expect(text).toMatch(/Misfires when hot/);
      expect(text).toMatch(/Kestrel Moto Service Manual 900 series/);
      expect(text).toMatch(/do not replace the maker’s service procedures and\s+service manual, nor local codes/);
      await expectCount(report.locator('[data-testid^="report-reading-"]'), 3, 'readings on the report');
      await expectText(report.getByTestId('report-superseded'), /re-taken \(replaced by reading #\d+\)/);
      await page.evaluate('window.print = () => { window.__printed = true; }');
      await report.getByTestId('report-print').click();
      await expect(page.evaluate('window.__printed')).resolves.toBe(true);
      await screenshot(page, 'job-report-phone');
      await page.emulateMedia({ media: 'print' });
      await expect(report.getByTestId('report-print').isVisible()).resolves.toBe(false);
      await screenshot(page, 'job-report-print');
      await expect(page.getByRole('heading', { name: `Report — job #${jobId}` }).isVisible()).resolves.toBe(false);
      // Printed, the report runs over pages instead of stopping at the window's height.
      const pdf = await page.pdf({ format: 'A4' });
      expect((pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length).toBeGreaterThan(1);
      await page.emulateMedia({ media: 'screen' });
    },
  );

  await step('My jobs lists it with its counts; wide screens show the sheet in two columns', async () => {
    await page.goto(`${app.url}/jobs`);
    await expectText(page.getByTestId('job-list').getByTestId(`job-${jobId}`), /2 pass · 1 marginal · 0 fail/);
    await screenshot(page, 'job-list-phone');
    await page.setViewportSize(DESKTOP);
    await page.goto(`${app.url}/jobs/${jobId}`);
    await expectVisible(sheet.getByTestId('job-summary'), 'the job summary');
    await expectCount(readings, 4, 'readings on the sheet');
    await expectVisible(sheet.getByTestId('job-notes'), 'the notes beside the readings');
    await screenshot(page, 'job-sheet-desktop');
  });

  await step(
    'limits typed by hand: the standalone calculator adds a labelled reading under "Other checks"',
    async () => {
      await page.setViewportSize(PHONE);
      await page.goto(`${app.url}/calculator?job=${jobId}`);
      const standalone = page.getByTestId('calculator-screen');
      await standalone.getByRole('radio', { name: 'What are you checking?: Gap' }).click();
      await standalone.getByLabel('Minimum', { exact: true }).fill('0.7');
      await standalone.getByLabel('Maximum', { exact: true }).fill('0.8');
      await standalone.getByRole('radio', { name: 'Spec unit: mm' }).click();
      const hand = standalone.getByTestId('standalone-calculator');
      await hand.getByLabel('Meter reading', { exact: true }).fill('0.75');
      await expect(hand.getByTestId('verdict-word').innerText()).resolves.toBe('PASS');
      await hand.getByTestId('add-to-job-button').click();
      await expectText(
        hand.getByTestId('add-to-job-label').locator('..'),
        /Say what you measured/,
        'the label’s message',
      );
      await hand.getByLabel('What did you measure?', { exact: true }).fill('Plug gap, rear cylinder (new plug)');
      await hand.getByTestId('add-to-job-button').click();
      await expect(hand.getByTestId('add-to-job-outcome').innerText()).resolves.toBe(`Added to job #${jobId}`);
      await hand.getByTestId('add-to-job-open').click();
      await expectText(
        sheet.locator('[data-testid="reading-group"]').last(),
        /^Other checks[\s\S]*Plug gap, rear cylinder \(new plug\)/,
        'the last reading group',
      );
    },
  );
  await context.close();
});

it('signed out, the calculator still judges and offers to sign in; My jobs asks to sign in', async () => {
  const page = await app.browser.newPage({ viewport: PHONE });
  const stator = await kestrelSpec('stator', 'stator winding resistance');
  await page.goto(`${app.url}/specs/${stator.id}`);
  const calc = page.getByTestId('spec-screen').getByTestId('calculator');
  await calc.getByLabel('Meter reading', { exact: true }).fill(String(stator.max * 4));
  await expect(calc.getByTestId('verdict-word').innerText()).resolves.toBe('FAIL');
  await expect(calc.getByTestId('add-to-job-sign-in').innerText()).resolves.toBe('Sign in to keep readings on a job');
  await page.goto(`${app.url}/jobs`);
  await expectVisible(page.getByTestId('jobs-sign-in'), 'the sign-in prompt on My jobs');
  await page.close();
});
