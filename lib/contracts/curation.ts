/**
 * Editors' spec writes (create, edit, revert) and revision history: request schemas shared
 * by the server (validation) and the client forms (types and field messages). The value
 * rules are the CSV importer's: units through lib/units parseUnit, the unit's kind must fit
 * the parameter (lib/specs/classify.ts expectedKind), min ≤ nominal ≤ max, no negative resistance or
 * length, the same length limits as the CSV columns.
 */
import { z } from 'zod';
import { parseUnit, type CanonicalUnit } from '../units';
import { expectedKind } from '../specs/classify';
import type { RevisionOrigin } from './enums';
import { safeText } from './text';
import type { SpecDetailDto } from './library';
import {
  fieldsWith,
  type EditableField,
  type SpecField,
  type FieldRule,
  type SpecSnapshot,
  type SpecValues,
} from './spec-fields';

/** Trimmed text up to `max` characters; single-line unless `multiline` (lib/contracts/text.ts). */
const text = (label: string, max: number, multiline = false) => safeText(max, { label, multiline });
const required = (label: string, max: number) => text(label, max).refine((s) => s.length > 0, `${label} is required`);

const year = (label: string) =>
  z
    .number({ error: `${label} must be a year` })
    .int(`${label} must be a whole year`)
    .min(1900, `${label} must be 1900 or later`)
    .max(2100, `${label} must be 2100 or earlier`);

const unit = z.string({ error: 'unit is required' }).transform((s, ctx): CanonicalUnit => {
  const parsed = parseUnit(s);
  if (parsed) return parsed.unit;
  ctx.addIssue({
    code: 'custom',
    message: `unit "${s}" is not recognised; use one of Ω (or ohm), kΩ, MΩ, V, mV, A, mA, mm, in, thou (or mil)`,
  });
  return z.NEVER;
});

