/// <reference lib="dom" />
/**
 * The web app's service worker (generated at build time by scripts/build-web.js with
 * workbox-build), registered through workbox-window once the first screen has loaded, so
 * its precache never competes with the first paint. A new build waits until the user
 * accepts the "update available" notice; then it takes over and the page reloads.
 */
import { Workbox } from 'workbox-window';

let workbox: Workbox | null = null;
let waiting = false;
const listeners = new Set<() => void>();
const REGISTER_AFTER_LOAD_MS = 1500;

export function registerServiceWorker(): void {
  if (workbox || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  if (process.env.NODE_ENV !== 'production') return;
  const wb = new Workbox('/sw.js');
  workbox = wb;
  wb.addEventListener('waiting', () => {
    waiting = true;
    listeners.forEach((l) => l());
  });
  const register = () => setTimeout(() => void wb.register().catch(() => undefined), REGISTER_AFTER_LOAD_MS);
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}

/** Whether a new build is installed and waiting for the user's go-ahead. */
export const updateWaiting = () => waiting;
export function subscribeUpdate(fn: () => void) {
  listeners.add(fn);
  return () => {
    listeners.delete(fn);
  };
}

/** Lets the waiting build take over, then reloads into it. */
export function applyUpdate(): void {
  if (!workbox) return;
  workbox.addEventListener('controlling', () => window.location.reload());
  workbox.messageSkipWaiting();
}
