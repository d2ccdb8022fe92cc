/** Real accounts for browser tests: a verified user with a real password, signed in through the API from the page. */
import type { Page } from 'playwright-core';
import { AppDataSource } from '@/server/db/data-source';
import type { Role } from '@/server/auth/roles';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';
import { hashPassword } from '@/server/modules/accounts/passwords';

export const E2E_PASSWORD = 'coil-pack-bench-2026';

export async function e2eAccount(role: Role, name: string): Promise<{ email: string; displayName: string }> {
  const email = `${name}@e2e.specbench.example`;
  const repo = AppDataSource.getRepository(User);
  if (!(await repo.existsBy({ emailKey: emailKey(email) }))) {
    await repo.insert({
      email,
      emailKey: emailKey(email),
      displayName: `${name} (${role})`,
      role,
      passwordHash: await hashPassword(E2E_PASSWORD),
      emailVerifiedAt: new Date(),
    });
  }
  return { email, displayName: `${name} (${role})` };
}

/** Signs in with fetch from the page (the browser keeps the refresh cookie), then reloads so the app restores the session. */
export async function signInThroughApi(page: Page, baseUrl: string, email: string) {
  if (!page.url().startsWith(baseUrl)) await page.goto(baseUrl);
  // Let the app's own first session check finish before the cookie appears.
  await page.waitForLoadState('networkidle');
  const status = await page.evaluate(
    async ([e, p]) =>
      (
        await fetch('/api/auth/sign-in', {
          method: 'POST',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify({ email: e, password: p }),
          credentials: 'include',
        })
      ).status,
    [email, E2E_PASSWORD],
  );
  if (status !== 200) throw new Error(`sign-in answered ${status}`);
  await page.reload();
  await page.getByTestId('header-account').filter({ hasNotText: 'Sign in' }).waitFor();
}
