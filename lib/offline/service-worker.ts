/** Native apps have no service worker: the web build's fork is service-worker.web.ts. */
export function registerServiceWorker(): void {}
export const updateWaiting = () => false;
export const subscribeUpdate = (_fn: () => void) => () => undefined;
export function applyUpdate(): void {}
