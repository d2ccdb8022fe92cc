/**
 * A batch as the import screen shows it: the summary, and its staged rows grouped as
 * created / updated (with field diffs) / unchanged / rejected, one page of each group.
 */
import type {
  ImportBatchSummaryDto,
  ImportPreviewDto,
  ImportPreviewQuery,
  ImportProblemDto,
  ImportRowDto,
  ImportUpdatedRowDto,
} from '@/lib/contracts/imports';
import type { FieldChangeDto } from '@/lib/contracts/curation';
import { formatRange, type CanonicalUnit } from '@/lib/units';
import type { EntityManager } from 'typeorm';
import type { ImportBatch } from './import-batch.entity';
import { PREVIEW_COLUMNS, STAGED_TABLE } from './import-rows';

type StagedRow = {
  line: number;
  specId: number | null;
  make: string;
  model: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
  component: string;
  parameter: string;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
  changes: string | null;
  problems: string | null;
};
type Note = { column: string | null; reason: string };

export function toBatchSummary(b: ImportBatch): ImportBatchSummaryDto {
  return {
    id: b.id,
    fileName: b.fileName,
    sha256: b.sha256,
    fileSize: b.fileSize,
    status: b.status,
    counts: { warnings: 0, ...b.counts },
    uploaderName: b.uploaderName,
    createdAt: b.createdAt.toISOString(),
    committedAt: b.committedAt ? b.committedAt.toISOString() : null,
    committedByName: b.committedByName,
  };
}

const parse = <T>(text: string | null): T[] => (text ? (JSON.parse(text) as T[]) : []);

function toRow(r: StagedRow): ImportRowDto {
  return {
    line: r.line,
    specId: r.specId,
    make: r.make,
    model: r.model,
    yearFrom: r.yearFrom,
    yearTo: r.yearTo,
    variant: r.variant,
    component: r.component,
    parameter: r.parameter,
    display: formatRange(r.min, r.nominal, r.max, r.unit),
    warnings: parse<Note>(r.problems).map((n) => ({ line: r.line, ...n })),
  };
}

/** A committed batch's created rows find their spec by natural key (the commit does not write ids back). */
const CREATED_SPEC = `LEFT JOIN vehicle_models vm ON vm.model_key = st.model_key
  LEFT JOIN components c ON c.model_id = vm.id AND c.name_key = st.component_key
  LEFT JOIN specs s ON s.component_id = c.id AND s.parameter_key = st.parameter_key`;

async function group(
  m: EntityManager,
  batch: ImportBatch,
  action: string,
  page: ImportPreviewQuery,
): Promise<StagedRow[]> {
  const created = action === 'create' && batch.status === 'committed';
  return m.query(
    `SELECT ${PREVIEW_COLUMNS}, ${created ? 's.id' : 'st.spec_id'} AS specId FROM ${STAGED_TABLE} st ${created ? CREATED_SPEC : ''}
      WHERE st.batch_id = ? AND st.action = ? ORDER BY st.line LIMIT ? OFFSET ?`,
    [batch.id, action, page.limit, page.offset],
  );
}

export async function buildPreview(
  m: EntityManager,
  batch: ImportBatch,
  page: ImportPreviewQuery,
): Promise<ImportPreviewDto> {
  const [created, updated, unchanged, rejected] = await Promise.all(
    ['create', 'update', 'unchanged', 'rejected'].map((action) => group(m, batch, action, page)),
  );
  return {
    ...toBatchSummary(batch),
    fileErrors: batch.status === 'failed' ? batch.rowErrors : [],
    created: created.map(toRow),
    updated: updated.map((r): ImportUpdatedRowDto => ({ ...toRow(r), changes: parse<FieldChangeDto>(r.changes) })),
    unchanged: unchanged.map(toRow),
    rejected: rejected.flatMap((r) => parse<Note>(r.problems).map((n): ImportProblemDto => ({ line: r.line, ...n }))),
    page,
  };
}
