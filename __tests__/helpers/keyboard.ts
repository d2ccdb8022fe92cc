/** Keyboard-only browser journeys: move focus with Tab (never a click) and check what has it. */
import type { Locator, Page } from 'playwright-core';

/** True when the element (or a descendant, e.g. the input inside a field) has the keyboard focus. */
export async function hasFocus(target: Locator): Promise<boolean> {
  return target.first().evaluate((el) => el === document.activeElement || el.contains(document.activeElement));
}

/**
 * Presses Tab (Shift+Tab with `back`) until `target` has the focus; fails naming it after `max` presses.
 * The order the focus visits is the screen's order, so this also checks the target is reachable.
 */
export async function tabTo(page: Page, target: Locator, what: string, { max = 80, back = false } = {}) {
  for (let i = 0; i < max; i++) {
    if (await hasFocus(target)) return;
    await page.keyboard.press(back ? 'Shift+Tab' : 'Tab');
  }
  if (await hasFocus(target)) return;
  const focused = await page.evaluate(
    '(() => { const el = document.activeElement; return el ? `${el.tagName} ${el.getAttribute("aria-label") ?? ""} ${(el.textContent ?? "").slice(0, 60)}` : "nothing"; })()',
  );
  throw new Error(`${what} never got the keyboard focus in ${max} Tab presses (the focus is on: ${String(focused)})`);
}

/** The focused element draws a visible ring: a non-zero outline (or the browser's own focus style). */
export async function focusIsVisible(page: Page): Promise<boolean> {
  return Boolean(
    await page.evaluate(
      '(() => { const el = document.activeElement; if (!el || el === document.body) return false; const s = getComputedStyle(el); return s.outlineStyle !== "none" && parseFloat(s.outlineWidth) > 0; })()',
    ),
  );
}