const url = safeText(500, { label: 'source url' })
  .refine(
    (s) => s === '' || /^https?:\/\/[^\s/?#"<>]+[^\s"<>]*$/i.test(s),
    'source url must be a web address starting with http:// or https://',
  )
  .nullable()
  .transform((s) => s || null);

export const Reason = safeText(500, { label: 'reason', error: 'reason is required: say why the spec changes' }).min(
  3,
  'reason must be at least 3 characters',
);

export const SourceInput = z.object({
  title: required('source title', 200),
  edition: text('source edition', 200).default(''),
  page: required('source page', 200),
  url: url.optional().transform((u) => u ?? null),
});
export type SourceInput = z.infer<typeof SourceInput>;

/** A listed field's request schema, from its kind and rule (lib/contracts/spec-fields.ts). */
export function valueSchema(f: SpecField) {
  const { maxLength = 0, multiline = false, range, values = [] } = f.rule as FieldRule;
  if (f.kind === 'unit') return unit;
  if (f.kind === 'text')
    return f.nullable ? text(f.label.toLowerCase(), maxLength, multiline) : required(f.label.toLowerCase(), maxLength);
  if (f.kind === 'enum') {
    const choice = z.enum(values as [string, ...string[]], { error: `${f.key} must be ${values.join(' or ')}` });
    return f.nullable ? choice.nullable() : choice;
  }
  let n = z.number({ error: `${f.key} must be a number or null` });
  if (range) {
    const [lo, hi, what] = range;
    n = n.min(lo, `${f.key} must be ${lo}${what} or more`).max(hi, `${f.key} must be ${hi}${what} or less`);
  }
  return n.nullable();
}

const EDITABLE_DEFS = fieldsWith('editable');

/** The schema of each editable field; the types come from SpecValues. */
type ValueSchemas = { [K in EditableField]: z.ZodType<K extends 'unit' ? CanonicalUnit : SpecValues[K], unknown> };

/** The values of a spec an editor may set, every one optional (PATCH), and the citation. */
const valueFields = {
  ...(Object.fromEntries(EDITABLE_DEFS.map((f) => [f.key, valueSchema(f)])) as unknown as ValueSchemas),
  source: SourceInput,
};

export type SpecValueIssue = { path: string; message: string };
type CheckedValues = {
  parameter: string;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: string;
};

/** Rules between fields, applied to the body and again to the spec an edit would leave. */
export function specValueIssues(v: CheckedValues): SpecValueIssue[] {
  const issues: SpecValueIssue[] = [];
  const { min, nominal, max } = v;
  if (min === null && nominal === null && max === null)
    issues.push({ path: 'min', message: 'give at least one of min, nominal or max' });
  if (min !== null && max !== null && min > max)
    issues.push({ path: 'min', message: `min ${min} is greater than max ${max}` });
  if (min !== null && nominal !== null && min > nominal)
    issues.push({ path: 'nominal', message: `nominal ${nominal} is less than min ${min}` });
  if (nominal !== null && max !== null && nominal > max)
    issues.push({ path: 'nominal', message: `nominal ${nominal} is greater than max ${max}` });
  const parsed = parseUnit(v.unit);
  if (!parsed) return issues;
  const needed = expectedKind(v.parameter);
  if (needed && needed !== parsed.kind) {
    issues.push({
      path: 'unit',
      message: `unit ${parsed.unit} is a ${parsed.kind} unit but parameter '${v.parameter}' needs a ${needed} unit`,
    });
  }
  if (parsed.kind === 'resistance' || parsed.kind === 'length') {
    for (const [path, value] of [
      ['min', min],
      ['nominal', nominal],
      ['max', max],
    ] as const) {
      if (value !== null && value < 0)
        issues.push({ path, message: `${path} ${value} is negative; a ${parsed.kind} cannot be below zero` });
    }
  }
  return issues;
}

const addIssues = (values: CheckedValues, ctx: z.RefinementCtx) => {
  for (const i of specValueIssues(values)) ctx.addIssue({ code: 'custom', path: [i.path], message: i.message });
};

/**
 * A field left out of a new spec's body (or a proposal): null numbers and modes, empty text,
 * the database's default choice; a field with neither stays required.
 */
export function withCreateDefault(f: SpecField): z.ZodType {
  const schema = valueSchema(f) as z.ZodType;
  if (f.kind === 'number' || (f.kind === 'enum' && f.nullable)) return schema.default(null);
  if (f.kind === 'text' && f.nullable) return schema.default('');
  if (f.dbDefault !== null) return schema.default(f.dbDefault);
  return schema;
}

function createDefaults() {
  return Object.fromEntries(EDITABLE_DEFS.map((f) => [f.key, withCreateDefault(f)])) as {
    [K in EditableField]: z.ZodDefault<ValueSchemas[K]>;
  };
}

/** POST /api/specs: a new spec; make, model, component and source are found or created by natural key. */
export const CreateSpecBody = z
  .object({
    make: required('make', 120),
    model: required('model', 120),
    yearFrom: year('yearFrom'),
    yearTo: year('yearTo').nullable().default(null),
    variant: text('variant', 120).default(''),
    component: required('component', 120),
    ...valueFields,
    ...createDefaults(),
    /** Absent: copper for winding and coil resistances, none otherwise (as the CSV importer decides). */
    material: valueFields.material.optional(),
    reason: Reason.default('Created in the spec editor'),
  })
  .strict()
  .superRefine((b, ctx) => {
    if (b.yearTo !== null && b.yearTo < b.yearFrom)
      ctx.addIssue({
        code: 'custom',
        path: ['yearTo'],
        message: `yearTo ${b.yearTo} is before yearFrom ${b.yearFrom}`,
      });
    addIssues(b, ctx);
  });
export type CreateSpecBody = z.infer<typeof CreateSpecBody>;

const VALUE_KEYS = Object.keys(valueFields) as (keyof typeof valueFields)[];

/**
 * PATCH /api/specs/:id: the version the edit is based on, why, and the fields that change.
 * Cross-field rules run here on what the body gives, and on the server again on the result.
 */
export const UpdateSpecBody = z
  .object({
    version: z.number({ error: 'version is required: the version this edit is based on' }).int().positive(),
    reason: Reason,
    ...(Object.fromEntries(VALUE_KEYS.map((k) => [k, valueFields[k].optional()])) as {
      [K in keyof typeof valueFields]: z.ZodOptional<(typeof valueFields)[K]>;
    }),
  })
  .strict()
  .superRefine((b, ctx) => {
    if (!VALUE_KEYS.some((k) => b[k] !== undefined))
      ctx.addIssue({ code: 'custom', path: [], message: 'change at least one field' });
    const { min = null, max = null } = b;
    if (min !== null && max !== null && min > max)
      ctx.addIssue({ code: 'custom', path: ['min'], message: `min ${min} is greater than max ${max}` });
  });
export type UpdateSpecBody = z.infer<typeof UpdateSpecBody>;

/** POST /api/specs/:id/revert: bring back one revision's values, as a new revision. */
export const RevertSpecBody = z
  .object({
    revisionId: z.number({ error: 'revisionId is required' }).int().positive(),
    version: z.number({ error: 'version is required: the version this revert is based on' }).int().positive(),
    reason: Reason,
  })
  .strict();
export type RevertSpecBody = z.infer<typeof RevertSpecBody>;

export type FieldChangeDto = { field: string; before: string | number | null; after: string | number | null };

export type RevisionDiffDto = {
  id: number;
  version: number;
  origin: RevisionOrigin;
  originRef: string | null;
  authorName: string;
  reason: string;
  createdAt: string;
  changedFields: string[];
  /** Against the revision before this one; for the first revision, every field it set. */
  changes: FieldChangeDto[];
  snapshot: Partial<SpecSnapshot>;
};

export type RevisionListDto = { specId: number; version: number; revisions: RevisionDiffDto[] };

/** The body of a 409 on a stale edit or revert: the spec as it is now. */
export type StaleSpecProblem = { status: 409; code: 'conflict'; detail: string; current: SpecDetailDto };
