import fs from 'node:fs';
import type { Page } from 'playwright-core';
import { AppDataSource } from '@/server/db/data-source';
import { DESKTOP, PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { csvRowOf, demoSpec, signedInEditor, until } from '../helpers/curation-e2e';
import { toCsv, uniqueMake, validRow } from '../fixtures/csv/rows';

useTestDatabase();
const app = useWebApp();

const text = (page: Page, testId: string) => page.getByTestId(testId).innerText();
const editorPage = (name: string, viewport = DESKTOP) => signedInEditor(app.browser, app.url, name, viewport);

it('an editor uploads a CSV, reads the dry run (updated, created, rejected with line numbers), commits once and sees the change on the spec card', async () => {
  const spec = await demoSpec(0);
  const newMax = Number((spec.max * 1.1).toFixed(2));
  const make = uniqueMake('E2E Import');
  const file = toCsv([
    { ...(await csvRowOf(spec.id)), max: String(newMax) },
    validRow(make),
    validRow(make, {
      component: 'pickup coil',
      parameter: 'pickup coil resistance',
      min: '500',
      nominal: '',
      max: '300',
    }),
    validRow(make, { component: 'stator', parameter: 'stator winding resistance', unit: 'furlong' }),
  ]);

  const page = await editorPage('import-lead');
  await page.getByTestId('home-import').click();
  const screen = page.getByTestId('import-screen');
  await screen.getByTestId('upload-panel').waitFor();
  const chooser = page.waitForEvent('filechooser');
  await screen.getByTestId('pick-csv').click();
  await (await chooser).setFiles({ name: 'e2e-coils.csv', mimeType: 'text/csv', buffer: Buffer.from(file, 'utf8') });

  await screen.getByTestId('import-preview').waitFor();
  await until(page.getByTestId('count-created'), /^1\s*Created/);
  await until(page.getByTestId('count-updated'), /^1\s*Updated/);
  await until(page.getByTestId('count-rejected'), /^2\s*Rejected/);
  const updated = await text(page, 'import-updated');
  expect(updated).toMatch(/Line 2/);
  expect(updated).toMatch(new RegExp(`Maximum\\s*${spec.max} → ${newMax}`));
  await until(page.getByTestId('import-created'), new RegExp(`Line 3[\\s\\S]*${make}`));
  const rejected = await text(page, 'import-rejected');
  expect(rejected).toMatch(/Line 4\s*Column min\s*.*greater than/);
  expect(rejected).toMatch(/Line 5\s*Column unit\s*.*furlong/);
  const batchId = Number(new URL(page.url()).searchParams.get('batch'));
  expect(batchId).toBeGreaterThan(0);
  await screenshot(page, 'curation-import-preview-desktop');

  await screen.getByTestId('commit-button').click();
  await screen.getByTestId('commit-done').waitFor();
  await until(
    page.getByTestId('commit-done'),
    new RegExp(`1 spec created and 1 spec updated[\\s\\S]*batch #${batchId}`),
  );
  expect(await screen.getByTestId('commit-button').count()).toBe(0);
  await screenshot(page, 'curation-import-committed-desktop');

  await screen.getByTestId(`committed-spec-${spec.id}`).click();
  const card = page.getByTestId('spec-screen');
  await until(card.getByTestId('spec-display'), String(newMax));
  const history = card.getByTestId('revision-list');
  await until(history, new RegExp(`Imported \\(batch #${batchId}\\)[\\s\\S]*Maximum\\s*${spec.max} → ${newMax}`));
  await screenshot(page, 'curation-spec-card-desktop');

  // A batch commits once: the API refuses a second commit, whoever asks.
  const [{ n }] = await AppDataSource.query('SELECT COUNT(*) AS n FROM spec_revisions WHERE origin_ref = ?', [
    `batch #${batchId}`,
  ]);
  expect(Number(n)).toBe(2);

  // The library exports in the same format, with the committed value, through a download that carries the token.
  await page.goBack();
  await screen.getByTestId('export-make').fill('Kestrel Moto');
  const download = page.waitForEvent('download');
  await screen.getByTestId('export-csv').click();
  const saved = await download;
  expect(saved.suggestedFilename()).toBe('specbench-specs-kestrel-moto.csv');
  const exported = fs.readFileSync((await saved.path())!, 'utf8');
  expect(exported.split(/\r?\n/)[0]).toMatch(/^\uFEFF?make,model,year_from/);
  expect(exported).toContain(`,${newMax},`);
  expect(exported).not.toContain(make);

  const phone = await editorPage('import-lead', PHONE);
  await phone.goto(`${app.url}/editor/import?batch=${batchId}`);
  await phone.getByTestId('commit-done').waitFor();
  await screenshot(phone, 'curation-import-phone');
});

it('an editor edits a spec through the form; the card shows the new value and the revision with its diff', async () => {
  const spec = await demoSpec(1);
  const newMax = Number((spec.max * 1.05).toFixed(2));
  const page = await editorPage('form-lead');
  await page.goto(`${app.url}/specs/${spec.id}`);
  await page.getByTestId('spec-screen').getByTestId('edit-spec').click();
  const form = page.getByTestId('spec-edit-form');
  await form.getByLabel('Maximum', { exact: true }).fill(String(newMax));
  await form.getByLabel('Why does it change? (required)').fill('Service bulletin SB-7 raises the upper limit.');
  await screenshot(page, 'curation-edit-form-desktop');
  await form.getByTestId('spec-edit-submit').click();

  const card = page.getByTestId('spec-screen');
  await until(card.getByTestId('spec-display'), String(newMax));
  const latest = card.getByTestId(`revision-${spec.version + 1}`);
  await until(
    latest,
    new RegExp(`Edited[\\s\\S]*form-lead \\(editor\\)[\\s\\S]*SB-7[\\s\\S]*Maximum\\s*${spec.max} → ${newMax}`),
  );
});

it('two editors save the same spec: the second sees both values side by side, re-applies on the current version, and can revert', async () => {
  const spec = await demoSpec(2);
  const theirs = Number((spec.max * 1.05).toFixed(2));
  const mine = Number((spec.max * 1.1).toFixed(2));
  const first = await editorPage('stale-first');
  const second = await editorPage('stale-second');
  for (const p of [first, second]) {
    await p.goto(`${app.url}/editor/specs/${spec.id}`);
    await p.getByTestId('spec-edit-form').waitFor();
  }
  const save = async (p: Page, max: number, reason: string) => {
    const form = p.getByTestId('spec-edit-form');
    await form.getByLabel('Maximum', { exact: true }).fill(String(max));
    await form.getByLabel('Why does it change? (required)').fill(reason);
    await form.getByTestId('spec-edit-submit').click();
  };
  await save(first, theirs, 'First editor: bulletin SB-9.');
  await first.getByTestId('spec-screen').waitFor();
  await save(second, mine, 'Second editor: manual 4th edition.');

  const view = second.getByTestId('stale-edit-view');
  await view.waitFor();
  await until(view, new RegExp(`version ${spec.version}; it is now at version ${spec.version + 1}`));
  await until(second.getByTestId('stale-row-max'), new RegExp(`Maximum\\s*both changed\\s*${theirs}\\s*${mine}`));
  await screenshot(second, 'curation-stale-edit-desktop');
  const [{ max: stored }] = await AppDataSource.query('SELECT max_value AS max FROM specs WHERE id = ?', [spec.id]);
  expect(stored).toBe(theirs);

  await view.getByTestId('stale-reapply').click();
  const card = second.getByTestId('spec-screen');
  await until(card.getByTestId('spec-display'), String(mine));
  await until(card.getByTestId(`revision-${spec.version + 2}`), new RegExp(`Maximum\\s*${theirs} → ${mine}`));

  // Revert to the first editor's revision: a new revision, the value back.
  await card.getByTestId(`revert-${spec.version + 1}`).click();
  await card.getByTestId('revert-reason').fill('The 4th edition is not released yet.');
  await until(card.getByTestId(`revert-form-${spec.version + 1}`), new RegExp(`Maximum\\s*${mine} → ${theirs}`));
  await screenshot(second, 'curation-revert-desktop');
  await card.getByTestId('revert-confirm').click();
  await until(
    card.getByTestId(`revision-${spec.version + 3}`),
    new RegExp(`Reverted \\(to version ${spec.version + 1}\\)`),
  );
  await until(card.getByTestId('spec-display'), String(theirs));
});
