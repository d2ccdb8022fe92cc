/**
 * Bounded queries. TypeORM passes `maxQueryExecutionTime` to mysql2 as a per-query
 * timeout (enableQueryTimeout), so a database that stops answering (a frozen or
 * partitioned server keeps its TCP sockets open) fails the query instead of hanging the
 * request. mysql2 leaves the timed-out command on its connection, so that connection is
 * destroyed here: the pool then opens a fresh one (bounded by connectTimeout) rather
 * than handing a stuck one to the next request. The server side bounds statements too
 * (the app account's MAX_STATEMENT_TIME, scripts/lib.sh), which aborts a slow statement
 * and keeps the connection healthy.
 */
import type { Logger, QueryRunner } from 'typeorm';

type WithConnection = QueryRunner & { databaseConnection?: { destroy?: () => void } };

const TIMED_OUT = 'PROTOCOL_SEQUENCE_TIMEOUT';

export function isQueryTimeout(err: unknown): boolean {
  const e = err as { code?: string; driverError?: { code?: string } } | undefined;
  return e?.code === TIMED_OUT || e?.driverError?.code === TIMED_OUT;
}

/** TypeORM's logger hook, quiet otherwise (as `logging: false` was). */
export class QueryTimeoutLogger implements Logger {
  logQuery() {}
  logQuerySlow() {}
  logSchemaBuild() {}
  logMigration() {}
  log() {}
  logQueryError(error: unknown, _query: string, _parameters?: unknown[], queryRunner?: QueryRunner) {
    if (!isQueryTimeout(error)) return;
    try {
      (queryRunner as WithConnection | undefined)?.databaseConnection?.destroy?.();
    } catch {
      // Already gone: nothing to free.
    }
  }
}
