/**
 * Write transactions that InnoDB may pick as a deadlock victim run again, a bounded
 * number of times, after a short random pause. The victim's whole transaction is rolled
 * back (TypeORM's transaction() also rolls back on any error), so running the unit of
 * work again from the start is safe: it must not have effects outside the transaction.
 *
 * Retried: ER_LOCK_DEADLOCK (1213), and ER_AUTOINC_READ_FAILED (1467), which is how
 * MariaDB 10.11 answers the victim when it was waiting for a table's AUTO-INC lock (seen
 * here in SHOW ENGINE INNODB STATUS: two import commits' INSERT … SELECT into `makes`,
 * "WE ROLL BACK TRANSACTION"). Not retried: ER_LOCK_WAIT_TIMEOUT (1205): a lock held for
 * the whole wait is not a collision that a second try avoids, and it would double the wait;
 * the error handler answers it, and deadlocks that outlast the retries, 503 with Retry-After.
 * "Always be prepared to re-issue a transaction if it fails due to deadlock": MySQL
 * Reference Manual, InnoDB, "How to Minimize and Handle Deadlocks".
 */
import type { EntityManager } from 'typeorm';
import { AppDataSource } from './data-source';

const DEADLOCK_CODES = new Set(['ER_LOCK_DEADLOCK', 'ER_AUTOINC_READ_FAILED']);
const LOCK_WAIT_CODES = new Set(['ER_LOCK_WAIT_TIMEOUT']);

/** Tries in all, the first included. */
export const DEADLOCK_ATTEMPTS = 4;

const codeOf = (err: unknown) => {
  const e = err as { code?: unknown; driverError?: { code?: unknown } } | null;
  return String(e?.driverError?.code ?? e?.code ?? '');
};

/** This transaction was chosen as a deadlock victim and rolled back. */
export const isDeadlock = (err: unknown) => DEADLOCK_CODES.has(codeOf(err));

/** A deadlock or a lock wait timeout: the data was busy, the request may succeed if sent again. */
export const isLockContention = (err: unknown) => isDeadlock(err) || LOCK_WAIT_CODES.has(codeOf(err));

/** 10, 20, 40 ms …, each between half and one and a half times that, so two victims do not meet again. */
const pause = (attempt: number) =>
  new Promise((resolve) => setTimeout(resolve, 10 * 2 ** (attempt - 1) * (0.5 + Math.random())));

/** Runs `work`, again after a deadlock, up to `attempts` times in all; any other error is thrown at once. */
export async function retryDeadlocks<T>(work: () => Promise<T>, attempts = DEADLOCK_ATTEMPTS): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await work();
    } catch (err) {
      if (!isDeadlock(err) || attempt >= attempts) throw err;
      await pause(attempt);
    }
  }
}

/** AppDataSource.transaction(fn), retried on deadlocks: the one way to run a multi-row write. */
export function writeTransaction<T>(fn: (m: EntityManager) => Promise<T>): Promise<T> {
  return retryDeadlocks(() => AppDataSource.transaction(fn));
}
