/**
 * The fingerprint of a request body kept beside its Idempotency-Key: SHA-256 of the JSON
 * as received, with object keys sorted at every level, so a resend that only orders its
 * keys differently is the same request and any other difference is not. It hashes the
 * body as sent rather than as parsed, so a later change to the schema's defaults cannot
 * turn a reading queued offline before an upgrade into a "different" request.
 */
import { createHash } from 'node:crypto';

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

export const requestHash = (body: unknown) => createHash('sha256').update(canonicalJson(body)).digest('hex');
