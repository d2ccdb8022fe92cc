/**
 * The query cache kept on the device (IndexedDB through idb-keyval), so every spec, model
 * sheet, search result, job list and job sheet seen is there with no connection. The key is
 * versioned (a new shape of answers → bump PERSIST_VERSION), what is kept is bounded in size
 * (oldest queries go first) and in age, and only answers that succeeded are kept.
 */
import { get, set, del } from 'idb-keyval';
import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import { removeOldestQuery, type PersistedClient, type Persister } from '@tanstack/react-query-persist-client';
import { onlineManager, type Query } from '@tanstack/react-query';

export const PERSIST_VERSION = 'v1';
export const PERSIST_KEY = `specbench.query-cache.${PERSIST_VERSION}`;
/** About 4 MB of JSON: thousands of specs, well inside what browsers give a site. */
export const PERSIST_MAX_CHARS = 4_000_000;
/**
 * 20 days. It is also the cache's gcTime, so it must stay under setTimeout's limit
 * (2^31 − 1 ms, about 24.8 days): a longer timer fires at once and empties the cache.
 */
export const PERSIST_MAX_AGE_MS = 20 * 24 * 3600 * 1000;

/** Drops the oldest queries until the client's JSON fits `maxChars`. */
export function boundedSerialize(client: PersistedClient, maxChars = PERSIST_MAX_CHARS): string {
  let current: PersistedClient | undefined = client;
  let text = JSON.stringify(current);
  while (text.length > maxChars && current && current.clientState.queries.length > 0) {
    current = removeOldestQuery({ persistedClient: current, error: new Error('too large'), errorCount: 1 });
    text = JSON.stringify(current ?? { ...client, clientState: { mutations: [], queries: [] } });
  }
  return text;
}

/** Only settled, successful answers; never the device-only memory keys that are rebuilt anyway. */
export const shouldPersistQuery = (query: Query) => query.state.status === 'success';

/** The IndexedDB persister, or null where there is no IndexedDB (static rendering, tests). */
export function devicePersister(): Persister | null {
  if (typeof (globalThis as { indexedDB?: unknown }).indexedDB === 'undefined') return null;
  return createAsyncStoragePersister({
    key: PERSIST_KEY,
    storage: {
      getItem: (k) => get<string>(k).then((v) => v ?? null),
      setItem: (k, v: string) => set(k, v),
      removeItem: (k) => del(k),
    },
    throttleTime: 1000,
    serialize: (c) => boundedSerialize(c),
  });
}

/**
 * TanStack Query v5 starts out believing it is online and only follows the later
 * online/offline events: a page opened with no signal must say so from the start, so
 * queries pause (and show what is kept) instead of failing.
 */
export function startOnlineFromDevice(): void {
  const nav = (globalThis as { navigator?: { onLine?: boolean } }).navigator;
  if (typeof nav?.onLine === 'boolean') onlineManager.setOnline(nav.onLine);
}
