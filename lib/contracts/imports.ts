/**
 * CSV import (upload → preview → commit) and export: query and body schemas and the
 * response shapes, shared by the server and the import screen.
 */
import { z } from 'zod';
import type { ImportStatus } from './enums';
import { Reason, type FieldChangeDto } from './curation';
import { safeText } from './text';

const count = (name: string, max: number, fallback: number) =>
  z.coerce
    .number({ error: `${name} must be a number` })
    .int(`${name} must be a whole number`)
    .min(name === 'offset' ? 0 : 1, `${name} is too small`)
    .max(max, `${name} must be at most ${max}`)
    .default(fallback);

/** GET /api/imports */
export const ImportListQuery = z.object({ limit: count('limit', 100, 20) });
export type ImportListQuery = z.infer<typeof ImportListQuery>;

/** POST /api/imports and GET /api/imports/:id: each group lists rows offset … offset + limit − 1. */
export const ImportPreviewQuery = z.object({
  offset: count('offset', 1_000_000, 0),
  limit: count('limit', 5000, 1000),
});
export type ImportPreviewQuery = z.infer<typeof ImportPreviewQuery>;

/** POST /api/imports/:id/commit: the reason every revision of this commit records. */
export const ImportCommitBody = z.object({ reason: Reason.optional() }).strict();
export type ImportCommitBody = z.infer<typeof ImportCommitBody>;

/** GET /api/exports/specs.csv: the whole published library, one make, or one model. */
export const ExportQuery = z
  .object({
    make: safeText(120, { label: 'make' }).min(1, 'make must not be empty').optional(),
    modelId: z.coerce.number({ error: 'modelId must be a number' }).int().positive().max(2_147_483_647).optional(),
  })
  .refine((q) => !(q.make && q.modelId), { message: 'give make or modelId, not both', path: ['modelId'] });
export type ExportQuery = z.infer<typeof ExportQuery>;

export type ImportCountsDto = {
  created: number;
  updated: number;
  unchanged: number;
  rejected: number;
  warnings: number;
};

export type ImportBatchSummaryDto = {
  id: number;
  fileName: string;
  sha256: string;
  fileSize: number;
  status: ImportStatus;
  counts: ImportCountsDto;
  uploaderName: string;
  createdAt: string;
  committedAt: string | null;
  committedByName: string | null;
};

/** A problem or warning in a file: `line` is the physical line (the header is line 1). */
export type ImportProblemDto = { line: number; column: string | null; reason: string };

export type ImportRowDto = {
  line: number;
  /** The spec the row matched (update / unchanged) or created (after commit). */
  specId: number | null;
  make: string;
  model: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
  component: string;
  parameter: string;
  /** The row's limits as the library shows them, e.g. '2.4–3.2 Ω'. */
  display: string;
  /** Valid but unusual values: accepted, with a note to check. */
  warnings: ImportProblemDto[];
};

export type ImportUpdatedRowDto = ImportRowDto & { changes: FieldChangeDto[] };

export type ImportPreviewDto = ImportBatchSummaryDto & {
  /** Problems with the file as a whole (a failed batch); empty otherwise. */
  fileErrors: ImportProblemDto[];
  created: ImportRowDto[];
  updated: ImportUpdatedRowDto[];
  unchanged: ImportRowDto[];
  rejected: ImportProblemDto[];
  /** Which slice of each group is listed; `counts` has the totals. */
  page: { offset: number; limit: number };
};

export type ColumnReferenceDto = { column: string; required: boolean; description: string; example: string }[];
