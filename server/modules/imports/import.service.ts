/**
 * The spec importer: bytes → text → records → (validated rows → plan → staged rows, a
 * chunk at a time) = the preview → one transaction (the commit). Editors upload, look at
 * the preview and commit; the demo library loader goes through the same steps at once
 * (importCsvNow).
 */
import { createHash } from 'node:crypto';
import pLimit from 'p-limit';
import type { EntityManager } from 'typeorm';
import {
  SpecCsvValidator,
  checkCsvBytes,
  decodeCsv,
  parseSpecCsvDetailed,
  validateSpecCsv,
  type AcceptedRow,
  type RowProblem,
  type ValidatedCsv,
} from '@/lib/csv';
import { MAX_CSV_ROWS, eachSpecCsvChunk } from '@/lib/csv/parse';
import type { ImportBatchSummaryDto, ImportPreviewDto, ImportPreviewQuery } from '@/lib/contracts/imports';
import { AppDataSource } from '@/server/db/data-source';
import { writeTransaction } from '@/server/db/deadlock-retry';
import { AppError } from '@/server/errors/app-error';
import { lastRevisionId, markLibraryChanged, recordImportChanges } from '../library/library-changes';
import { ImportBatch, type ImportCounts } from './import-batch.entity';
import { planImport, type PlannedRow } from './import-plan';
import { applyImport, type Actor } from './import-apply';
import { byLine, stageRows, Stager } from './import-stage';
import { buildPreview, toBatchSummary } from './import-preview';

export type ImportSummary = { batchId: number | null; counts: ImportCounts; rejected: RowProblem[] };
export type Upload = { fileName: string; bytes: Uint8Array };

export const sha256 = (data: string | Uint8Array) => createHash('sha256').update(data).digest('hex');
const FIRST_PAGE: ImportPreviewQuery = { offset: 0, limit: 1000 };

/** `line 3, column min`: where a problem is, as the 422 `errors[].path` says it. */
export const problemPath = (p: RowProblem) => `line ${p.line}${p.column ? `, column ${p.column}` : ''}`;

const COUNTED = { create: 'created', update: 'updated', unchanged: 'unchanged' } as const;
const noCounts = (): ImportCounts => ({ created: 0, updated: 0, unchanged: 0, rejected: 0, warnings: 0 });

/** Adds planned rows (a whole file, or one chunk of it) and their warnings into `counts`. */
function addCounts(counts: ImportCounts, plan: PlannedRow[], accepted: AcceptedRow[]): ImportCounts {
  for (const p of plan) counts[COUNTED[p.action]] += 1;
  counts.warnings = (counts.warnings ?? 0) + accepted.reduce((sum, a) => sum + a.warnings.length, 0);
  return counts;
}

function countsOf(plan: PlannedRow[], checked: ValidatedCsv): ImportCounts {
  return { ...addCounts(noCounts(), plan, checked.accepted), rejected: checked.rejectedRows };
}

/** Stores the planned rows with a new batch, inside the caller's transaction. */
async function stageBatch(
  m: EntityManager,
  checked: ValidatedCsv,
  plan: PlannedRow[],
  fields: Partial<ImportBatch>,
): Promise<ImportBatch> {
  const batch = await m
    .getRepository(ImportBatch)
    .save({ ...fields, counts: countsOf(plan, checked), rowErrors: [], status: 'previewed' as const });
  const warnings = new Map(checked.accepted.map((a) => [a.line, a.warnings]));
  await stageRows(m, batch.id, plan, warnings, byLine(checked.rejected));
  return batch;
}

const uploaderOf = (upload: Upload, actor: Actor) => ({
  fileName: upload.fileName.slice(0, 255),
  sha256: sha256(upload.bytes),
  fileSize: upload.bytes.byteLength,
  uploaderId: actor.id,
  uploaderName: actor.name,
});

/** Problems kept and answered for a file that cannot be read (one per line at most; the first ones say enough). */
const MAX_FILE_ERRORS = 200;

