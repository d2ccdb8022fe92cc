/**
 * End-to-end helpers: the real app (API + exported web build) on a loopback port,
 * and Debian's Chromium driven by playwright-core.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { chromium, type Browser, type Page } from 'playwright-core';
import { createApp } from '@/server/app';

export const ROOT = path.resolve(__dirname, '../..');
export const SCREENSHOTS = path.join(ROOT, '__tests__', 'screenshots');
export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1280, height: 800 };

export async function startWebServer(): Promise<{ url: string; close: () => Promise<void> }> {
  const webDist = process.env.E2E_WEB_DIST ?? path.join(ROOT, 'dist');
  if (!fs.existsSync(path.join(webDist, 'index.html')))
    throw new Error('No web build in dist/: run `npm test` (it builds) or `npm run build:web`.');
  const server: Server = createApp({ webDist }).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const { port } = server.address() as AddressInfo;
  return { url: `http://127.0.0.1:${port}`, close: () => new Promise((resolve) => server.close(() => resolve())) };
}

export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--disable-dev-shm-usage',
    ],
  });
}

/**
 * The whole screen. Screens scroll inside a view, not the document, so the viewport is
 * stretched to the content's height for the picture and then put back.
 */
export async function screenshot(page: Page, name: string) {
  fs.mkdirSync(SCREENSHOTS, { recursive: true });
  const viewport = page.viewportSize()!;
  // Runs in the browser, where `document` exists (the server tsconfig has no DOM types).
  const height: number = await page.evaluate(
    'Math.max(...Array.from(document.querySelectorAll("*")).map((el) => el.scrollHeight))',
  );
  await page.setViewportSize({
    width: viewport.width,
    height: Math.min(Math.max(height + 120, viewport.height), 6000),
  });
  await page.screenshot({ path: path.join(SCREENSHOTS, `${name}.png`) });
  await page.setViewportSize(viewport);
}

/** For an e2e file: the app on a loopback port and one Chromium, started before its tests and closed after. */
export function useWebApp(): { readonly url: string; readonly browser: Browser } {
  let web: Awaited<ReturnType<typeof startWebServer>> | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    web = await startWebServer();
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await web?.close();
  });
  return {
    get url() {
      return web!.url;
    },
    get browser() {
      return browser!;
    },
  };
}
