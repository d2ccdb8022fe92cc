/**
 * The query cache kept on the device (IndexedDB through idb-keyval), so every spec, model
 * sheet, search result, job list and job sheet seen is there with no connection. The key is
 * versioned (a new shape of answers → bump PERSIST_VERSION), what is kept is bounded in size
 * (oldest queries go first) and in age, and only answers that succeeded are kept.
 */
import { get, set, del } from 'idb-keyval';
import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import { removeOldestQuery, type PersistedClient, type Persister } from '@tanstack/react-query-persist-client';
import { dehydrate, onlineManager, type Query, type QueryClient } from '@tanstack/react-query';

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

/** Answers anyone may read: they stay on the device after signing out. */
const PUBLIC_ROOTS = new Set(['models', 'search', 'plans', 'plan', 'columns', 'spec']);

/**
 * What signing out removes from the device: job sheets, proposals, users, imports and any
 * draft an editor opened. A published spec card stays (its revisions go; they refetch).
 */
export function isPrivateQuery(query: { queryKey: readonly unknown[]; state: { data?: unknown } }): boolean {
  const [root, , third] = query.queryKey as unknown[];
  if (!PUBLIC_ROOTS.has(String(root))) return true;
  if (root !== 'spec') return false;
  return third !== undefined || (query.state.data as { status?: string } | undefined)?.status !== 'published';
}

/** Forgets every private answer, and the copy written as the last page went away. */
export function forgetPrivateQueries(queryClient: QueryClient): void {
  queryClient.removeQueries({ predicate: isPrivateQuery });
  syncStorage()?.removeItem(PENDING_KEY);
}

/** Only settled, successful answers; never the device-only memory keys that are rebuilt anyway. */
export const shouldPersistQuery = (query: Query) => query.state.status === 'success';

/** The IndexedDB persister, or null where there is no IndexedDB (static rendering, tests). */
export function devicePersister(): Persister | null {
  if (typeof (globalThis as { indexedDB?: unknown }).indexedDB === 'undefined') return null;
  return createAsyncStoragePersister({
    key: PERSIST_KEY,
    storage: {
      getItem: (k) => get<string>(k).then((v) => newerCopy(v)),
      setItem: (k, v: string) => set(k, v),
      removeItem: (k) => del(k),
    },
    // Short: a page reload (a link opened, the tab restored) right after an answer must not lose it.
    throttleTime: 200,
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

/** Where the cache is written synchronously as the page goes away (see saveWhenPageHides). */
export const PENDING_KEY = `${PERSIST_KEY}.pending`;

type SyncStorage = {
  getItem(k: string): string | null;
  setItem(k: string, v: string): void;
  removeItem(k: string): void;
};
function syncStorage(): SyncStorage | null {
  try {
    return (globalThis as { localStorage?: SyncStorage }).localStorage ?? null;
  } catch {
    return null; // storage disabled by the browser's settings
  }
}

const timestampOf = (text: string | null | undefined): number => {
  if (!text) return -1;
  try {
    return Number((JSON.parse(text) as PersistedClient).timestamp) || -1;
  } catch {
    return -1;
  }
};

/** The newer of the IndexedDB copy and the one written as the last page went away (which is then cleared). */
export function newerCopy(kept: string | null | undefined, storage: SyncStorage | null = syncStorage()): string | null {
  const pending = storage?.getItem(PENDING_KEY) ?? null;
  if (pending !== null) storage?.removeItem(PENDING_KEY);
  return timestampOf(pending) > timestampOf(kept) ? pending : (kept ?? null);
}

/**
 * Saves the cache at once when the page goes away (a reload, a link opened, the tab closed or
 * sent to the background). The persister's IndexedDB writes wait out its throttle and are
 * asynchronous, so an answer that arrived just before would be lost; this copy goes to
 * localStorage, which writes synchronously, and the next start takes whichever copy is newer.
 * Call it only once the kept copy has been restored, or the near-empty cache of a page still
 * starting would win. Returns the clean-up.
 */
export function saveWhenPageHides(queryClient: QueryClient, buster: string): () => void {
  const target = globalThis as unknown as {
    addEventListener?: (type: string, fn: () => void) => void;
    removeEventListener?: (type: string, fn: () => void) => void;
    document?: { visibilityState?: string };
  };
  const storage = syncStorage();
  if (!target.addEventListener || !storage) return () => undefined;
  const save = () => {
    if (target.document?.visibilityState === 'visible') return;
    const client: PersistedClient = {
      timestamp: Date.now(),
      buster,
      clientState: dehydrate(queryClient, { shouldDehydrateQuery: shouldPersistQuery }),
    };
    try {
      storage.setItem(PENDING_KEY, boundedSerialize(client));
    } catch {
      // Over the browser's quota: the IndexedDB copy (at most a throttle behind) stands.
    }
  };
  target.addEventListener('pagehide', save);
  target.addEventListener('visibilitychange', save);
  return () => {
    target.removeEventListener?.('pagehide', save);
    target.removeEventListener?.('visibilitychange', save);
  };
}
