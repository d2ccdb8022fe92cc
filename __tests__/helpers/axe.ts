/**
 * axe-core in the browser tests: the npm package's own bundle is injected into the page and run
 * against the WCAG 2.x A and AA rules (WCAG 2.2 level AA is the goal; axe-core's rule set is the
 * outside check, see REFERENCES.md). A failure lists every violation with its rule id, help text
 * and the elements it found, so the message alone says what to fix.
 */
import fs from 'node:fs';
import type { Page } from 'playwright-core';

/** The tags of WCAG 2.0, 2.1 and 2.2 success criteria at levels A and AA (axe-core's tag names). */
export const WCAG_AA_TAGS = ['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'];

type AxeNode = { target: unknown[]; failureSummary?: string };
type AxeViolation = { id: string; impact: string | null; help: string; helpUrl: string; nodes: AxeNode[] };

const AXE_SOURCE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

/** Runs axe-core on the page as it is now; returns its violations at the WCAG AA tags. */
export async function axeViolations(page: Page): Promise<AxeViolation[]> {
  const injected = await page.evaluate('typeof window.axe !== "undefined"');
  // Evaluated through the DevTools protocol: the app's Content-Security-Policy (script-src 'self')
  // rightly refuses an inline <script>, and the test should not weaken it.
  if (!injected) await page.evaluate(AXE_SOURCE);
  // A string, as the server tsconfig (used by the e2e project) has no DOM types.
  return page.evaluate(
    `window.axe.run(document, { runOnly: { type: 'tag', values: ${JSON.stringify(WCAG_AA_TAGS)} }, resultTypes: ['violations'] })
      .then((r) => r.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, helpUrl: v.helpUrl,
        nodes: v.nodes.map((n) => ({ target: n.target, failureSummary: n.failureSummary })) })))`,
  );
}

/** One line per violation and one per element it names. */
export function describeViolations(violations: AxeViolation[]): string {
  return violations
    .map(
      (v) =>
        `${v.id} (${v.impact ?? 'n/a'}): ${v.help} — ${v.helpUrl}\n` +
        v.nodes
          .slice(0, 8)
          .map(
            (n) =>
              `    ${n.target.map(String).join(' ')}${n.failureSummary ? `\n      ${n.failureSummary.split('\n').join('\n      ')}` : ''}`,
          )
          .join('\n') +
        (v.nodes.length > 8 ? `\n    … and ${v.nodes.length - 8} more` : ''),
    )
    .join('\n');
}

/** Fails, listing each violation's id, help and targets, unless axe-core finds none. `where` names the screen. */
export async function expectNoAxeViolations(page: Page, where: string) {
  const violations = await axeViolations(page);
  if (violations.length > 0)
    throw new Error(
      `axe-core found ${violations.length} WCAG AA violation(s) on ${where}:\n${describeViolations(violations)}`,
    );
}
