/**
 * The only place that calls fetch. Adds the base URL, sends and reads JSON, and turns
 * any answer that is not ok into an ApiError built from the problem details.
 */
import type { FieldError } from '../contracts/enums';

export type { FieldError };

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly errors: FieldError[] = [],
    readonly body: Record<string, unknown> = {},
    /** Seconds to wait before trying again (a 429's or 503's Retry-After), when the server said. */
    readonly retryAfter: number | null = null,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/** Retry-After in seconds (RFC 9110 §10.2.3: delay-seconds or an HTTP date), or the body's `retryAfter`. */
function retryAfterOf(header: string | null | undefined, body: { retryAfter?: unknown }): number | null {
  if (header && /^\d+$/.test(header.trim())) return Number(header.trim());
  const date = header ? Date.parse(header) : NaN;
  if (Number.isFinite(date)) return Math.max(0, Math.ceil((date - Date.now()) / 1000));
  return typeof body.retryAfter === 'number' && body.retryAfter >= 0 ? Math.ceil(body.retryAfter) : null;
}

export const BASE_URL = process.env.EXPO_PUBLIC_API_URL ?? '';

let accessToken: string | null = null;
let onUnauthorized: (() => void) | null = null;
export function setAccessToken(token: string | null) {
  accessToken = token;
}
/** Called when a request made with a token is refused with 401: the session has ended. */
export function setUnauthorizedHandler(handler: (() => void) | null) {
  onUnauthorized = handler;
}

/** Accept and Authorization headers every request sends (accepting problem details too). */
export function requestHeaders(accept = 'application/json'): Record<string, string> {
  const headers: Record<string, string> = { Accept: `${accept}, application/problem+json` };
  if (accessToken) headers.Authorization = `Bearer ${accessToken}`;
  return headers;
}

/** The ApiError for an answer that is not ok, from its problem details (when it has any). */
export function errorFromAnswer(
  status: number,
  text: string,
  sentToken: boolean,
  retryAfterHeader?: string | null,
): ApiError {
  if (status === 401 && sentToken) onUnauthorized?.();
  let p: { code?: string; detail?: string; errors?: FieldError[]; retryAfter?: unknown } = {};
  try {
    p = text ? JSON.parse(text) : {};
  } catch {
    /* not problem details */
  }
  return new ApiError(
    status,
    p.code ?? 'http_error',
    p.detail ?? `The server answered ${status}.`,
    p.errors ?? [],
    p as Record<string, unknown>,
    retryAfterOf(retryAfterHeader, p),
  );
}

/** Sends the request; the answer's text when it is ok, an ApiError otherwise. */
async function send(path: string, init: RequestInit): Promise<{ status: number; text: string }> {
  const headers = new Headers(init.headers);
  for (const [k, v] of Object.entries(requestHeaders())) headers.set(k, v);
  if (init.body && typeof init.body === 'string' && !headers.has('Content-Type'))
    headers.set('Content-Type', 'application/json');
  const res = await fetch(`${BASE_URL}${path}`, { ...init, headers, credentials: 'include' });
  const text = await res.text();
  if (!res.ok) throw errorFromAnswer(res.status, text, headers.has('Authorization'), res.headers.get('Retry-After'));
  return { status: res.status, text };
}

/** A request whose ok answer is a JSON body of type T; an answer without one is an ApiError. */
export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  const { status, text } = await send(path, init);
  try {
    return JSON.parse(text) as T;
  } catch {
    throw new ApiError(status, 'bad_response', 'The server answered without the data it should send. Try again.');
  }
}

/** A request whose ok answer has no body (204 No Content); any body it has is ignored. */
export async function apiFetchVoid(path: string, init: RequestInit = {}): Promise<void> {
  await send(path, init);
}

/** Builds a query string from defined values only. */
export function query(params: Record<string, string | number | undefined | null>): string {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== null && v !== '') q.set(k, String(v));
  const s = q.toString();
  return s ? `?${s}` : '';
}

/**
 * Like apiFetch, for a file the server sends (the job CSV): the same base URL, bearer
 * token and ApiError on failure, but the body comes back as a Blob, not JSON.
 */
export async function apiFetchBlob(path: string, accept: string): Promise<Blob> {
  const headers = requestHeaders(accept);
  const res = await fetch(`${BASE_URL}${path}`, { headers, credentials: 'include' });
  if (res.ok) return res.blob();
  throw errorFromAnswer(res.status, await res.text(), 'Authorization' in headers, res.headers.get('Retry-After'));
}
