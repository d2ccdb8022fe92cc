/**
 * The correction form's values (typed text) and the request body they become: numbers
 * with a decimal comma are accepted, and the body's nested paths ('values.min',
 * 'citation.title') are shown under the flat fields they come from.
 */
import { parseDecimal } from '@/lib/calculator/form';
import type { CanonicalUnit } from '@/lib/units';

export type ProposalFields = {
  component: string;
  parameter: string;
  min: string;
  nominal: string;
  max: string;
  unit: CanonicalUnit;
  refTempC: string;
  testPoints: string;
  conditions: string;
  title: string;
  edition: string;
  page: string;
  url: string;
  rationale: string;
};
export type ProposalTarget =
  | { kind: 'change'; specId: number; version: number }
  | { kind: 'new_spec'; componentId: number }
  | { kind: 'new_component'; modelId: number };

const FIELDS = new Set<string>([
  'component',
  'parameter',
  'min',
  'nominal',
  'max',
  'unit',
  'refTempC',
  'testPoints',
  'conditions',
  'title',
  'edition',
  'page',
  'url',
  'rationale',
]);

const num = (s: string) => {
  const v = parseDecimal(s);
  return v === undefined ? null : v;
};

/** Builds the request body from the typed fields. */
export function toProposeBody(target: ProposalTarget, f: ProposalFields): unknown {
  const values = {
    min: num(f.min),
    nominal: num(f.nominal),
    max: num(f.max),
    unit: f.unit,
    refTempC: num(f.refTempC),
    testPoints: f.testPoints,
    conditions: f.conditions,
  };
  const citation = { title: f.title, edition: f.edition, page: f.page, url: f.url };
  const extra =
    target.kind === 'change'
      ? {}
      : target.kind === 'new_spec'
        ? { parameter: f.parameter }
        : { component: f.component, parameter: f.parameter };
  return { ...target, ...extra, values, citation, rationale: f.rationale };
}

/** The form field a body path is about ('values.min' → 'min'); the whole form ('root') for any other path. */
export function proposalField(path: string): string {
  const name = path.replace(/^(values|citation)\./, '');
  return FIELDS.has(name) ? name : 'root';
}

/** The server's `errors[]` by form field, first message first. */
export function proposalServerErrors(errors: { path: string; message: string }[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const e of errors) out[proposalField(e.path)] ??= e.message;
  return out;
}
