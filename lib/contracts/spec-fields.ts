/**
 * A spec's value fields, written out once. Everything that lists them derives from
 * SPEC_FIELDS: the SpecValues and SpecSnapshot types, the `specs` entity's columns
 * (server/modules/specs/spec.entity.ts), the revision snapshot and its diffs
 * (spec-snapshot.ts), the CSV columns (lib/csv/columns.ts), the staged import rows and the
 * commit's SQL, the editors' request schemas (curation.ts), the spec card's DTO, the
 * editor's form and its inputs, the diff labels, the edit merge and the revert. Adding a
 * field means: a line here, a migration for the `specs` and `import_batch_rows` columns,
 * and tests.
 *
 * The make, model, years, variant and component are not value fields: they place a spec
 * in the library (lib/csv/columns.ts IDENTITY_COLUMNS).
 */
import { MATERIALS, MEASUREMENT_MODES, SPEC_STATUSES, type CanonicalUnit } from './enums';

/** How a field's value is typed, written in CSV and edited. */
export type SpecFieldKind = 'number' | 'text' | 'enum' | 'unit';

/** A field's kind with the TypeScript type of its value (`type` exists only for the compiler). */
type Kind<T, N extends SpecFieldKind = SpecFieldKind> = {
  name: N;
  nullable: boolean;
  values: readonly string[];
  readonly type: T;
};
const kind = <T, N extends SpecFieldKind>(name: N, nullable: boolean, values: readonly string[] = []) =>
  ({ name, nullable, values }) as Kind<T, N>;

const NUMBER = kind<number | null, 'number'>('number', true);
const TEXT = kind<string | null, 'text'>('text', true);
const REQUIRED_TEXT = kind<string, 'text'>('text', false);
const UNIT = kind<CanonicalUnit, 'unit'>('unit', false);
/** One of `values`; `nullable` when an empty value means "decided from the parameter". */
const oneOf = <const V extends readonly string[], N extends boolean = false>(values: V, nullable?: N) =>
  kind<N extends true ? V[number] | null : V[number], 'enum'>('enum', nullable ?? false, values);

/** What else a field takes part in (see FieldDef.flags). */
export type FieldFlag =
  | 'snapshot' // in the revision snapshot and the history's diffs
  | 'imported' // compared by the import plan: a CSV row that differs here updates the spec
  | 'editable' // set directly by PATCH /api/specs/:id (the editor's form fields)
  | 'reviewed' // shown in a correction's three-way review
  | 'required' // a spec always has a value (never null)
  | 'csvRequired' // the CSV cell must not be empty
  | 'csvLast' // written after every other CSV column (free text that closes a record)
  | 'csvEmptyIsNull' // an empty CSV cell reads as null rather than ''
  | 'csvOptional'; // the CSV column may be missing from a file (added later: older files still import)

/** How a value is checked, in the CSV importer and the editor's request schemas alike. */
export type FieldRule = {
  /** Text: the most characters allowed. */
  maxLength?: number;
  /** Text: may span lines. */
  multiline?: boolean;
  /** Number: the lowest and highest value allowed, and the unit that follows them in messages. */
  range?: readonly [number, number, string];
  /** Enum: the values allowed (taken from the field's kind). */
  values?: readonly string[];
};

/** How the editor's form shows a field. */
export type FieldInput = {
  /** The input's label, when it says more than the field's label. */
  label?: string;
  /** Inputs of one group share a row (e.g. the limits). */
  group?: string;
  /** Labels for an enum's values; '' labels the empty choice (decided from the parameter). */
  choices?: Readonly<Record<string, string>>;
  /** Placed after the citation block (the status closes the form). */
  last?: boolean;
};

type Place<Col extends string | null, C extends string> = {
  /** Column in `specs` and in `import_batch_rows`; absent for the cited source's own fields. */
  column?: Col;
  /** The `sources` column this field shows, for fields that live on the cited source. */
  sourceColumn?: 'title' | 'edition' | 'url';
  /** Column in the CSV import format; absent when the format does not carry the field. */
  csv?: C;
  /** The column's default in the database (enums that always have a value). */
  dbDefault?: string;
  /** The import screen's column reference: what the cell holds, and an example. */
  help?: readonly [string, string];
};

export type FieldDef<
  K extends string = string,
  F extends FieldFlag = FieldFlag,
  KindName extends SpecFieldKind = SpecFieldKind,
  C extends string | null = string | null,
  T = unknown,
  Col extends string | null = string | null,
