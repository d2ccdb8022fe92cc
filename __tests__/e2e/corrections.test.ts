import type { Page } from 'playwright-core';
import { AppDataSource } from '@/server/db/data-source';
import { DESKTOP, PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';
import { expectHidden, expectText, expectVisible, step } from '../helpers/expect-visible';

useTestDatabase();
const app = useWebApp();

it('a contributor proposes, an editor accepts, the contributor sees the decision and the spec card the new value with its history', async () => {
  const [spec] = await AppDataSource.query(
    "SELECT id, max_value AS max FROM specs WHERE quantity_kind = 'resistance' AND min_value IS NOT NULL AND max_value IS NOT NULL ORDER BY id DESC LIMIT 1",
  );
  const newMax = Number((spec.max * 1.2).toFixed(2));
  const contributor = await e2eAccount('contributor', 'propose-tech');
  const editor = await e2eAccount('editor', 'review-lead');
  let tech: Page;
  let id = 0;

  await step('the contributor proposes a wider maximum with its source', async () => {
    tech = await (await app.browser.newContext({ viewport: PHONE })).newPage();
    await signInThroughApi(tech, app.url, contributor.email);
    await tech.goto(`${app.url}/specs/${spec.id}`);
    await tech.getByTestId('spec-screen').getByTestId('propose-correction').click();
    const form = tech.getByTestId('propose-screen');
    await expectVisible(form.getByTestId('proposal-form'), 'the proposal form');
    await form.getByLabel('Maximum', { exact: true }).fill(String(newMax));
    await form.getByLabel('Source title', { exact: true }).fill('Invented Service Bulletin SB-31');
    await form.getByLabel('Page', { exact: true }).fill('2');
    await form
      .getByLabel('Why should it change?', { exact: true })
      .fill('The bulletin widens the upper limit for later coils.');
    await screenshot(tech, 'correction-form-phone');
    await form.getByTestId('proposal-submit').click();
    const mine = tech.getByTestId('my-proposals-screen');
    const pending = await expectText(
      mine.getByText(/^#\d+ · Waiting/),
      /Waiting for an editor/,
      'the pending proposal',
    );
    id = Number(pending.match(/#(\d+)/)![1]);
    expect(id).toBeGreaterThan(0);
    await screenshot(tech, 'my-proposals-pending-phone');
  });

  await step('the editor compares and accepts it from the review queue', async () => {
    const lead = await (await app.browser.newContext({ viewport: DESKTOP })).newPage();
    await signInThroughApi(lead, app.url, editor.email);
    await lead.getByTestId('review-badge').click();
    const queue = lead.getByTestId('review-queue-screen');
    await expectText(
      queue.getByTestId(`proposer-${id}`),
      /^By propose-tech \(contributor\) · \d+ accepted/,
      'the proposer line',
    );
    await queue.getByTestId(`review-${id}`).click();
    const review = lead.getByTestId('review-screen');
    await expectText(review.getByTestId('field-comparison'), String(newMax), 'the field comparison');
    await expectVisible(review.getByTestId(`proposer-${id}`), 'the proposer line on the review');
    await screenshot(lead, 'review-desktop');
    await review.getByTestId('decision-note').fill('Checked against SB-31.');
    await review.getByTestId('accept-button').click();
    // Back in the queue, the decided proposal is gone.
    await expectHidden(lead.getByTestId('review-screen'), 'the review screen');
    await expectHidden(queue.getByTestId(`correction-${id}`), `proposal #${id} in the queue`);
  });

  await step('the contributor sees the decision, and the spec card the new value with its history', async () => {
    await tech.reload();
    await expectVisible(tech.getByTestId('my-proposals-screen').getByText(`#${id} · Accepted`), `“#${id} · Accepted”`);
    await expectText(tech.getByTestId(`decision-${id}`), /Checked against SB-31/, 'the editor’s note');
    expect(await tech.getByTestId(`proposer-${id}`).count()).toBe(0);
    await screenshot(tech, 'my-proposals-decided-phone');
    await tech.goto(`${app.url}/specs/${spec.id}`);
    const card = tech.getByTestId('spec-screen');
    await expectText(card.getByTestId('spec-display'), String(newMax), 'the spec’s values');
    await expectText(card.getByTestId('revision-list'), new RegExp(`correction #${id}`), 'the revision list');
    await screenshot(tech, 'spec-after-correction-phone');
  });
});
