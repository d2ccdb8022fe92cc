/**
 * axe-core on every screen, public and signed in, at phone and desktop sizes, light and dark:
 * zero violations at the WCAG 2.0/2.1/2.2 A and AA tags (issue 17; WCAG 2.2 AA with axe-core's
 * rule set as the outside check). No rule is disabled. Each screen is loaded directly (as from a
 * bookmark) and checked once its data has arrived.
 */
import type { Browser, Page } from 'playwright-core';
import { AppDataSource } from '@/server/db/data-source';
import { bearerFor } from '../helpers/auth';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';
import { DESKTOP, PHONE, screenshot, useWebApp } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { e2eAccount, signInThroughApi } from '../helpers/e2e-accounts';
import { expectVisible } from '../helpers/expect-visible';
import { axeViolations, describeViolations } from '../helpers/axe';

useTestDatabase();
const app = useWebApp();

type Target = { name: string; path: string; testID: string };

/** An API call as `email`'s account, from the test (bearer token; the page keeps its own session). */
async function api(email: string, method: string, path: string, body?: unknown): Promise<{ id: number }> {
  const user = await AppDataSource.getRepository(User).findOneByOrFail({ emailKey: emailKey(email) });
  const res = await fetch(`${app.url}/api${path}`, {
    method,
    headers: { ...(await bearerFor(user)), 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as { id: number };
}

let publicTargets: Target[] = [];
let signedInTargets: Target[] = [];
let adminEmail = '';

beforeAll(async () => {
  const [spec] = await AppDataSource.query(
    `SELECT s.id, s.version, s.min_value AS min, s.max_value AS max, s.unit, c.model_id AS modelId FROM specs s
       JOIN components c ON c.id = s.component_id
      WHERE s.quantity_kind = 'resistance' AND s.min_value IS NOT NULL AND s.max_value IS NOT NULL ORDER BY s.id LIMIT 1 OFFSET 3`,
  );
  publicTargets = [
    { name: 'home', path: '/', testID: 'search-screen' },
    { name: 'model sheet', path: `/models/${spec.modelId}`, testID: 'model-screen' },
    { name: 'spec card', path: `/specs/${spec.id}`, testID: 'spec-screen' },
    { name: 'calculator', path: '/calculator', testID: 'calculator-screen' },
    { name: 'sign in', path: '/sign-in', testID: 'sign-in-screen' },
    { name: 'sign up', path: '/sign-up', testID: 'sign-up-screen' },
  ];
  const admin = await e2eAccount('admin', 'a11y-admin');
  const contributor = await e2eAccount('contributor', 'a11y-tech');
  adminEmail = admin.email;
  const job = await api(admin.email, 'POST', '/jobs', { modelId: spec.modelId, customerRef: 'A11Y-1' });
  await api(admin.email, 'POST', `/jobs/${job.id}/readings`, {
    specId: spec.id,
    reading: { value: (spec.min + spec.max) / 2, unit: spec.unit },
  });
  const proposal = await api(contributor.email, 'POST', '/corrections', {
    kind: 'change',
    specId: spec.id,
    version: spec.version,
    citation: { title: 'Invented Bulletin A-11', page: '3' },
    rationale: 'The bulletin widens the upper limit.',
    values: { min: spec.min, max: Number((spec.max * 1.1).toFixed(3)), unit: spec.unit },
  });
  signedInTargets = [
    { name: 'jobs', path: '/jobs', testID: 'jobs-screen' },
    { name: 'job sheet', path: `/jobs/${job.id}`, testID: 'job-sheet' },
    { name: 'report', path: `/jobs/${job.id}/report`, testID: 'job-report' },
    { name: 'import', path: '/editor/import', testID: 'import-screen' },
    { name: 'spec editor', path: `/editor/specs/${spec.id}`, testID: 'edit-spec-screen' },
    { name: 'history (spec card, signed in)', path: `/specs/${spec.id}`, testID: 'spec-screen' },
    { name: 'proposals', path: '/corrections', testID: 'my-proposals-screen' },
    { name: 'review queue', path: '/review', testID: 'review-queue-screen' },
    { name: 'review', path: `/review/${proposal.id}`, testID: 'review-screen' },
    { name: 'admin', path: '/admin/users', testID: 'users-screen' },
    { name: 'account', path: '/account', testID: 'account-screen' },
  ];
}, 60_000);

const slug = (name: string) => name.replace(/[^a-z]+/gi, '-').replace(/-$/, '');

/** Opens the screen directly and waits for its data (no spinner left). */
async function open(page: Page, t: Target) {
  await page.goto(`${app.url}${t.path}`);
  await expectVisible(page.getByTestId(t.testID).first(), `the ${t.name} screen`).catch(async (err) => {
    await screenshot(page, `a11y-failed-${slug(t.name)}`);
    throw err;
  });
  await page.waitForLoadState('networkidle');
  await page.getByRole('progressbar').first().waitFor({ state: 'hidden', timeout: 10_000 });
}

async function checkAll(browser: Browser, size: 'phone' | 'desktop', scheme: 'light' | 'dark', signedIn: boolean) {
  const context = await browser.newContext({ viewport: size === 'phone' ? PHONE : DESKTOP, colorScheme: scheme });
  const page = await context.newPage();
  if (signedIn) await signInThroughApi(page, app.url, adminEmail);
  const failures: string[] = [];
  for (const t of signedIn ? signedInTargets : publicTargets) {
    const opened = await open(page, t).then(
      () => true,
      (err: Error) => failures.push(`— ${t.name} (${t.path}): ${err.message}`) < 0,
    );
    if (!opened) continue;
    const violations = await axeViolations(page);
    if (violations.length > 0) failures.push(`— ${t.name} (${t.path}):\n${describeViolations(violations)}`);
    if ((size === 'phone') === (scheme === 'light'))
      await screenshot(page, `a11y-${slug(t.name)}-${size}-${scheme}${signedIn ? '-signed-in' : ''}`);
  }
  await context.close();
  if (failures.length > 0)
    throw new Error(`axe-core, ${size}, ${scheme}${signedIn ? ', signed in' : ''}:\n${failures.join('\n')}`);
}

describe.each([
  ['phone', 'light'],
  ['phone', 'dark'],
  ['desktop', 'light'],
  ['desktop', 'dark'],
] as const)('axe-core at %s size, %s scheme: zero WCAG 2.2 AA violations', (size, scheme) => {
  it('on the public screens', () => checkAll(app.browser, size, scheme, false), 180_000);
  it('on the signed-in screens', () => checkAll(app.browser, size, scheme, true), 240_000);
});

it('the axe check fails on a page with known violations, naming rule, help and element', async () => {
  const page = await app.browser.newPage();
  // Two classic failures: an image with no text alternative, a button with no name.
  await page.setContent(
    '<html lang="en"><title>t</title><main><img src="x.png"><button id="mute"></button></main></html>',
  );
  const violations = await axeViolations(page);
  expect(violations.map((v) => v.id).sort()).toEqual(expect.arrayContaining(['button-name', 'image-alt']));
  const text = describeViolations(violations);
  expect(text).toMatch(/image-alt \(critical\): Images must have alternative text/);
  expect(text).toMatch(/#mute/);
  await page.close();
});
