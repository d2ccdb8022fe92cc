/**
 * The spec importer: CSV text → validated rows → plan → one transaction. The demo
 * library loader and the editors' upload both come through here.
 */
import { createHash } from 'node:crypto';
import { validateSpecCsv, type RowProblem } from '../../../lib/csv';
import { AppDataSource } from '../../db/data-source';
import { AppError } from '../../errors/app-error';
import { ImportBatch, type ImportCounts } from './import-batch.entity';
import { planImport } from './import-plan';
import { applyImport, type Actor } from './import-apply';

export type ImportSummary = { batchId: number | null; counts: ImportCounts; rejected: RowProblem[] };

export const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

/**
 * Validates and commits a whole file at once (no preview): rows that fail validation
 * are reported and skipped; the rest go in one transaction. A file that changes
 * nothing leaves no trace, so loading the same file twice is a no-op.
 */
export async function importCsvNow(text: string, fileName: string, actor: Actor, reason: string): Promise<ImportSummary> {
  const checked = validateSpecCsv(text);
  if (checked.fileErrors.length) {
    throw AppError.unprocessable(`${fileName}: ${checked.fileErrors[0].reason}`, checked.fileErrors.map((e) => ({ path: `line ${e.line}${e.column ? `, ${e.column}` : ''}`, message: e.reason })));
  }
  return AppDataSource.transaction(async (m) => {
    const plan = await planImport(m, checked.accepted);
    const counts: ImportCounts = {
      created: plan.filter((p) => p.action === 'create').length,
      updated: plan.filter((p) => p.action === 'update').length,
      unchanged: plan.filter((p) => p.action === 'unchanged').length,
      rejected: checked.rejected.length,
    };
    if (counts.created + counts.updated === 0) return { batchId: null, counts, rejected: checked.rejected };
    const batch = await m.getRepository(ImportBatch).save({
      fileName, sha256: sha256(text), uploaderId: actor.id, uploaderName: actor.name, counts,
      rowErrors: checked.rejected, status: 'committed', committedAt: new Date(),
    });
    await applyImport(m, plan, actor, { batchId: batch.id, reason });
    return { batchId: batch.id, counts, rejected: checked.rejected };
  });
}
