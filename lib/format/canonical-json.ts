/**
 * JSON with object keys sorted at every level and undefined members left out, so two
 * values that differ only in key order (or in an absent vs undefined member) give the same
 * text: the request fingerprint behind an Idempotency-Key, and "did this plan field change".
 */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

/** The same JSON value, whatever the order of object keys. */
export const sameJson = (a: unknown, b: unknown) => canonicalJson(a) === canonicalJson(b);
