/**
 * The spec editor's typed text ↔ the request bodies. Form fields are text (a decimal comma
 * is accepted); the bodies are what lib/contracts/curation validates. Text that is not a
 * number is passed on as it is, so the shared schema reports it under its field.
 */
import type { SpecDetailDto } from '@/lib/contracts/library';
import { EDITABLE_FIELDS, SPEC_FIELDS, type EditableField, type SpecValues } from '@/lib/contracts/spec-fields';
import { parseDecimal } from '@/lib/calculator/form';

export { EDITABLE_FIELDS, type EditableField };

type KindOf<K extends EditableField> = Extract<(typeof SPEC_FIELDS)[number], { key: K }>['kind'];

/**
 * The form's value for a field: typed text, or for a choice one of its values ('' = decided
 * from the parameter, as the importer does: copper for windings).
 */
type FormCell<K extends EditableField> = KindOf<K> extends 'enum' ? '' | NonNullable<SpecValues[K]> : string;

export type SpecFormValues = {
  make: string;
  model: string;
  yearFrom: string;
  yearTo: string;
  variant: string;
  component: string;
  source: { title: string; edition: string; page: string; url: string };
  reason: string;
} & { [K in EditableField]: FormCell<K> };

const EDITABLE = new Set<string>(EDITABLE_FIELDS);
const NULLABLE = new Set<string>(SPEC_FIELDS.filter((f) => f.nullable).map((f) => f.key));
const KIND = Object.fromEntries(SPEC_FIELDS.map((f) => [f.key, f.kind])) as Record<EditableField, string>;

/** A new spec's form: every listed field empty (a choice undecided), except the unit (Ω) and the database's defaults. */
const emptyCell = (f: (typeof SPEC_FIELDS)[number]) => (f.kind === 'unit' ? 'Ω' : (f.dbDefault ?? ''));

export const EMPTY_SPEC_FORM: SpecFormValues = {
  make: '',
  model: '',
  yearFrom: '',
  yearTo: '',
  variant: '',
  component: '',
  ...(Object.fromEntries(
    SPEC_FIELDS.filter((f) => EDITABLE.has(f.key)).map((f) => [f.key, f.key === 'material' ? '' : emptyCell(f)]),
  ) as { [K in EditableField]: FormCell<K> }),
  source: { title: '', edition: '', page: '', url: '' },
  reason: '',
};

const num = (s: string): unknown => {
  const v = parseDecimal(s);
  return v === undefined ? null : Number.isNaN(v) ? s : v;
};
const year = (s: string): unknown => (s.trim() === '' ? undefined : /^\d+$/.test(s.trim()) ? Number(s.trim()) : s);
const show = (v: number | null) => (v === null ? '' : String(v));

/** A form cell as the request body wants it: numbers parsed, an unchosen choice left out. */
function bodyValue(f: EditableField, value: string): unknown {
  if (KIND[f] === 'number') return num(value);
  if (KIND[f] === 'enum') return value || undefined;
  return value;
}

/** A changed cell as PATCH wants it: an emptied choice that may be empty is null (decided from the parameter). */
function changedValue(f: EditableField, value: string): unknown {
  if (KIND[f] === 'number') return num(value);
  if (KIND[f] === 'enum' && value === '' && NULLABLE.has(f)) return null;
  return value;
}

export function toCreateBody(v: SpecFormValues): Record<string, unknown> {
  const values = Object.fromEntries(EDITABLE_FIELDS.map((f) => [f, bodyValue(f, v[f])]));
  return {
    make: v.make,
    model: v.model,
    yearFrom: year(v.yearFrom),
    yearTo: year(v.yearTo) ?? null,
    variant: v.variant,
    component: v.component,
    ...values,
    source: { ...v.source, url: v.source.url.trim() || null },
    reason: v.reason.trim() || undefined,
  };
}

function formCell(f: EditableField, value: unknown): string {
  if (KIND[f] === 'number') return show(value as number | null);
  return (value as string | null) ?? '';
}

export function specToForm(s: SpecDetailDto): SpecFormValues {
  const values = Object.fromEntries(EDITABLE_FIELDS.map((f) => [f, formCell(f, s[f])]));
  return {
    make: s.model.make.name,
    model: s.model.name,
    yearFrom: String(s.model.yearFrom),
    yearTo: show(s.model.yearTo),
    variant: s.model.variant,
    component: s.component.name,
    ...(values as { [K in EditableField]: FormCell<K> }),
    source: {
      title: s.source?.title ?? '',
      edition: s.source?.edition ?? '',
      page: s.sourcePage ?? '',
      url: s.source?.url ?? '',
    },
    reason: '',
  };
}

const same = (a: string, b: string) => a.trim() === b.trim();
const sourceChanged = (a: SpecFormValues['source'], b: SpecFormValues['source']) =>
  !same(a.title, b.title) || !same(a.edition, b.edition) || !same(a.page, b.page) || !same(a.url, b.url);

/** The fields the editor changed against `base`, as PATCH wants them (no version, no reason). */
export function changedFields(base: SpecFormValues, v: SpecFormValues): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of EDITABLE_FIELDS) {
    if (same(base[f], v[f])) continue;
    out[f] = changedValue(f, v[f]);
  }
  if (sourceChanged(base.source, v.source)) out.source = { ...v.source, url: v.source.url.trim() || null };
  return out;
}

export function toUpdateBody(base: SpecFormValues, v: SpecFormValues, version: number): Record<string, unknown> {
  return { ...changedFields(base, v), version, reason: v.reason };
}

/** The server's `errors[].path` → a form field name ('(root)' and unknown paths → 'root.server'). */
export function formPath(path: string): string {
  const known = new Set<string>([
    ...Object.keys(EMPTY_SPEC_FORM),
    'source.title',
    'source.edition',
    'source.page',
    'source.url',
  ]);
  return known.has(path) ? path : 'root.server';
}
