/**
 * Revision snapshots: the full values of a spec as one revision left them, built here for
 * the editor, the reverter and the client's revert preview (the importer builds the same
 * object in SQL from the same field list, see server/modules/imports/import-apply.ts), and
 * compared field by field for the history's diffs.
 */
import type { FieldChangeDto } from './curation';
import {
  COLUMN_FIELDS,
  SNAPSHOT_FIELDS,
  SPEC_FIELDS,
  keysWith,
  type SnapshotField,
  type SpecSnapshot,
  type SpecValues,
} from './spec-fields';

export type CitedSource = { id: number; title: string; edition: string };

/** Snapshot property → the cited source's column it comes from. */
export const SNAPSHOT_SOURCE_FIELDS = SPEC_FIELDS.filter(
  (f): f is Extract<typeof f, { key: 'sourceTitle' | 'sourceEdition' }> =>
    f.sourceColumn !== null && SNAPSHOT_FIELDS.includes(f.key as SnapshotField),
);

/**
 * The snapshot of `spec` citing `source`, in the stored key order: the spec's own fields,
 * with the source's id, title and edition just before the page.
 */
export function snapshotOfSpec(
  spec: SpecValues,
  source: Pick<CitedSource, 'id' | 'title' | 'edition'> | null,
): SpecSnapshot {
  const out: Record<string, unknown> = {};
  for (const f of COLUMN_FIELDS) {
    if (f.key === 'sourcePage') {
      out.sourceId = source?.id ?? null;
      for (const s of SNAPSHOT_SOURCE_FIELDS) out[s.key] = source?.[s.sourceColumn as 'title' | 'edition'] ?? null;
    }
    out[f.key] = spec[f.key as keyof SpecValues];
  }
  return out as SpecSnapshot;
}

type Value = string | number | null;
const valueOf = (s: Partial<SpecSnapshot> | null, field: SnapshotField): Value => {
  const v = s?.[field];
  return v === undefined || v === '' ? null : (v as Value);
};

/** Field-by-field differences; against nothing (a first revision) every field that has a value. */
export function diffSnapshots(before: Partial<SpecSnapshot> | null, after: Partial<SpecSnapshot>): FieldChangeDto[] {
  return SNAPSHOT_FIELDS.map((field) => ({
    field,
    before: valueOf(before, field),
    after: valueOf(after, field),
  })).filter((c) => c.before !== c.after);
}

/** Fields a spec always has: a snapshot without them (an old one) keeps the current value. */
const REQUIRED = new Set<string>(keysWith('required'));

/** The values a revert to `snapshot` writes; absent optional fields become null. */
export function valuesOfSnapshot(snapshot: Partial<SpecSnapshot>, current: SpecValues): SpecValues {
  const out: Record<string, unknown> = {};
  for (const f of COLUMN_FIELDS) {
    const key = f.key as keyof SpecValues;
    out[key] = snapshot[key] ?? (REQUIRED.has(key) ? current[key] : null);
  }
  out.sourceId = snapshot.sourceId ?? null;
  return out as SpecValues;
}

/** The value fields of anything that has them (an entity, a request body), empty text as null. */
export function pickValues(from: SpecValues): SpecValues {
  const out: Record<string, unknown> = {};
  for (const f of COLUMN_FIELDS) {
    const v = from[f.key as keyof SpecValues];
    out[f.key] = v === '' ? null : v;
  }
  out.sourceId = from.sourceId;
  return out as SpecValues;
}
