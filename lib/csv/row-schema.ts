/**
 * The one zod schema that turns a raw CSV row (column name → cell text) into a SpecCsvRow,
 * with reasons a technician-editor can act on. Client forms can use it too: give it the
 * cells as strings, keyed by CSV column name.
 */
import { z } from 'zod';
import { parseUnit, unitKind, type CanonicalUnit, type QuantityKind } from '../units';
import type { Material } from '../contracts/enums';
import { hasFlag, type FieldRule } from '../contracts/spec-fields';
import { textProblem } from '../contracts/text';
import {
  COLUMN_TO_FIELD,
  CSV_FIELDS,
  SPEC_CSV_COLUMNS,
  type RowProblem,
  type SpecCsvColumn,
  type SpecCsvRow,
} from './columns';
import { unneutraliseCell } from './injection';
import { defaultMaterial, expectedKind } from '../specs/classify';
import { plausibilityWarnings } from './plausibility';

/** Cells are trimmed, and a neutralising ' added by our export is removed (see injection.ts). */
export function cleanCell(value: string | undefined): string {
  return unneutraliseCell((value ?? '').trim()).trim();
}

const ACCEPTED_UNITS = 'Ω (or ohm), kΩ, MΩ, V, mV, A, mA, mm, in, thou (or mil)';

/**
 * Free text, by the one rule of lib/contracts/text.ts; only test_points, conditions and notes may span lines. A cell beginning with = + - @ is accepted as plain text: it is stored and
 * displayed, never evaluated, and neutralised again on export.
 */
const text = (column: SpecCsvColumn, max: number, { required = false, multiline = false } = {}) =>
  z
    .string()
    .optional()
    .transform((value, ctx) => {
      const s = cleanCell(value);
      const fail = (message: string) => ctx.addIssue({ code: 'custom', message });
      if (required && s === '') fail(`${column} is required`);
      else if (s.length > max) fail(`${column} is ${s.length} characters long; the limit is ${max}`);
      else {
        const problem = textProblem(s, { multiline });
        if (problem) fail(`${column} ${problem}`);
      }
      return s;
    });

const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
const DECIMAL_COMMA = /^[+-]?\d*,\d+$/;
const NOT_FINITE = /^[+-]?(nan|inf|infinity|∞)$/i;

/** Parses a plain decimal number (dot separator); returns the reason when it is not one. */
function readNumber(column: SpecCsvColumn, s: string): number | string {
  if (DECIMAL_COMMA.test(s))
    return `${column} "${s}" has a decimal comma; use a dot as the decimal separator (${s.replace(',', '.')})`;
  if (NOT_FINITE.test(s)) return `${column} "${s}" is not a finite number`;
  if (!PLAIN_NUMBER.test(s))
    return `${column} "${s}" is not a number; write a plain number such as 3.5 and put the unit in the unit column`;
  const n = Number(s);
  return Number.isFinite(n) ? n : `${column} "${s}" is too large: not a finite number`;
}

type NumberRule = { required?: boolean; integer?: boolean; range?: [number, number]; what?: string };

/** Empty → null; a problem → NaN plus an issue (NaN never reaches a valid row). */
const number = (column: SpecCsvColumn, rule: NumberRule = {}) =>
  z
    .string()
    .optional()
    .transform((value, ctx): number | null => {
      const s = cleanCell(value);
      const fail = (message: string) => (ctx.addIssue({ code: 'custom', message }), NaN);
      if (s === '') return rule.required ? fail(`${column} is required`) : null;
      const n = readNumber(column, s);
      if (typeof n === 'string')
        return fail(rule.integer ? `${column} "${s}" is not a year; write a whole year such as 2016` : n);
      if (rule.integer && !Number.isInteger(n)) return fail(`${column} ${s} is not a whole year`);
      if (rule.range && (n < rule.range[0] || n > rule.range[1])) {
        return fail(`${column} ${s} is outside ${rule.range[0]} to ${rule.range[1]}${rule.what ?? ''}`);
      }
      return n;
    });

