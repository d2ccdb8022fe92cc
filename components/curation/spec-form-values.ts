/**
 * The spec editor's typed text ↔ the request bodies. Form fields are text (a decimal comma
 * is accepted); the bodies are what lib/contracts/curation validates. Text that is not a
 * number is passed on as it is, so the shared schema reports it under its field.
 */
import type { SpecDetailDto } from '@/lib/contracts/library';
import { parseDecimal } from '@/lib/calculator/form';

export type SpecFormValues = {
  make: string;
  model: string;
  yearFrom: string;
  yearTo: string;
  variant: string;
  component: string;
  parameter: string;
  min: string;
  nominal: string;
  max: string;
  unit: string;
  refTempC: string;
  /** '' = decided from the parameter (copper for windings), as the importer does. */
  material: '' | 'copper' | 'none';
  testPoints: string;
  conditions: string;
  notes: string;
  source: { title: string; edition: string; page: string; url: string };
  status: 'published' | 'draft';
  reason: string;
};

/** The fields PATCH may change, in the order the conflict view lists them. */
export const EDITABLE_FIELDS = [
  'parameter',
  'min',
  'nominal',
  'max',
  'unit',
  'refTempC',
  'material',
  'testPoints',
  'conditions',
  'notes',
  'status',
] as const;
export type EditableField = (typeof EDITABLE_FIELDS)[number];

export const EMPTY_SPEC_FORM: SpecFormValues = {
  make: '',
  model: '',
  yearFrom: '',
  yearTo: '',
  variant: '',
  component: '',
  parameter: '',
  min: '',
  nominal: '',
  max: '',
  unit: 'Ω',
  refTempC: '',
  material: '',
  testPoints: '',
  conditions: '',
  notes: '',
  source: { title: '', edition: '', page: '', url: '' },
  status: 'published',
  reason: '',
};

const num = (s: string): unknown => {
  const v = parseDecimal(s);
  return v === undefined ? null : Number.isNaN(v) ? s : v;
};
const year = (s: string): unknown => (s.trim() === '' ? undefined : /^\d+$/.test(s.trim()) ? Number(s.trim()) : s);
const show = (v: number | null) => (v === null ? '' : String(v));

export function toCreateBody(v: SpecFormValues): Record<string, unknown> {
  return {
    make: v.make,
    model: v.model,
    yearFrom: year(v.yearFrom),
    yearTo: year(v.yearTo) ?? null,
    variant: v.variant,
    component: v.component,
    parameter: v.parameter,
    min: num(v.min),
    nominal: num(v.nominal),
    max: num(v.max),
    unit: v.unit,
    refTempC: num(v.refTempC),
    material: v.material || undefined,
    testPoints: v.testPoints,
    conditions: v.conditions,
    notes: v.notes,
    source: { ...v.source, url: v.source.url.trim() || null },
    status: v.status,
    reason: v.reason.trim() || undefined,
  };
}

export function specToForm(s: SpecDetailDto): SpecFormValues {
  return {
    make: s.model.make.name,
    model: s.model.name,
    yearFrom: String(s.model.yearFrom),
    yearTo: show(s.model.yearTo),
    variant: s.model.variant,
    component: s.component.name,
    parameter: s.parameter,
    min: show(s.min),
    nominal: show(s.nominal),
    max: show(s.max),
    unit: s.unit,
    refTempC: show(s.refTempC),
    material: s.material,
    testPoints: s.testPoints ?? '',
    conditions: s.conditions ?? '',
    notes: s.notes ?? '',
    source: {
      title: s.source?.title ?? '',
      edition: s.source?.edition ?? '',
      page: s.sourcePage ?? '',
      url: s.source?.url ?? '',
    },
    status: s.status,
    reason: '',
  };
}

const same = (a: string, b: string) => a.trim() === b.trim();
const sourceChanged = (a: SpecFormValues['source'], b: SpecFormValues['source']) =>
  !same(a.title, b.title) || !same(a.edition, b.edition) || !same(a.page, b.page) || !same(a.url, b.url);

/** The fields the editor changed against `base`, as PATCH wants them (no version, no reason). */
export function changedFields(base: SpecFormValues, v: SpecFormValues): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  const numeric = new Set<EditableField>(['min', 'nominal', 'max', 'refTempC']);
  for (const f of EDITABLE_FIELDS) {
    if (same(base[f], v[f])) continue;
    out[f] = numeric.has(f) ? num(v[f]) : v[f];
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
