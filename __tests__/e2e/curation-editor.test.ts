import { PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';
import { signedInEditor, until } from '../helpers/curation-e2e';
import { uniqueMake } from '../fixtures/csv/rows';

useTestDatabase();
const app = useWebApp();

it('an editor creates a spec from the home screen; the form shows the schema’s messages first, then the card opens', async () => {
  const make = uniqueMake('E2E New');
  const page = await signedInEditor(app.browser, app.url, 'create-lead', PHONE);
  await page.getByTestId('home-new-spec').click();
  const form = page.getByTestId('spec-create-form');
  await form.getByLabel('Make', { exact: true }).fill(make);
  await form.getByLabel('Minimum', { exact: true }).fill('0,8');
  await form.getByLabel('Maximum', { exact: true }).fill('0.5');
  await form.getByTestId('spec-create-submit').click();
  await form.getByText('model is required').waitFor();
  await form.getByText('source title is required').waitFor();
  await screenshot(page, 'curation-new-spec-errors-phone');

  await form.getByLabel('Model', { exact: true }).fill('Quillon 640');
  await form.getByLabel('Year from', { exact: true }).fill('2015');
  await form.getByLabel('Component (e.g. ignition coil (rear))').fill('stator');
  await form.getByLabel('Parameter (e.g. primary winding resistance)').fill('stator winding resistance');
  await form.getByLabel('Source title', { exact: true }).fill('Invented Workshop Manual');
  await form.getByLabel('Page', { exact: true }).fill('4-2');
  await form.getByTestId('spec-create-submit').click();
  await form.getByText('min 0.8 is greater than max 0.5').waitFor();

  await form.getByLabel('Maximum', { exact: true }).fill('1.1');
  await form.getByTestId('spec-create-submit').click();
  const card = page.getByTestId('spec-screen');
  await until(card.getByTestId('spec-display'), '0.8–1.1 Ω');
  await until(card.getByTestId('revision-1'), /Version 1 \(current\) · Created[\s\S]*Created in the spec editor/);
  await screenshot(page, 'curation-new-spec-card-phone');
});

it('the editor screens show a sign-in prompt when signed out and "Editors only" to other roles', async () => {
  const page = await (await app.browser.newContext({ viewport: PHONE })).newPage();
  await page.goto(`${app.url}/editor/import`);
  await page.getByTestId('import-screen').getByTestId('sign-in-prompt').waitFor();
  const tech = await e2eAccount('contributor', 'curious-tech');
  await signInThroughApi(page, app.url, tech.email);
  expect(await page.getByTestId('home-import').count()).toBe(0);
  await page.goto(`${app.url}/editor/specs/new`);
  await page
    .getByTestId('new-spec-screen')
    .getByText(/^Editors only/)
    .waitFor();
  expect(await page.getByTestId('spec-create-form').count()).toBe(0);
});