> = {
  /** Property name in SpecValues / the snapshot, the DTOs and the request bodies. */
  key: K;
  /** Plain name in diffs, previews, the conflict view and the review. */
  label: string;
  kind: KindName;
  /** False when the field always has a value. */
  nullable: boolean;
  column: Col;
  sourceColumn: 'title' | 'edition' | 'url' | null;
  csv: C;
  dbDefault: string | null;
  help: readonly [string, string] | null;
  flags: readonly F[];
  rule: FieldRule;
  input: FieldInput;
  /** The value's TypeScript type; never set at run time. */
  readonly type: T;
};

const field = <
  const K extends string,
  T,
  const KindName extends SpecFieldKind,
  const F extends FieldFlag,
  const C extends string = never,
  const Col extends string = never,
>(
  key: K,
  label: string,
  k: Kind<T, KindName>,
  at: Place<Col, C>,
  flags: readonly F[],
  rule: FieldRule = {},
  input: FieldInput = {},
): FieldDef<K, F, KindName, [C] extends [never] ? null : C, T, [Col] extends [never] ? null : Col> =>
  ({
    key,
    label,
    kind: k.name,
    nullable: k.nullable,
    column: at.column ?? null,
    sourceColumn: at.sourceColumn ?? null,
    csv: at.csv ?? null,
    dbDefault: at.dbDefault ?? null,
    help: at.help ?? null,
    flags,
    rule: k.values.length ? { ...rule, values: k.values } : rule,
    input,
  }) as unknown as FieldDef<K, F, KindName, [C] extends [never] ? null : C, T, [Col] extends [never] ? null : Col>;

const ALL = ['snapshot', 'imported', 'editable', 'reviewed'] as const;
const ADDED = [...ALL, 'csvOptional'] as const;
const WINDING_TEMP = [-40, 200, ' °C'] as const;
const ENGINE_SPEED = [0, 30000, ' rpm'] as const;
const NEAR_LIMIT = [0, 1e9, ''] as const;
const LINE = { maxLength: 120 };
const SOURCE_LINE = { maxLength: 200 };
const PARAGRAPH = { maxLength: 1000, multiline: true };
const LIMITS = { group: 'limits' };
const FROM_PARAMETER = 'From the parameter';