/** A file that cannot be previewed leaves a failed batch (for the record) and answers 422. */
async function rejectFile(upload: Upload, actor: Actor, fileErrors: RowProblem[]): Promise<never> {
  const kept = fileErrors.slice(0, MAX_FILE_ERRORS);
  const batch = await AppDataSource.getRepository(ImportBatch).save({
    ...uploaderOf(upload, actor),
    counts: { created: 0, updated: 0, unchanged: 0, rejected: 0, warnings: 0 },
    rowErrors: kept,
    status: 'failed',
  });
  const more =
    fileErrors.length > kept.length ? ` (${fileErrors.length} problems; the first ${kept.length} are listed)` : '';
  const errors = kept.map((e) => ({ path: problemPath(e), message: e.reason }));
  throw new AppError(422, 'unprocessable', `${upload.fileName} cannot be imported: ${fileErrors[0].reason}${more}.`, {
    errors,
    batchId: batch.id,
  });
}

/** 413 for a file over the row limit (MAX_CSV_ROWS): nothing of it is staged. */
const tooManyRows = (upload: Upload, fileErrors: RowProblem[]) =>
  new AppError(413, 'payload_too_large', `${upload.fileName} cannot be imported: ${fileErrors[0].reason}.`, {
    limit: MAX_CSV_ROWS,
  });

/**
 * Rows validated, planned and staged at a time: the row objects of one chunk only are alive
 * at once. Smaller chunks kept the heap lower (a 50 000-row preview peaked at 260–340 MB RSS
 * with 500, 410–450 MB with 2 000) at about the same speed.
 */
const PREVIEW_CHUNK = 500;

/**
 * Previews that run at once in one server process; later uploads wait their turn. Each one
 * holds two connections (its transaction, and the pool's for the reads that plan it) and a
 * chunk's memory, so a burst of uploads can neither drain the pool (a transaction waiting for
 * a second connection that other waiting transactions hold) nor add up to the server's memory.
 */
export const PREVIEWS_AT_ONCE = 2;
const previewTurn = pLimit(PREVIEWS_AT_ONCE);

/**
 * Upload → preview. Nothing is written but the batch and its staged rows, in one transaction.
 * The file's records are checked first without keeping them (file-level problems and the row
 * limit refuse it before anything is staged); then a second read hands the rows over a chunk
 * at a time, each validated, planned against the library and staged before the next is read,
 * so the server never holds every row's objects.
 */
export function previewImport(upload: Upload, actor: Actor, page = FIRST_PAGE): Promise<ImportPreviewDto> {
  return previewTurn(() => previewNow(upload, actor, page));
}

async function previewNow(upload: Upload, actor: Actor, page: ImportPreviewQuery): Promise<ImportPreviewDto> {
  const encoding = checkCsvBytes(upload.bytes);
  if (encoding) return rejectFile(upload, actor, [encoding]);
  const batch = await writeTransaction(async (m) => {
    // Inside the transaction, so that a retried transaction reads the file afresh.
    const text = decodeCsv(upload.bytes);
    const parsed = parseSpecCsvDetailed(text, MAX_CSV_ROWS, { keepRows: false });
    if (parsed.tooManyRows) throw tooManyRows(upload, parsed.fileErrors);
    if (parsed.fileErrors.length) return parsed.fileErrors;
    const batch = await m
      .getRepository(ImportBatch)
      .save({ ...uploaderOf(upload, actor), counts: noCounts(), rowErrors: [], status: 'previewed' as const });
    const validator = new SpecCsvValidator(parsed);
    const stager = new Stager(m, batch.id);
    const counts = noCounts();
    // A chunk's staging INSERTs run in MariaDB while the next chunk is read and validated here.
    let staging: Promise<void> = Promise.resolve();
    await eachSpecCsvChunk(text, PREVIEW_CHUNK, async (rows) => {
      const accepted: AcceptedRow[] = [];
      for (const { line, raw } of rows) {
        const row = validator.check(line, raw);
        if (row) accepted.push(row);
      }
      // Planned through the pool, not the transaction's connection: that read then runs in
      // MariaDB beside the previous chunk's INSERTs instead of queueing behind them. The
      // preview writes nothing the plan reads; the commit checks each spec's version.
      const plan = await planImport(AppDataSource.manager, accepted);
      addCounts(counts, plan, accepted);
      await staging;
      staging = stager.planned(plan, new Map(accepted.map((a) => [a.line, a.warnings])));
      // Awaited on the next chunk or below; until then a failure must not count as unhandled.
      staging.catch(() => undefined);
    });
    await staging;
    const { rejected, rejectedRows } = validator.finish();
    await stager.rejected(byLine(rejected));
    batch.counts = { ...counts, rejected: rejectedRows };
    await m.getRepository(ImportBatch).update(batch.id, { counts: batch.counts });
    return batch;
  });
  if (Array.isArray(batch)) return rejectFile(upload, actor, batch);
  return buildPreview(AppDataSource.manager, batch, page);
}

