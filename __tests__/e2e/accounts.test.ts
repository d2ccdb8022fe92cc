import type { Browser, Locator, Page } from 'playwright-core';
import { AppDataSource } from '@/server/db/data-source';
import { fakeSmtp } from '@/server/modules/mail/fake-smtp';
import { resetTransport, startOutboxWorker, stopOutboxWorker } from '@/server/modules/mail/mailer';
import { hashPassword } from '@/server/modules/accounts/passwords';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';
import { DESKTOP, PHONE, launchChromium, screenshot, startWebServer } from '../helpers/browser';
import { useTestDatabase } from '../helpers/test-db';
import { drainOutbox, emptyOutbox } from '../helpers/mail';
import { expectText, expectVisible, step } from '../helpers/expect-visible';

// Declared before useTestDatabase(): after-all hooks run in declaration order, and the
// outbox worker must stop (and finish a round in flight) before the database closes.
afterAll(async () => {
  await stopOutboxWorker();
});
useTestDatabase();
let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;

const suffix = Date.now().toString(36);
const TECH = { name: 'Tamsin Reed', email: `tamsin.${suffix}@shop.example`, password: 'copper-winding-42-ohms' };
const ADMIN = { name: 'Odile Admin', email: `odile.${suffix}@shop.example`, password: 'stator-phase-check-2026' };

beforeAll(async () => {
  await emptyOutbox();
  await fakeSmtp.start(0);
  resetTransport();
  startOutboxWorker(200);
  // testUser() stores an unusable hash; this admin signs in through the form, so it needs a real one.
  await AppDataSource.getRepository(User).insert({
    email: ADMIN.email,
    emailKey: emailKey(ADMIN.email),
    displayName: ADMIN.name,
    passwordHash: await hashPassword(ADMIN.password),
    role: 'admin',
    emailVerifiedAt: new Date(),
  });
  web = await startWebServer();
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
  await web?.close();
  await fakeSmtp.stop();
  resetTransport();
});

/** The account entry of the header on show (stacked screens keep their hidden headers). */
const headerAccount = (page: Page) => page.getByTestId('header-account').filter({ visible: true });

/** Reloads the development mailbox until a message to `to` is listed (the outbox worker sends within about a second). */
async function waitForMail(page: Page, to: string): Promise<Locator> {
  await drainOutbox();
  for (let i = 0; i < 40; i += 1) {
    await page.goto(`${web.url}/dev/mailbox`);
    const mail = page.locator('article', { hasText: to });
    if (await mail.count()) return mail.first();
    await page.waitForTimeout(250);
  }
  throw new Error(`no mail to ${to} in the development mailbox`);
}

async function waitUntil(check: () => Promise<boolean>, what = 'the condition') {
  for (let i = 0; i < 40; i += 1) {
    if (await check()) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`timed out waiting for ${what}`);
}

async function signIn(page: Page, who: { email: string; password: string }) {
  const screen = page.getByTestId('sign-in-screen');
  await screen.getByLabel('E-mail address', { exact: true }).fill(who.email);
  await screen.getByLabel('Password', { exact: true }).fill(who.password);
  await screen.getByTestId('sign-in-submit').click();
}