/** In the order the history, the diffs and the forms list them. */
// prettier-ignore
export const SPEC_FIELDS = [
  field('parameter', 'Parameter', REQUIRED_TEXT, { column: 'parameter', csv: 'parameter', help: ['What is measured, up to 120 characters. Known parameters are checked against the unit.', 'primary winding resistance'] }, ['snapshot', 'editable', 'required', 'csvRequired'], LINE, { label: 'Parameter (e.g. primary winding resistance)' }),
  field('min', 'Minimum', NUMBER, { column: 'min_value', csv: 'min', help: ['Lowest acceptable value, a plain number with a dot as decimal separator. Give at least one of min, nominal or max.', '2.9'] }, ALL, {}, LIMITS),
  field('nominal', 'Nominal', NUMBER, { column: 'nominal_value', csv: 'nominal', help: ['Nominal (rated) value; must lie between min and max when they are given.', '3.2'] }, ALL, {}, LIMITS),
  field('max', 'Maximum', NUMBER, { column: 'max_value', csv: 'max', help: ['Highest acceptable value; not below min.', '3.5'] }, ALL, {}, LIMITS),
  field('unit', 'Unit', UNIT, { column: 'unit', csv: 'unit', help: ['Unit of min / nominal / max: Ω (or ohm), kΩ, MΩ, V, mV, A, mA, mm, in, thou (or mil).', 'Ω'] }, [...ALL, 'required', 'csvRequired']),
  field('mode', 'Meter mode', oneOf(MEASUREMENT_MODES, true), { column: 'mode', csv: 'mode', help: ['Meter mode for the check: dc_voltage, ac_voltage, peak_voltage, resistance, diode_forward, continuity or current. Empty means decided from the parameter and unit; the column may be left out.', 'ac_voltage'] }, ADDED, {}, { choices: { '': FROM_PARAMETER } }),
  field('nearLimit', 'Near-limit band', NUMBER, { column: 'near_limit', csv: 'near_limit', help: ['Width of the near-limit (marginal) band in the spec\'s unit; empty means 5 % of the width for two-sided specs and none for one-sided ones. The column may be left out.', '0.1'] }, ADDED, { range: NEAR_LIMIT }, { label: "Near-limit band, in the spec's unit (optional)" }),
  field('engineRpm', 'Engine speed rpm', NUMBER, { column: 'engine_rpm', csv: 'engine_rpm', help: ['Engine speed the check is made at (rpm, 0 to 30000); empty when the engine is off. The column may be left out.', '5000'] }, ADDED, { range: ENGINE_SPEED }, { label: 'Engine speed for the check, rpm (optional)' }),
  field('refTempC', 'Reference °C', NUMBER, { column: 'ref_temp_c', csv: 'ref_temp_c', help: ['Temperature (°C, −40 to 200) the limits refer to; empty means 20 °C for windings.', '20'] }, ALL, { range: WINDING_TEMP }, { label: 'Reference temperature °C (optional)' }),
  field('material', 'Winding', oneOf(MATERIALS), { column: 'material', csv: 'material', help: ['Winding material: copper or none. Empty means copper for winding and coil resistances, none otherwise.', 'copper'], dbDefault: 'none' }, [...ALL, 'required'], {}, { label: 'Winding material', choices: { '': FROM_PARAMETER } }),
  field('testPoints', 'Test points', TEXT, { column: 'test_points', csv: 'test_points', help: ['Where to put the meter probes, up to 1000 characters.', 'orange/white (+) to ground'] }, ALL, PARAGRAPH),
  field('conditions', 'Conditions', TEXT, { column: 'conditions', csv: 'conditions', help: ['Meter range, engine temperature and other conditions, up to 1000 characters.', 'meter on 200 Ω range, engine cold (20 °C)'] }, ALL, PARAGRAPH),
  field('notes', 'Notes', TEXT, { column: 'notes', csv: 'notes', help: ['Anything else the technician should know, up to 1000 characters.', 'Disconnect the battery first.'] }, ['snapshot', 'imported', 'editable', 'csvLast'], PARAGRAPH),
  field('sourceTitle', 'Source title', REQUIRED_TEXT, { sourceColumn: 'title', csv: 'source_title', help: ['Title of the document the values come from, up to 200 characters.', 'Kestrel Moto Service Manual 900 series'] }, ['snapshot', 'imported', 'csvRequired'], SOURCE_LINE),
  field('sourceEdition', 'Source edition', REQUIRED_TEXT, { sourceColumn: 'edition', csv: 'source_edition', help: ['Edition or revision of the source, up to 200 characters.', '3rd edition'] }, ['snapshot', 'imported'], SOURCE_LINE),
  field('sourcePage', 'Source page', TEXT, { column: 'source_page', csv: 'source_page', help: ['Page or section in the source, up to 200 characters.', '7-12'] }, ['snapshot', 'imported', 'csvRequired'], SOURCE_LINE),
  field('sourceUrl', 'Source link', TEXT, { sourceColumn: 'url', csv: 'source_url', help: ['Link to the source, http:// or https://, up to 500 characters; may be empty.', 'https://manuals.specbench.example/kestrel/900'] }, ['csvEmptyIsNull'], { maxLength: 500 }),
  field('status', 'Status', oneOf(SPEC_STATUSES), { column: 'status', dbDefault: 'published' }, ['snapshot', 'editable', 'required'], {}, { last: true }),
];

type AnyField = (typeof SPEC_FIELDS)[number];
type ColumnField = Extract<AnyField, { column: string }>;

/** The values a write sets (the component and identity of a spec never change), one property per `specs` column. */
export type SpecValues = { [F in ColumnField as F['key']]: F['type'] } & { sourceId: number | null };

/** The values of a spec as one revision left them (append-only history), with its cited source. */
export type SpecSnapshot = SpecValues & { sourceTitle: string | null; sourceEdition: string | null };

export type SpecField = (typeof SPEC_FIELDS)[number];
export type SpecFieldKey = SpecField['key'];

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

/** The field definitions that carry `flag`, in list order. */
export const fieldsWith = <Flag extends FieldFlag>(flag: Flag) =>
  SPEC_FIELDS.filter((f): f is Extract<SpecField, { key: KeysWith<Flag> }> => hasFlag(f, flag));

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
export const COLUMN_FIELDS = SPEC_FIELDS.filter((f): f is ColumnField => f.column !== null);

/** Label for a field name in diffs and previews, including 'source' (the whole citation) and 'created'. */
export const FIELD_LABEL: Readonly<Record<string, string>> = Object.freeze({
  ...Object.fromEntries(SPEC_FIELDS.map((f) => [f.key, f.label])),
  source: 'Source',
  created: 'Created',
});
