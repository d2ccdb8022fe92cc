/**
 * An express-rate-limit store in MariaDB, so a limit holds across every replica: the
 * counters live in `rate_limits` through rate-limiter-flexible's MySQL store (one
 * upsert per hit, atomic on the row). It borrows connections from the app's own pool,
 * each query bounded like every other (a frozen database fails the call, and the limiter
 * lets the request through to answer 503 itself rather than hang).
 */
import { createHash, randomUUID } from 'node:crypto';
import type { ClientRateLimitInfo, IncrementResponse, Options, Store } from 'express-rate-limit';
import { RateLimiterMySQL, type RateLimiterRes } from 'rate-limiter-flexible';
import { config } from '@/server/config';
import { AppDataSource } from '@/server/db/data-source';
import { isQueryTimeout } from '@/server/db/query-timeout';
import { within } from './lifecycle';

export const RATE_LIMIT_TABLE = 'rate_limits';
/** A hit waits at most this long for the store (common practice, no published source). */
const STORE_TIMEOUT_MS = 2000;

type Callback = (err: Error | null, result?: unknown) => void;
type PoolConnection = {
  query(options: { sql: string; values?: unknown; timeout?: number }, cb: Callback): void;
  release(): void;
  destroy(): void;
};
type CallbackPool = { getConnection(cb: (err: Error | null, conn: PoolConnection) => void): void };

function appPool(): CallbackPool | undefined {
  if (!AppDataSource.isInitialized) return undefined;
  return (AppDataSource.driver as unknown as { pool?: CallbackPool }).pool;
}

/** The app's pool as rate-limiter-flexible's "pool" client, with every query bounded. */
const boundedPool = {
  getConnection(cb: (err: Error | null, conn?: unknown) => void) {
    const pool = appPool();
    if (!pool) return cb(new Error('database not connected'));
    pool.getConnection((err, conn) => (err ? cb(err) : cb(null, bounded(conn))));
  },
};

function bounded(conn: PoolConnection) {
  const query = (sql: string, values?: unknown | Callback, cb?: Callback) => {
    const done = (typeof values === 'function' ? values : cb) as Callback;
    const params = typeof values === 'function' ? undefined : values;
    conn.query({ sql, values: params, timeout: config.DB_QUERY_TIMEOUT_MS }, (err, rows) => {
      // mysql2 leaves a timed-out command on its connection: drop the connection.
      if (isQueryTimeout(err)) conn.destroy();
      done(err, rows);
    });
  };
  return {
    query,
    rollback: () => query('ROLLBACK', () => undefined),
    release: () => conn.release(),
  };
}

/** Keys carry typed text (an e-mail address): hash long ones to fit the key column. */
function storedKey(key: string): string {
  return key.length <= 160 ? key : `h:${createHash('sha256').update(key).digest('base64url')}`;
}

export class MariaDbRateLimitStore implements Store {
  readonly localKeys = false;
  private limiter: RateLimiterMySQL | undefined;
  private windowMs = 60_000;

  constructor(readonly prefix: string) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  private rl(): RateLimiterMySQL {
    this.limiter ??= new RateLimiterMySQL({
      storeClient: boundedPool,
      storeType: 'pool',
      dbName: String(AppDataSource.options.database),
      tableName: RATE_LIMIT_TABLE,
      tableCreated: true, // by the migration: the schema changes only through migrations
      keyPrefix: this.prefix,
      points: 1_000_000_000, // express-rate-limit compares the hits with its own limit
      duration: Math.max(1, Math.ceil(this.windowMs / 1000)),
    });
    return this.limiter;
  }

  private info(res: RateLimiterRes | null): ClientRateLimitInfo | undefined {
    if (!res) return undefined;
    const reset = res.msBeforeNext >= 0 ? new Date(Date.now() + res.msBeforeNext) : undefined;
    return { totalHits: res.consumedPoints, resetTime: reset };
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    return this.info(await within(STORE_TIMEOUT_MS, this.rl().get(storedKey(key))));
  }

  async increment(key: string): Promise<IncrementResponse> {
    const res = await within(STORE_TIMEOUT_MS, this.rl().penalty(storedKey(key), 1));
    return this.info(res) ?? { totalHits: 1, resetTime: new Date(Date.now() + this.windowMs) };
  }

  async decrement(key: string): Promise<void> {
    await within(STORE_TIMEOUT_MS, this.rl().reward(storedKey(key), 1));
  }

  async resetKey(key: string): Promise<void> {
    await within(STORE_TIMEOUT_MS, this.rl().delete(storedKey(key)));
  }
}

/**
 * The store for the limiter called `name`, for the rate-limit factory: MariaDB (shared
 * by every replica), or undefined for express-rate-limit's in-process memory store when
 * RATE_LIMIT_STORE=memory. Under NODE_ENV=test each limiter gets a key space of its own,
 * so every createApp() in a test starts with fresh budgets, as separate processes would
 * not; tests that check sharing build two MariaDbRateLimitStores with one prefix.
 */
export function rateLimitStore(name: string): Store | undefined {
  if (config.RATE_LIMIT_STORE === 'memory') return undefined;
  const scope = config.NODE_ENV === 'test' ? `@${randomUUID().slice(0, 8)}` : '';
  return new MariaDbRateLimitStore(`${name}${scope}`);
}