describe('accounts in the browser', () => {
  it('sign up, confirm through the mailbox link, sign in, and stay signed in after a reload', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));

    await step('sign up', async () => {
      await page.goto(`${web.url}/sign-up`);
      const signUp = page.getByTestId('sign-up-screen');
      await signUp.getByTestId('sign-up-submit').click();
      await expectVisible(signUp.getByText('Use at least 2 characters'), 'the name’s message');
      await signUp.getByLabel('Your name', { exact: true }).fill(TECH.name);
      await signUp.getByLabel('E-mail address', { exact: true }).fill(TECH.email);
      await signUp.getByLabel('Password', { exact: true }).fill(TECH.password);
      await screenshot(page, 'accounts-sign-up-phone');
      await signUp.getByTestId('sign-up-submit').click();
      await expectVisible(signUp.getByTestId('sign-up-done'));
      await expectText(signUp.getByTestId('sign-up-done'), TECH.email);
      await screenshot(page, 'accounts-sign-up-done-phone');
    });
    const usedLink = await step('confirm the address through the mailbox link, once', async () => {
      const mail = await waitForMail(page, TECH.email);
      await expectText(mail, /Confirm your Specbench e-mail address/);
      await screenshot(page, 'accounts-mailbox-phone');
      // The link points at config.appUrl, not this test server's port: keep its path and query.
      const href = new URL((await mail.getByRole('link').first().getAttribute('href'))!);
      expect(href.pathname).toBe('/verify');
      await page.goto(`${web.url}/verify?token=${encodeURIComponent(href.searchParams.get('token')!)}`);
      const done = page.getByTestId('verify-done');
      await expectVisible(done);
      await expectText(done, TECH.email);
      await screenshot(page, 'accounts-verify-phone');

      // The link works once: a second visit says so and still offers the way on.
      await page.goto(`${web.url}/verify?token=${encodeURIComponent(href.searchParams.get('token')!)}`);
      const failed = page.getByTestId('verify-failed');
      await expectVisible(failed);
      await expectText(failed, /already been used/);
      await screenshot(page, 'accounts-verify-used-phone');
      return failed;
    });

    await step('sign in: a wrong password is refused, the right one signs in and survives a reload', async () => {
      await usedLink.getByRole('button', { name: 'Sign in' }).click();
      const signInScreen = page.getByTestId('sign-in-screen');
      await expectVisible(signInScreen);
      await signIn(page, { email: TECH.email, password: 'not-the-password' });
      await expectText(signInScreen.getByTestId('sign-in-error'), /e-mail address or the password is wrong/);
      await screenshot(page, 'accounts-sign-in-error-phone');
      await signIn(page, TECH);
      await expectVisible(page.getByTestId('search-screen'));
      await expect(headerAccount(page).innerText()).resolves.toBe(TECH.name);
      await screenshot(page, 'accounts-home-signed-in-phone');

      await page.reload();
      await expectVisible(page.getByTestId('search-screen'));
      await expectVisible(headerAccount(page).getByText(TECH.name), 'the signed-in name in the header');
    });

    await step('a contributor: no users page, the account says Contributor', async () => {
      // Not an admin: the users page says so instead of listing accounts.
      await page.goto(`${web.url}/admin/users`);
      await expectVisible(page.getByTestId('admins-only'));

      await page.setViewportSize(DESKTOP);
      await page.goto(web.url);
      await headerAccount(page).getByText(TECH.name).click();
      const account = page.getByTestId('account-screen');
      await expectVisible(account);
      await expect(account.getByTestId('account-role').innerText()).resolves.toBe('Contributor');
      await expect(account.getByTestId('to-admin-users').count()).resolves.toBe(0);
      await screenshot(page, 'accounts-account-desktop');
    });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('an admin finds the new account, makes it an editor, and the history shows the change', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));

    await page.goto(`${web.url}/sign-in`);
    await signIn(page, ADMIN);
    await expectVisible(page.getByTestId('search-screen'));
    await headerAccount(page).getByText(ADMIN.name).click();
    await page.getByTestId('account-screen').getByTestId('to-admin-users').click();

    const users = page.getByTestId('users-screen');
    await users.getByLabel('Search users', { exact: true }).fill(`tamsin.${suffix}`);
    const rows = users.getByTestId('users-list').locator('[data-testid^="user-"]');
    await waitUntil(async () => (await rows.count()) === 1 && (await rows.first().innerText()).includes(TECH.email));
    const row = rows.first();
    await row.getByRole('radio', { name: 'Role: Editor' }).click();
    await expectText(row.getByTestId(/^confirm-\d+$/), 'to Editor?', 'the confirmation');
    await row.getByRole('button', { name: 'Yes, make Editor' }).click();
    await expectText(users.getByTestId('users-notice'), 'is now Editor.', 'the message afterwards');
    const roleOf = async () =>
      (await AppDataSource.getRepository(User).findOneByOrFail({ emailKey: emailKey(TECH.email) })).role;
    await waitUntil(async () => (await roleOf()) === 'editor', 'the role change to be saved');

    await row.getByRole('button', { name: 'Show history' }).click();
    const audit = users.getByTestId('audit-panel');
    await expectVisible(audit.getByText('Role changed from contributor to editor'));
    await expectText(audit, `by ${ADMIN.name}`);
    await screenshot(page, 'accounts-admin-desktop');
    expect(errors).toEqual([]);
    await page.close();
  });
});
