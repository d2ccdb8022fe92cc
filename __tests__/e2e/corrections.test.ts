import { AppDataSource } from '@/server/db/data-source';
import { DESKTOP, PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';

useTestDatabase();
const app = useWebApp();

it('a contributor proposes, an editor accepts, the contributor sees the decision and the spec card the new value with its history', async () => {
  const [spec] = await AppDataSource.query(
    "SELECT id, max_value AS max FROM specs WHERE quantity_kind = 'resistance' AND min_value IS NOT NULL AND max_value IS NOT NULL ORDER BY id DESC LIMIT 1",
  );
  const newMax = Number((spec.max * 1.2).toFixed(2));
  const contributor = await e2eAccount('contributor', 'propose-tech');
  const editor = await e2eAccount('editor', 'review-lead');

  const tech = await (await app.browser.newContext({ viewport: PHONE })).newPage();
  await signInThroughApi(tech, app.url, contributor.email);
  await tech.goto(`${app.url}/specs/${spec.id}`);
  await tech.getByTestId('spec-screen').getByTestId('propose-correction').click();
  const form = tech.getByTestId('propose-screen');
  await form.getByLabel('Maximum', { exact: true }).fill(String(newMax));
  await form.getByLabel('Source title', { exact: true }).fill('Invented Service Bulletin SB-31');
  await form.getByLabel('Page', { exact: true }).fill('2');
  await form
    .getByLabel('Why should it change?', { exact: true })
    .fill('The bulletin widens the upper limit for later coils.');
  await screenshot(tech, 'correction-form-phone');
  await form.getByTestId('proposal-submit').click();
  const mine = tech.getByTestId('my-proposals-screen');
  await mine
    .getByText(/Waiting for an editor/)
    .first()
    .waitFor();
  const id = Number(
    (
      await mine
        .getByText(/^#\d+ · Waiting/)
        .first()
        .innerText()
    ).match(/#(\d+)/)![1],
  );
  await screenshot(tech, 'my-proposals-pending-phone');

  const lead = await (await app.browser.newContext({ viewport: DESKTOP })).newPage();
  await signInThroughApi(lead, app.url, editor.email);
  await lead.getByTestId('review-badge').click();
  await lead.getByTestId('review-queue-screen').getByTestId(`review-${id}`).click();
  const review = lead.getByTestId('review-screen');
  await expect(review.getByTestId('field-comparison').innerText()).resolves.toContain(String(newMax));
  await screenshot(lead, 'review-desktop');
  await review.getByTestId('decision-note').fill('Checked against SB-31.');
  await review.getByTestId('accept-button').click();
  // Back in the queue, the decided proposal is gone.
  await lead.getByTestId('review-screen').waitFor({ state: 'detached' });
  await lead.getByTestId('review-queue-screen').getByTestId(`correction-${id}`).waitFor({ state: 'detached' });

  await tech.reload();
  await tech.getByTestId('my-proposals-screen').getByText(`#${id} · Accepted`).waitFor();
  await expect(tech.getByTestId(`decision-${id}`).innerText()).resolves.toMatch(/Checked against SB-31/);
  await screenshot(tech, 'my-proposals-decided-phone');
  await tech.goto(`${app.url}/specs/${spec.id}`);
  const card = tech.getByTestId('spec-screen');
  await expect(card.getByTestId('spec-display').innerText()).resolves.toContain(String(newMax));
  await expect(card.getByTestId('revision-list').innerText()).resolves.toMatch(new RegExp(`correction #${id}`));
  await screenshot(tech, 'spec-after-correction-phone');
});
