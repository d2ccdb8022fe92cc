/**
 * The scheduled cleanup of staged import rows (import_batch_rows), safe with any number of
 * server processes running it at once:
 * - a preview older than PREVIEW_TTL_HOURS, or superseded by a later preview of the same file
 *   (same SHA-256), is closed: claimed with FOR UPDATE SKIP LOCKED (a commit holding the batch
 *   row is skipped, and two cleaners never claim one batch), marked failed with the reason;
 * - the staged rows of committed and closed batches are deleted in small chunks, each DELETE
 *   on its own (deleting rows another process already deleted is harmless);
 * - library_changes rows older than a day are pruned.
 */
import { AppDataSource } from '@/server/db/data-source';
import { pruneLibraryChanges } from '../library/library-changes';
import { STAGED_TABLE } from './import-rows';

export const PREVIEW_TTL_HOURS = 24;
const CHUNK = 5000;
const CLAIM = 50;
const EXPIRED =
  'This preview was closed by the cleanup (older than 24 hours, or replaced by a newer preview of the same file); upload the file again.';

/** Marks expired and superseded previews failed; returns how many. */
async function closeStalePreviews(): Promise<number> {
  return AppDataSource.transaction(async (m) => {
    const rows: { id: number }[] = await m.query(
      `SELECT b.id FROM import_batches b
        WHERE b.status = 'previewed'
          AND (b.created_at < NOW(3) - INTERVAL ? HOUR
               OR EXISTS (SELECT 1 FROM import_batches n WHERE n.sha256 = b.sha256 AND n.id > b.id AND n.status <> 'failed'))
        ORDER BY b.id LIMIT ? FOR UPDATE SKIP LOCKED`,
      [PREVIEW_TTL_HOURS, CLAIM],
    );
    if (rows.length === 0) return 0;
    await m.query(
      `UPDATE import_batches SET status = 'failed', row_errors = ? WHERE id IN (?) AND status = 'previewed'`,
      [JSON.stringify([{ line: 1, column: null, reason: EXPIRED }]), rows.map((r) => r.id)],
    );
    return rows.length;
  });
}

/**
 * Deletes, chunk by chunk, the staged rows no preview will show again; returns how many.
 * The dead batches are read first (a plain read) and their rows deleted a batch at a time
 * through the primary key (batch_id, line): a DELETE whose batch came from a subquery scanned
 * the whole table, locking every row it passed, so it waited on the rows a preview was still
 * staging, and held up that preview's INSERTs meanwhile.
 */
async function deleteDeadRows(): Promise<number> {
  const dead: { id: number }[] = await AppDataSource.query(
    `SELECT b.id FROM import_batches b
      WHERE b.status IN ('committed', 'failed') AND EXISTS (SELECT 1 FROM ${STAGED_TABLE} st WHERE st.batch_id = b.id)
      ORDER BY b.id`,
  );
  let deleted = 0;
  for (const { id } of dead) {
    for (;;) {
      const result = await AppDataSource.query(`DELETE FROM ${STAGED_TABLE} WHERE batch_id = ? LIMIT ?`, [id, CHUNK]);
      const n = Number(result.affectedRows ?? 0);
      deleted += n;
      if (n < CHUNK) break;
    }
  }
  return deleted;
}

export type CleanupReport = { closedPreviews: number; deletedRows: number; prunedChanges: number };

export async function cleanUpImports(): Promise<CleanupReport> {
  const closedPreviews = await closeStalePreviews();
  const deletedRows = await deleteDeadRows();
  const prunedChanges = await pruneLibraryChanges(24);
  return { closedPreviews, deletedRows, prunedChanges };
}

let timer: ReturnType<typeof setInterval> | null = null;

/** Runs the cleanup every `everyMs` (10 minutes) in this process; failures wait for the next run. */
export function startImportCleanup(everyMs = 10 * 60_000) {
  if (timer) return;
  const run = () => void cleanUpImports().catch((err) => console.error('Import cleanup failed:', err));
  timer = setInterval(run, everyMs);
  (timer as unknown as { unref?: () => void }).unref?.();
  (setTimeout(run, 5000) as unknown as { unref?: () => void }).unref?.();
}

export function stopImportCleanup() {
  if (timer) clearInterval(timer);
  timer = null;
}
