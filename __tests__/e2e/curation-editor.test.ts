import { PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';
import { signedInEditor } from '../helpers/curation-e2e';
import { expectText, expectVisible, step } from '../helpers/expect-visible';
import { uniqueMake } from '../fixtures/csv/rows';

useTestDatabase();
const app = useWebApp();

it('an editor creates a spec from the home screen; the form shows the schema’s messages first, then the card opens', async () => {
  const make = uniqueMake('E2E New');
  const page = await signedInEditor(app.browser, app.url, 'create-lead', PHONE);
  const form = page.getByTestId('spec-create-form');

  await step('submitting half a form shows the schema’s messages under the fields', async () => {
    await page.getByTestId('home-new-spec').click();
    await expectVisible(form, 'the new-spec form');
    await form.getByLabel('Make', { exact: true }).fill(make);
    await form.getByLabel('Minimum', { exact: true }).fill('0,8');
    await form.getByLabel('Maximum', { exact: true }).fill('0.5');
    await form.getByTestId('spec-create-submit').click();
    await expectVisible(form.getByText('model is required'), 'the message “model is required”');
    await expectVisible(form.getByText('source title is required'), 'the message “source title is required”');
    expect(await form.getByLabel('Model', { exact: true }).getAttribute('aria-invalid')).toBe('true');
    expect(await form.getByLabel('Make', { exact: true }).getAttribute('aria-invalid')).not.toBe('true');
    expect(new URL(page.url()).pathname).toBe('/editor/specs/new');
    await screenshot(page, 'curation-new-spec-errors-phone');
  });

  await step('limits the wrong way round are refused with the rule', async () => {
    await form.getByLabel('Model', { exact: true }).fill('Quillon 640');
    await form.getByLabel('Year from', { exact: true }).fill('2015');
    await form.getByLabel('Component (e.g. ignition coil (rear))').fill('stator');
    await form.getByLabel('Parameter (e.g. primary winding resistance)').fill('stator winding resistance');
    await form.getByLabel('Source title', { exact: true }).fill('Invented Workshop Manual');
    await form.getByLabel('Page', { exact: true }).fill('4-2');
    await form.getByTestId('spec-create-submit').click();
    await expectVisible(form.getByText('min 0.8 is greater than max 0.5'), 'the message about min above max');
    expect(await form.getByText('model is required').count()).toBe(0);
  });

  await step('a valid spec opens its card at version 1', async () => {
    await form.getByLabel('Maximum', { exact: true }).fill('1.1');
    await form.getByTestId('spec-create-submit').click();
    const card = page.getByTestId('spec-screen');
    await expectText(card.getByTestId('spec-display'), '0.8–1.1 Ω', 'the new spec’s values');
    await expectText(
      card.getByTestId('revision-1'),
      /Version 1 \(current\) · Created[\s\S]*Created in the spec editor/,
      'the first revision',
    );
    expect(new URL(page.url()).pathname).toMatch(/^\/specs\/\d+$/);
    await screenshot(page, 'curation-new-spec-card-phone');
  });
});

it('the editor screens show a sign-in prompt when signed out and "Editors only" to other roles', async () => {
  const page = await (await app.browser.newContext({ viewport: PHONE })).newPage();
  await page.goto(`${app.url}/editor/import`);
  await expectVisible(page.getByTestId('import-screen').getByTestId('sign-in-prompt'), 'the sign-in prompt');
  expect(await page.getByTestId('import-screen').getByTestId('upload-panel').count()).toBe(0);
  const tech = await e2eAccount('contributor', 'curious-tech');
  await signInThroughApi(page, app.url, tech.email);
  expect(await page.getByTestId('home-import').count()).toBe(0);
  await page.goto(`${app.url}/editor/specs/new`);
  await expectVisible(page.getByTestId('new-spec-screen').getByText(/^Editors only/), '“Editors only”');
  expect(await page.getByTestId('spec-create-form').count()).toBe(0);
});
