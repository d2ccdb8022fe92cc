/**
 * A contributor proposes a change to a test plan through the corrections flow, at phone
 * size: the plan's JSON is pre-filled, one step is reworded, the source named; an editor
 * sees which step changed, accepts, and the plan shows the new wording as a new version.
 * The demo plan is put back afterwards, so later tests in this database see it unchanged.
 */
import { DESKTOP, PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { expectText, expectVisible, step } from '../helpers/expect-visible';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';
import { AppDataSource } from '@/server/db/data-source';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';
import { bearerFor } from '../helpers/auth';

useTestDatabase();
const app = useWebApp();

it('a contributor proposes a reworded step, an editor accepts it, and the plan shows it', async () => {
  const [plan] = await AppDataSource.query(
    `SELECT id, version FROM plans WHERE title = 'No spark on one or all cylinders' AND status = 'published' LIMIT 1`,
  );
  const newTitle = `Battery rest voltage, rested overnight ${Date.now().toString(36)}`;
  const contributor = await e2eAccount('contributor', 'plan-proposer');
  const editor = await e2eAccount('editor', 'plan-reviewer');
  const original = (await (await fetch(`${app.url}/api/plans/${plan.id}`)).json()) as { steps: unknown[] };
  try {
    await propose();
  } finally {
    const editorRow = await AppDataSource.getRepository(User).findOneByOrFail({ emailKey: emailKey(editor.email) });
    const now = (await (await fetch(`${app.url}/api/plans/${plan.id}`)).json()) as { version: number };
    if (now.version !== plan.version) {
      const restored = await fetch(`${app.url}/api/plans/${plan.id}`, {
        method: 'PATCH',
        headers: { ...(await bearerFor(editorRow)), 'Content-Type': 'application/json' },
        body: JSON.stringify({
          version: now.version,
          reason: 'Test clean-up: the demo steps back',
          steps: original.steps,
        }),
      });
      expect(restored.status).toBe(200);
    }
  }

  async function propose() {
    const context = await app.browser.newContext({ viewport: PHONE });
    const page = await context.newPage();
    await step('the contributor opens the plan and proposes a reworded first step', async () => {
      await signInThroughApi(page, app.url, contributor.email);
      await page.goto(`${app.url}/plans/${plan.id}`);
      await page.getByTestId('propose-plan-change').click();
      const screen = page.getByTestId('propose-plan-screen');
      const json = screen.getByTestId('plan-json');
      await expectVisible(json, 'the plan JSON, pre-filled');
      const text = await json.inputValue();
      expect(text).toContain('"Battery rest voltage"');
      await json.fill(text.replace('"Battery rest voltage"', JSON.stringify(newTitle)));
      await screen.getByLabel('Page', { exact: true }).fill('12');
      await screen
        .getByLabel('Why should the plan change?', { exact: true })
        .fill('The reading is only meaningful after the battery has rested overnight.');
      await screenshot(page, 'plan-proposal-form-phone');
      await screen.getByTestId('plan-json-submit').click();
      await page.waitForURL(/\/corrections$/);
    });
    await context.close();

    const [correction] = await AppDataSource.query(
      `SELECT id FROM corrections WHERE kind = 'plan_change' AND plan_id = ? AND status = 'pending' ORDER BY id DESC LIMIT 1`,
      [plan.id],
    );
    expect(correction).toBeDefined();

    const review = await app.browser.newContext({ viewport: DESKTOP });
    const ed = await review.newPage();
    await step('the editor sees the changed step and accepts', async () => {
      await signInThroughApi(ed, app.url, editor.email);
      await ed.goto(`${app.url}/review/${correction.id}`);
      const screen = ed.getByTestId('review-screen');
      await expectText(screen.getByTestId('plan-change'), new RegExp(newTitle), 'the changed step in the review');
      await screenshot(ed, 'plan-proposal-review-desktop');
      await screen.getByTestId('accept-button').click();
      await ed.waitForURL(/\/review$/);
    });

    await step('the plan shows the new wording, one version on', async () => {
      const res = await fetch(`${app.url}/api/plans/${plan.id}`);
      const body = (await res.json()) as { version: number; steps: { title: string }[] };
      expect(body.version).toBe(plan.version + 1);
      expect(body.steps[0].title).toBe(newTitle);
      await ed.goto(`${app.url}/plans/${plan.id}`);
      await expectText(ed.getByText(newTitle).first(), new RegExp(newTitle), 'the new step title on the plan');
    });
    await review.close();
  }
});
