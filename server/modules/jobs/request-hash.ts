/**
 * The fingerprint of a request body kept beside its Idempotency-Key: SHA-256 of the JSON
 * as received, with object keys sorted at every level, so a resend that only orders its
 * keys differently is the same request and any other difference is not. It hashes the
 * body as sent rather than as parsed, so a later change to the schema's defaults cannot
 * turn a reading queued offline before an upgrade into a "different" request.
 */
import { createHash } from 'node:crypto';
import { canonicalJson } from '@/lib/format/canonical-json';
import { AppError } from '@/server/errors/app-error';

export const requestHash = (body: unknown) => createHash('sha256').update(canonicalJson(body)).digest('hex');

/**
 * A stored request answers again under its key only for the same body: another body under
 * a known key is 422 idempotency_key_reused. `what` names it: "reading on this job".
 * A row stored before hashes were kept (null) answers as before.
 */
export function assertSameRequest(stored: string | null | undefined, hash: string, what: string): void {
  if (stored != null && stored !== hash)
    throw new AppError(
      422,
      'idempotency_key_reused',
      `This Idempotency-Key was already used for a different ${what}. Send a new key with a new one.`,
    );
}
