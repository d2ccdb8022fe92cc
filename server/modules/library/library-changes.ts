/**
 * The library's change log. Every write path records the specs it changed in
 * `library_changes`, inside its own transaction (recordSpecChange, recordImportChanges),
 * so a change is logged exactly when it commits. Every process follows the log
 * (library-follower.ts) to update its search index and drop spec-card cache entries.
 * markLibraryChanged() is the local nudge after a commit: this process's followers poll at
 * once instead of waiting for their next tick.
 */
import type { EntityManager } from 'typeorm';
import { AppDataSource } from '@/server/db/data-source';

let generation = 0;
const listeners = new Set<() => void>();

export function markLibraryChanged() {
  generation += 1;
  for (const listener of listeners) listener();
}

export const libraryGeneration = () => generation;

export function onLibraryChanged(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** Logs one changed spec (created, edited, reverted, accepted correction) in the caller's transaction. */
export async function recordSpecChange(m: EntityManager, specId: number): Promise<void> {
  await m.query('INSERT INTO library_changes (spec_id) VALUES (?)', [specId]);
}

/** The newest revision's id: an import commit's revisions all come after it (see recordImportChanges). */
export async function lastRevisionId(m: EntityManager): Promise<number> {
  const [row] = await m.query('SELECT COALESCE(MAX(id), 0) AS id FROM spec_revisions');
  return Number(row.id);
}

/**
 * Logs every spec an import commit wrote, set-based, in the commit's transaction: the
 * revisions after `afterRevisionId` that name the batch (a range of the primary key).
 */
export async function recordImportChanges(m: EntityManager, batchId: number, afterRevisionId: number): Promise<void> {
  await m.query(
    `INSERT INTO library_changes (spec_id)
     SELECT spec_id FROM spec_revisions WHERE id > ? AND origin = 'import' AND origin_ref = ? ORDER BY id`,
    [afterRevisionId, `batch #${batchId}`],
  );
}

export type LibraryChange = { id: number; specId: number };

/** The last change's id (0 for an empty log). */
export async function lastChangeId(): Promise<number> {
  const [row] = await AppDataSource.query('SELECT COALESCE(MAX(id), 0) AS id FROM library_changes');
  return Number(row.id);
}

/** The oldest change still kept, or null: a follower behind it must rebuild rather than replay. */
export async function firstChangeId(): Promise<number | null> {
  const [row] = await AppDataSource.query('SELECT MIN(id) AS id FROM library_changes');
  return row.id === null ? null : Number(row.id);
}

export async function changesAfter(id: number, limit: number): Promise<LibraryChange[]> {
  const rows: { id: string | number; specId: number }[] = await AppDataSource.query(
    'SELECT id, spec_id AS specId FROM library_changes WHERE id > ? ORDER BY id LIMIT ?',
    [id, limit],
  );
  return rows.map((r) => ({ id: Number(r.id), specId: Number(r.specId) }));
}

/** Drops log rows older than `hours` (followers that far behind rebuild in full). */
export async function pruneLibraryChanges(hours: number): Promise<number> {
  const result = await AppDataSource.query(
    'DELETE FROM library_changes WHERE created_at < NOW(3) - INTERVAL ? HOUR LIMIT 50000',
    [hours],
  );
  return Number(result.affectedRows ?? 0);
}
