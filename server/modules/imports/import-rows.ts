/**
 * The one module that knows the columns of import_batch_rows (the staged rows of a
 * previewed file) and the bits of its `firsts` flags. The rest of the importer names the
 * table, its columns and the spec value columns through here; the value columns come
 * from the spec field list (lib/contracts/spec-fields.ts), staged under the same names
 * as in `specs` (the cited source's fields as source_title, source_edition, source_url).
 */
import { CSV_FIELDS } from '@/lib/csv/columns';
import { COLUMN_FIELDS } from '@/lib/contracts/spec-fields';

export const STAGED_TABLE = 'import_batch_rows';

/** Bits of `firsts`: the row is the first of the batch's created rows to need this make, model, component or source. */
export const FIRST = { make: 1, model: 2, component: 4, source: 8 } as const;

/** `firsts` values with the bit set, so the index (batch_id, firsts) reads only those rows, not the whole batch. */
export const firstOf = (bit: number) =>
  `st.firsts IN (${Array.from({ length: 16 }, (_, v) => v)
    .filter((v) => v & bit)
    .join(', ')})`;

/** A spec field as staged: its column in import_batch_rows. */
export const stagedColumn = (f: { column: string | null; csv: string }) => f.column ?? f.csv;

/** Every CSV field, in CSV order, with its staged column. */
export const STAGED_FIELDS = CSV_FIELDS.map((f) => ({ ...f, staged: stagedColumn(f) }));

/** The spec columns a staged row writes (besides the ids and keys), e.g. min_value, test_points, source_page. */
export const STAGED_SPEC_COLUMNS = COLUMN_FIELDS.filter((f) => f.csv !== null).map((f) => f.column as string);

/** The row's identity and plan, before its keys. */
const HEAD = ['batch_id', 'line', 'action', 'spec_id', 'base_version'];
const IDENTITY = ['make', 'model', 'year_from', 'year_to', 'variant', 'component'];
/** Natural keys, the batch's numbering and flags (see import-stage.ts). */
export const KEY_COLUMNS = [
  'make_key',
  'model_key',
  'component_key',
  'parameter_key',
  'source_key',
  'model_ord',
  'component_ord',
  'source_ord',
  'firsts',
  'create_ord',
  'quantity_kind',
];
const TAIL = ['changes', 'problems'];

/** All columns an INSERT sets, in the order the staged cells are built. */
export const STAGED_COLUMNS = [...HEAD, ...IDENTITY, ...KEY_COLUMNS, ...STAGED_FIELDS.map((f) => f.staged), ...TAIL];

export const INSERT_STAGED = `INSERT INTO ${STAGED_TABLE} (${STAGED_COLUMNS.map((c) => `\`${c}\``).join(', ')}) VALUES ?`;

/** The staged row shown in a preview: identity, limits and unit, the planned changes and the problems. */
export const PREVIEW_COLUMNS = `st.line, st.make, st.model, st.year_from AS yearFrom, st.year_to AS yearTo, st.variant, st.component,
  st.parameter, st.min_value AS min, st.nominal_value AS nominal, st.max_value AS max, st.unit, st.changes, st.problems`;
