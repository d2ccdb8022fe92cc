/**
 * Browser-test assertions that say what went wrong. playwright-core has no test runner,
 * so no `expect(locator).toBeVisible()`: these wait on a locator for a few seconds and,
 * on timeout, fail naming the element (and the text it had), instead of the test
 * stopping at jest's 90 s timeout. `step` prefixes any failure with the journey's step.
 */
import type { Locator } from 'playwright-core';

/** How long an element may take to appear: a screen's data, a mutation's answer. */
export const WAIT_MS = 15_000;

const seconds = (ms: number) => `${ms / 1000} s`;

/** The element is (or becomes) visible. `what` names it in the failure; the locator names it otherwise. */
export async function expectVisible(locator: Locator, what = String(locator), timeout = WAIT_MS) {
  try {
    await locator.waitFor({ state: 'visible', timeout });
  } catch {
    throw new Error(`expected ${what} to be visible within ${seconds(timeout)}, but it was not found on the page`);
  }
}

/** The element is (or becomes) hidden or gone. */
export async function expectHidden(locator: Locator, what = String(locator), timeout = WAIT_MS) {
  try {
    await locator.waitFor({ state: 'hidden', timeout });
  } catch {
    throw new Error(`expected ${what} to disappear within ${seconds(timeout)}, but it is still shown`);
  }
}

/** The element is visible and its text matches (data may refresh after the first paint). Returns the text. */
export async function expectText(
  locator: Locator,
  pattern: RegExp | string,
  what = String(locator),
  timeout = WAIT_MS,
) {
  const matches = (text: string) => (typeof pattern === 'string' ? text.includes(pattern) : pattern.test(text));
  await expectVisible(locator.first(), what, timeout);
  const deadline = Date.now() + timeout;
  let text = await locator.first().innerText();
  while (!matches(text) && Date.now() < deadline) {
    await new Promise((resolve) => setTimeout(resolve, 100));
    text = await locator.first().innerText();
  }
  if (!matches(text)) throw new Error(`expected ${what} to show ${String(pattern)}, but it shows:\n${text}`);
  return text;
}

/** The number of elements the locator matches settles on `n`. */
export async function expectCount(locator: Locator, n: number, what = String(locator), timeout = WAIT_MS) {
  const deadline = Date.now() + timeout;
  let count = await locator.count();
  while (count !== n && Date.now() < deadline) {
    await new Promise((resolve) => setTimeout(resolve, 100));
    count = await locator.count();
  }
  if (count !== n) throw new Error(`expected ${n} of ${what}, found ${count}`);
}

/** One named step of a long journey: a failure inside says which step it was. */
export async function step<T>(name: string, fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    if (err instanceof Error) {
      err.message = `[step: ${name}] ${err.message}`;
      throw err;
    }
    throw new Error(`[step: ${name}] ${String(err)}`);
  }
}
