/** The offline parts without a browser: how old the kept copy is, the persisted cache's bound, what ends a session. */
import type { PersistedClient } from '@tanstack/react-query-persist-client';
import { ApiError } from '@/lib/api/client';
import { boundedSerialize, PERSIST_MAX_AGE_MS } from '@/lib/offline/query-persist';
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
