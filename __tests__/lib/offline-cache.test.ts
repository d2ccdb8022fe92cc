/** The offline parts without a browser: how old the kept copy is, the persisted cache's bound, what ends a session. */
import type { PersistedClient } from '@tanstack/react-query-persist-client';
import { ApiError } from '@/lib/api/client';
import {
  PENDING_KEY,
  PERSIST_MAX_AGE_MS,
  boundedSerialize,
  isPrivateQuery,
  newerCopy,
} from '@/lib/offline/query-persist';
import { offlineLine, savedAgo } from '@/lib/offline/saved-age';
import { isSessionRefused } from '@/lib/session/offline-session';

const NOW = Date.UTC(2026, 11, 2, 12, 0, 0);

describe('savedAgo / offlineLine', () => {
  it.each([
    [10_000, 'just now'],
    [5 * 60_000, '5 min ago'],
    [2 * 3600_000, '2 h ago'],
    [3 * 24 * 3600_000, '3 days ago'],
  ])('%d ms old reads "%s"', (age, words) => {
    expect(savedAgo(NOW - age, NOW)).toBe(words);
  });
  it('says what the screen shows offline, in one line', () => {
    expect(offlineLine(NOW - 2 * 3600_000, NOW)).toBe('Offline — showing what was saved 2 h ago');
    expect(offlineLine(null, NOW)).toBe('Offline — nothing is saved on this device yet');
  });
});

function client(n: number): PersistedClient {
  return {
    timestamp: NOW,
    buster: 'v1',
    clientState: {
      mutations: [],
      queries: Array.from({ length: n }, (_, i) => ({
        dehydratedAt: NOW,
        queryKey: ['spec', i],
        queryHash: `["spec",${i}]`,
        state: { data: 'x'.repeat(1000), dataUpdatedAt: NOW - (n - i) * 1000 } as never,
      })) as PersistedClient['clientState']['queries'],
    },
  };
}

describe('boundedSerialize', () => {
  it('when the cache fits, keeps every query', () => {
    expect(JSON.parse(boundedSerialize(client(5), 100_000)).clientState.queries).toHaveLength(5);
  });
  it('when it does not fit, drops the oldest queries first until it does', () => {
    const text = boundedSerialize(client(50), 20_000);
    const kept = JSON.parse(text).clientState.queries as { queryKey: [string, number] }[];
    expect(text.length).toBeLessThanOrEqual(20_000);
    expect(kept.length).toBeGreaterThan(0);
    expect(kept[kept.length - 1].queryKey[1]).toBe(49);
    expect(kept[0].queryKey[1]).toBe(50 - kept.length);
  });
  it('keeps the cache time under setTimeout’s limit (a longer gcTime empties the cache at once)', () => {
    expect(PERSIST_MAX_AGE_MS).toBeLessThan(2 ** 31 - 1);
  });
});

describe('isSessionRefused', () => {
  it('a network fault, a timeout, a rate limit or a server fault is not a sign-out', () => {
    for (const err of [
      new TypeError('Failed to fetch'),
      new ApiError(503, 'x', 'x'),
      new ApiError(408, 'x', 'x'),
      new ApiError(429, 'x', 'x'),
    ])
      expect(isSessionRefused(err)).toBe(false);
  });
  it('the server refusing the refresh (401, 403) ends the session', () => {
    expect(isSessionRefused(new ApiError(401, 'x', 'x'))).toBe(true);
    expect(isSessionRefused(new ApiError(403, 'x', 'x'))).toBe(true);
  });
});

/** A localStorage stand-in. */
function memoryStorage(initial: Record<string, string> = {}) {
  const items = new Map(Object.entries(initial));
  return {
    getItem: (k: string) => items.get(k) ?? null,
    setItem: (k: string, v: string) => void items.set(k, v),
    removeItem: (k: string) => void items.delete(k),
    has: (k: string) => items.has(k),
  };
}
const copyAt = (timestamp: number) =>
  JSON.stringify({ timestamp, buster: 'v1', clientState: { mutations: [], queries: [] } });

describe('newerCopy: the copy written as the page went away, or the IndexedDB one', () => {
  it('takes the page-hide copy when it is newer, and clears it', () => {
    const storage = memoryStorage({ [PENDING_KEY]: copyAt(NOW) });
    expect(newerCopy(copyAt(NOW - 500), storage)).toBe(copyAt(NOW));
    expect(storage.has(PENDING_KEY)).toBe(false);
  });
  it('keeps the IndexedDB copy when it is newer (written after the page came back)', () => {
    const storage = memoryStorage({ [PENDING_KEY]: copyAt(NOW - 500) });
    expect(newerCopy(copyAt(NOW), storage)).toBe(copyAt(NOW));
    expect(storage.has(PENDING_KEY)).toBe(false);
  });
  it('with no page-hide copy, or a broken one, the IndexedDB copy (or nothing) stands', () => {
    expect(newerCopy(copyAt(NOW), memoryStorage())).toBe(copyAt(NOW));
    expect(newerCopy(undefined, memoryStorage())).toBeNull();
    expect(newerCopy(copyAt(NOW), memoryStorage({ [PENDING_KEY]: '{not json' }))).toBe(copyAt(NOW));
    expect(newerCopy(null, memoryStorage({ [PENDING_KEY]: copyAt(NOW) }))).toBe(copyAt(NOW));
  });
});

describe('isPrivateQuery: what signing out removes from the device', () => {
  const q = (queryKey: unknown[], data?: unknown) => ({ queryKey, state: { data } });
  it.each([
    [['jobs', 'open', '']],
    [['job', 4]],
    [['runs', 4]],
    [['corrections', 'summary']],
    [['users', '']],
    [['imports', 'list']],
    [['last-job']],
  ])('%j is private', (key) => expect(isPrivateQuery(q(key))).toBe(true));
  it('the library stays: models, search, plans and published spec cards', () => {
    expect(isPrivateQuery(q(['models']))).toBe(false);
    expect(isPrivateQuery(q(['models', 3]))).toBe(false);
    expect(isPrivateQuery(q(['search', 'coil']))).toBe(false);
    expect(isPrivateQuery(q(['plans', null, null, '']))).toBe(false);
    expect(isPrivateQuery(q(['spec', 7], { status: 'published' }))).toBe(false);
  });
  it('a draft an editor opened, and revision lists, go', () => {
    expect(isPrivateQuery(q(['spec', 7], { status: 'draft' }))).toBe(true);
    expect(isPrivateQuery(q(['spec', 7, 'revisions'], {}))).toBe(true);
  });
});