const unit = z
  .string()
  .optional()
  .transform((value, ctx) => {
    const s = cleanCell(value);
    if (s === '') return (ctx.addIssue({ code: 'custom', message: 'unit is required' }), null);
    const parsed = parseUnit(s);
    if (!parsed)
      ctx.addIssue({ code: 'custom', message: `unit "${s}" is not recognised; use one of ${ACCEPTED_UNITS}` });
    return parsed;
  });

/** One of `values`, any case; empty → null (the field's default decides). */
const oneOf = (column: SpecCsvColumn, values: readonly string[]) =>
  z
    .string()
    .optional()
    .transform((value, ctx): string | null => {
      const s = cleanCell(value).toLowerCase();
      if (s === '') return null;
      if (values.includes(s)) return s;
      ctx.addIssue({
        code: 'custom',
        message: `${column} "${cleanCell(value)}" is not allowed; use ${values.join(', ')}, or leave it empty`,
      });
      return null;
    });

const url = z
  .string()
  .optional()
  .transform((value, ctx) => {
    const s = cleanCell(value);
    if (s === '') return null;
    const problem = textProblem(s);
    if (s.length > 500)
      ctx.addIssue({ code: 'custom', message: `source_url is ${s.length} characters long; the limit is 500` });
    else if (problem) ctx.addIssue({ code: 'custom', message: `source_url ${problem}` });
    else if (!/^https?:\/\/[^\s/?#"<>]+[^\s"<>]*$/i.test(s))
      ctx.addIssue({ code: 'custom', message: 'source_url must be a web address starting with http:// or https://' });
    return s;
  });

/**
 * The cell schema of a spec field, from its kind and rule (lib/contracts/spec-fields.ts).
 * A column added later (csvOptional) that the file lacks reads as undefined, so an import
 * keeps the spec's value instead of clearing it (an empty cell still clears it).
 */
function cellSchema(f: (typeof CSV_FIELDS)[number]) {
  const schema = presentCellSchema(f);
  if (!hasFlag(f, 'csvOptional')) return schema;
  return z
    .unknown()
    .optional()
    .transform((v, ctx) => {
      if (v === undefined) return undefined;
      const read = schema.safeParse(v);
      if (read.success) return read.data;
      for (const i of read.error.issues) ctx.addIssue({ code: 'custom', message: i.message });
      return null;
    });
}

function presentCellSchema(f: (typeof CSV_FIELDS)[number]) {
  const { maxLength = 0, multiline = false, range, values = [] } = f.rule as FieldRule;
  if (f.sourceColumn === 'url') return url;
  if (f.kind === 'unit') return unit;
  if (f.kind === 'enum') return oneOf(f.csv, values);
  if (f.kind === 'number') return number(f.csv, range ? { range: [range[0], range[1]], what: range[2] } : {});
  return text(f.csv, maxLength, { required: hasFlag(f, 'csvRequired'), multiline });
}

const RawRowSchema = z.object({
  make: text('make', 120, { required: true }),
  model: text('model', 120, { required: true }),
  year_from: number('year_from', { required: true, integer: true, range: [1900, 2100] }),
  year_to: number('year_to', { integer: true, range: [1900, 2100] }),
  variant: text('variant', 120),
  component: text('component', 120, { required: true }),
  ...Object.fromEntries(CSV_FIELDS.map((f) => [f.csv, cellSchema(f)])),
});
/** A row's cells as read: the fields' values by CSV column (the unit parsed, or null). */
type RawRow = z.output<typeof RawRowSchema> & {
  parameter: string;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: { unit: CanonicalUnit; kind: QuantityKind } | null;
  material: Material | null;
} & Record<string, unknown>;

const KIND_NAME: Record<QuantityKind, string> = {
  resistance: 'resistance',
  voltage: 'voltage',
  current: 'current',
  length: 'length',
};
const ok = (n: number | null): n is number => n !== null && Number.isFinite(n);

/** Rules between cells. Runs even when some cells failed, skipping the comparisons they spoil. */
function crossCheck(r: RawRow, ctx: z.RefinementCtx<RawRow>) {
  const issue = (column: SpecCsvColumn | null, message: string) =>
    ctx.addIssue({ code: 'custom', message, path: column ? [column] : [] });
  const limits: [SpecCsvColumn, number | null][] = [
    ['min', r.min],
    ['nominal', r.nominal],
    ['max', r.max],
  ];
  if (limits.every(([, v]) => v === null)) issue(null, 'give at least one of min, nominal or max');
  if (ok(r.min) && ok(r.max) && r.min > r.max) issue('min', `min ${r.min} is greater than max ${r.max}`);
  if (ok(r.min) && ok(r.nominal) && r.min > r.nominal)
    issue('nominal', `nominal ${r.nominal} is less than min ${r.min}`);
  if (ok(r.nominal) && ok(r.max) && r.nominal > r.max)
    issue('nominal', `nominal ${r.nominal} is greater than max ${r.max}`);
  if (ok(r.year_from) && ok(r.year_to) && r.year_to < r.year_from) {
    issue('year_to', `year_to ${r.year_to} is before year_from ${r.year_from}`);
  }
  if (!r.unit) return;
  const needed = expectedKind(r.parameter);
  if (needed && needed !== r.unit.kind) {
    issue(
      'unit',
      `unit ${r.unit.unit} is a ${KIND_NAME[r.unit.kind]} unit but parameter '${r.parameter}' needs a ${KIND_NAME[needed]} unit`,
    );
  }
  if (r.unit.kind === 'resistance' || r.unit.kind === 'length') {
    for (const [column, v] of limits) {
      if (ok(v) && v < 0) issue(column, `${column} ${v} is negative; a ${KIND_NAME[r.unit.kind]} cannot be below zero`);
    }
  }
}

function toRow(r: RawRow): SpecCsvRow {
  const u = r.unit!;
  const row: Record<string, unknown> = {};
  for (const column of SPEC_CSV_COLUMNS) row[COLUMN_TO_FIELD[column]] = r[column];
  return { ...row, unit: u.unit, material: r.material ?? defaultMaterial(r.parameter, u.kind) } as SpecCsvRow;
}

/** Raw row (all strings, keyed by CSV column; missing columns count as empty) → SpecCsvRow. */
export const SpecCsvRowSchema: z.ZodType<SpecCsvRow, Partial<Record<SpecCsvColumn, string>>> = (
  RawRowSchema as unknown as z.ZodType<RawRow, Partial<Record<SpecCsvColumn, string>>>
)
  .superRefine(crossCheck, { when: () => true })
  .transform(toRow);

const asColumn = (key: unknown): SpecCsvColumn | null =>
  (SPEC_CSV_COLUMNS as readonly unknown[]).includes(key) ? (key as SpecCsvColumn) : null;

/** Validates one raw row; `line` is the physical line it starts on, used in every problem. */
export function validateSpecRow(
  raw: Record<string, string>,
  line: number,
): { ok: true; row: SpecCsvRow; warnings: RowProblem[] } | { ok: false; errors: RowProblem[] } {
  const result = SpecCsvRowSchema.safeParse(raw);
  if (!result.success) {
    return {
      ok: false,
      errors: result.error.issues.map((i) => ({ line, column: asColumn(i.path[0]), reason: i.message })),
    };
  }
  const row = result.data;
  const values: [SpecCsvColumn, number | null][] = [
    ['min', row.min],
    ['nominal', row.nominal],
    ['max', row.max],
  ];
  const warnings = plausibilityWarnings(
    { component: row.component, parameter: row.parameter, unit: row.unit, kind: unitKind(row.unit), values },
    line,
  );
  return { ok: true, row, warnings };
}
