/**
 * A spec's value fields, written out once. Everything that lists them derives from
 * SPEC_FIELDS: the revision snapshot and its diffs (spec-snapshot.ts), the CSV columns
 * (lib/csv/columns.ts), the staged import rows and the commit's SQL, the editor's form
 * and diff labels, the edit merge and the revert. Adding a field means: a line here (and
 * in SpecValues), a migration for the `specs` and `import_batch_rows` columns, and tests.
 *
 * The make, model, years, variant and component are not value fields: they place a spec
 * in the library (lib/csv/columns.ts IDENTITY_COLUMNS).
 */
import { MATERIALS, SPEC_STATUSES, type CanonicalUnit, type Material, type SpecStatus } from './enums';

/** The values a write sets (the component and identity of a spec never change). */
export type SpecValues = {
  parameter: string;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
  refTempC: number | null;
  material: Material;
  testPoints: string | null;
  conditions: string | null;
  notes: string | null;
  sourceId: number | null;
  sourcePage: string | null;
  status: SpecStatus;
};

/** The values of a spec as one revision left them (append-only history), with its cited source. */
export type SpecSnapshot = SpecValues & { sourceTitle: string | null; sourceEdition: string | null };

/** How a field's value is typed, written in CSV and edited. */
export type SpecFieldKind = 'number' | 'text' | 'enum' | 'unit';

/** What else a field takes part in (see FieldDef.flags). */
export type FieldFlag =
  | 'snapshot' // in the revision snapshot and the history's diffs
  | 'imported' // compared by the import plan: a CSV row that differs here updates the spec
  | 'editable' // set directly by PATCH /api/specs/:id (the editor's form fields)
  | 'reviewed' // shown in a correction's three-way review
  | 'required' // a spec always has a value (never null)
  | 'csvRequired' // the CSV cell must not be empty
  | 'csvLast' // written after every other CSV column (free text that closes a record)
  | 'csvEmptyIsNull'; // an empty CSV cell reads as null rather than ''

/** How a value is checked, in the CSV importer and the editor's request schemas alike. */
export type FieldRule = {
  /** Text: the most characters allowed. */
  maxLength?: number;
  /** Text: may span lines. */
  multiline?: boolean;
  /** Number: the lowest and highest value allowed, and the unit that follows them in messages. */
  range?: readonly [number, number, string];
  /** Enum: the values allowed. */
  values?: readonly string[];
};

type Place<C extends string> = {
  /** Column in `specs` and in `import_batch_rows`; absent for the cited source's own fields. */
  column?: string;
  /** The `sources` column this field shows, for fields that live on the cited source. */
  sourceColumn?: 'title' | 'edition' | 'url';
  /** Column in the CSV import format; absent when the format does not carry the field. */
  csv?: C;
};

export type FieldDef<
  K extends string = string,
  F extends FieldFlag = FieldFlag,
  Kind extends SpecFieldKind = SpecFieldKind,
  C extends string | null = string | null,
> = {
  /** Property name in SpecValues / the snapshot, the DTOs and the request bodies. */
  key: K;
  /** Plain name in diffs, previews, the conflict view and the review. */
  label: string;
  kind: Kind;
  column: string | null;
  sourceColumn: 'title' | 'edition' | 'url' | null;
  csv: C;
  flags: readonly F[];
  rule: FieldRule;
};

const field = <
  const K extends keyof SpecSnapshot | 'sourceUrl',
  const Kind extends SpecFieldKind,
  const F extends FieldFlag,
  const C extends string = never,
>(
  key: K,
  label: string,
  kind: Kind,
  at: Place<C>,
  flags: readonly F[],
  rule: FieldRule = {},
): FieldDef<K, F, Kind, [C] extends [never] ? null : C> => ({
  key,
  label,
  kind,
  column: at.column ?? null,
  sourceColumn: at.sourceColumn ?? null,
  csv: (at.csv ?? null) as [C] extends [never] ? null : C,
  flags,
  rule,
});

const ALL = ['snapshot', 'imported', 'editable', 'reviewed'] as const;
const WINDING_TEMP = [-40, 200, ' °C'] as const;
const LINE = { maxLength: 120 };
const SOURCE_LINE = { maxLength: 200 };
const PARAGRAPH = { maxLength: 1000, multiline: true };