export async function getImportPreview(id: number, page: ImportPreviewQuery): Promise<ImportPreviewDto> {
  const batch = await AppDataSource.getRepository(ImportBatch).findOneBy({ id });
  if (!batch) throw AppError.notFound('import', id);
  return buildPreview(AppDataSource.manager, batch, page);
}

export async function listImports(limit: number): Promise<ImportBatchSummaryDto[]> {
  const batches = await AppDataSource.getRepository(ImportBatch).find({
    order: { createdAt: 'DESC', id: 'DESC' },
    take: limit,
  });
  return batches.map(toBatchSummary);
}

async function commitLocked(
  m: EntityManager,
  id: number,
  actor: Actor,
  reason: string | undefined,
): Promise<ImportBatch> {
  const batch = await m.getRepository(ImportBatch).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!batch) throw AppError.notFound('import', id);
  if (batch.status === 'committed') {
    throw AppError.conflict(
      `Import #${id} was already committed${batch.committedByName ? ` by ${batch.committedByName}` : ''}; a batch commits once.`,
      { batch: toBatchSummary(batch) },
    );
  }
  if (batch.status === 'failed')
    throw AppError.unprocessable(
      `Import #${id} failed validation, so there is nothing to commit. Fix the file and upload it again.`,
    );
  batch.reason = reason ?? `CSV import of ${batch.fileName}`;
  const revisionsBefore = await lastRevisionId(m);
  await applyImport(m, id, actor, batch.reason, batch.counts);
  await recordImportChanges(m, id, revisionsBefore);
  Object.assign(batch, {
    status: 'committed',
    committedAt: new Date(),
    committedById: actor.id,
    committedByName: actor.name,
  });
  return m.getRepository(ImportBatch).save(batch);
}

/**
 * Writes every accepted row and one revision per changed spec, in one transaction, once.
 * Two commits creating the same new makes can deadlock in InnoDB; the victim runs again
 * and then finds the other's specs (409) or nothing in its way.
 */
export async function commitImport(id: number, actor: Actor, reason?: string): Promise<ImportBatchSummaryDto> {
  const batch = await writeTransaction((m) => commitLocked(m, id, actor, reason));
  if (batch.counts.created + batch.counts.updated > 0) markLibraryChanged();
  return toBatchSummary(batch);
}

/**
 * Validates and commits a whole file at once (no preview): rows that fail validation are
 * reported and skipped; the rest go in one transaction. A file that changes nothing leaves
 * no trace, so loading the same file twice is a no-op. With `createOnly`, specs the library
 * already has are left as they are (the demo loader must not undo editors' changes).
 */
export async function importCsvNow(
  text: string,
  fileName: string,
  actor: Actor,
  reason: string,
  options: { createOnly?: boolean } = {},
): Promise<ImportSummary> {
  const checked = validateSpecCsv(text);
  if (checked.fileErrors.length) {
    throw AppError.unprocessable(
      `${fileName}: ${checked.fileErrors[0].reason}`,
      checked.fileErrors.map((e) => ({ path: problemPath(e), message: e.reason })),
    );
  }
  const summary = await writeTransaction(async (m): Promise<ImportSummary> => {
    const plan = (await planImport(m, checked.accepted)).map((p) =>
      options.createOnly && p.action === 'update' ? { ...p, action: 'unchanged' as const, changes: [] } : p,
    );
    const counts = countsOf(plan, checked);
    if (counts.created + counts.updated === 0) return { batchId: null, counts, rejected: checked.rejected };
    const batch = await stageBatch(m, checked, plan, {
      ...uploaderOf({ fileName, bytes: Buffer.from(text, 'utf8') }, actor),
      reason,
    });
    const revisionsBefore = await lastRevisionId(m);
    await applyImport(m, batch.id, actor, reason, counts);
    await recordImportChanges(m, batch.id, revisionsBefore);
    await m.getRepository(ImportBatch).update(batch.id, {
      status: 'committed',
      committedAt: new Date(),
      committedById: actor.id,
      committedByName: actor.name,
    });
    return { batchId: batch.id, counts, rejected: checked.rejected };
  });
  if (summary.batchId !== null) markLibraryChanged();
  return summary;
}