/** In the order the history, the diffs and the forms list them. */
// prettier-ignore
export const SPEC_FIELDS = [
  field('parameter', 'Parameter', 'text', { column: 'parameter', csv: 'parameter' }, ['snapshot', 'editable', 'required', 'csvRequired'], LINE),
  field('min', 'Minimum', 'number', { column: 'min_value', csv: 'min' }, ALL),
  field('nominal', 'Nominal', 'number', { column: 'nominal_value', csv: 'nominal' }, ALL),
  field('max', 'Maximum', 'number', { column: 'max_value', csv: 'max' }, ALL),
  field('unit', 'Unit', 'unit', { column: 'unit', csv: 'unit' }, [...ALL, 'required', 'csvRequired']),
  field('refTempC', 'Reference °C', 'number', { column: 'ref_temp_c', csv: 'ref_temp_c' }, ALL, { range: WINDING_TEMP }),
  field('material', 'Winding', 'enum', { column: 'material', csv: 'material' }, [...ALL, 'required'], { values: MATERIALS }),
  field('testPoints', 'Test points', 'text', { column: 'test_points', csv: 'test_points' }, ALL, PARAGRAPH),
  field('conditions', 'Conditions', 'text', { column: 'conditions', csv: 'conditions' }, ALL, PARAGRAPH),
  field('notes', 'Notes', 'text', { column: 'notes', csv: 'notes' }, ['snapshot', 'imported', 'editable', 'csvLast'], PARAGRAPH),
  field('sourceTitle', 'Source title', 'text', { sourceColumn: 'title', csv: 'source_title' }, ['snapshot', 'imported', 'csvRequired'], SOURCE_LINE),
  field('sourceEdition', 'Source edition', 'text', { sourceColumn: 'edition', csv: 'source_edition' }, ['snapshot', 'imported'], SOURCE_LINE),
  field('sourcePage', 'Source page', 'text', { column: 'source_page', csv: 'source_page' }, ['snapshot', 'imported', 'csvRequired'], SOURCE_LINE),
  field('sourceUrl', 'Source link', 'text', { sourceColumn: 'url', csv: 'source_url' }, ['csvEmptyIsNull'], { maxLength: 500 }),
  field('status', 'Status', 'enum', { column: 'status' }, ['snapshot', 'editable', 'required'], { values: SPEC_STATUSES }),
];

export type SpecField = (typeof SPEC_FIELDS)[number];
export type SpecFieldKey = SpecField['key'];

/** Every snapshot property is in the list (sourceId is internal: the title and edition show it). */
type Unlisted = Exclude<keyof SpecSnapshot, SpecFieldKey | 'sourceId'>;
const everyFieldListed: [Unlisted] extends [never] ? true : Unlisted = true;
void everyFieldListed;

/** The keys of the fields that carry `flag`, as a type. */
export type KeysWith<Flag extends FieldFlag> = SpecField extends infer S
  ? S extends FieldDef<infer K, infer F, SpecFieldKind, string | null>
    ? Flag extends F
      ? K
      : never
    : never
  : never;

export const hasFlag = (f: FieldDef, flag: FieldFlag) => (f.flags as readonly string[]).includes(flag);
export const keysWith = <Flag extends FieldFlag>(flag: Flag) =>
  SPEC_FIELDS.filter((f) => hasFlag(f, flag)).map((f) => f.key) as KeysWith<Flag>[];

/** The fields a history shows, in order; sourceId is internal (title and edition show it). */
export const SNAPSHOT_FIELDS = keysWith('snapshot');
export type SnapshotField = (typeof SNAPSHOT_FIELDS)[number];

/** The fields PATCH may change directly, in the order the conflict view lists them (the source is one more). */
export const EDITABLE_FIELDS = keysWith('editable');
export type EditableField = (typeof EDITABLE_FIELDS)[number];

/** The fields a CSV row sets and the import plan compares (the source by its natural key). */
export const IMPORTED_FIELDS = keysWith('imported');

/** The fields a correction's review compares; the citation follows them as 'source'. */
export const REVIEWED_FIELDS = keysWith('reviewed');

/** The fields stored in `specs` columns (sourceId is the cited source's id). */
export const COLUMN_FIELDS = SPEC_FIELDS.filter((f) => f.column !== null);

/** Label for a field name in diffs and previews, including 'source' (the whole citation) and 'created'. */
export const FIELD_LABEL: Readonly<Record<string, string>> = Object.freeze({
  ...Object.fromEntries(SPEC_FIELDS.map((f) => [f.key, f.label])),
  source: 'Source',
  created: 'Created',
});
