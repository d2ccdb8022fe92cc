/**
 * The only place that calls fetch. Adds the base URL, sends and reads JSON, and turns
 * any answer that is not ok into an ApiError built from the problem details.
 */
export type FieldError = { path: string; message: string };

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly errors: FieldError[] = [],
    readonly body: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

const BASE_URL = process.env.EXPO_PUBLIC_API_URL ?? '';

let accessToken: string | null = null;
let onUnauthorized: (() => void) | null = null;
export function setAccessToken(token: string | null) {
  accessToken = token;
}
/** The session's bearer token, for the one request apiFetch cannot make (upload with progress, lib/api/upload.ts). */
export const getAccessToken = () => accessToken;
/** Called when a request made with a token is refused with 401: the session has ended. */
export function setUnauthorizedHandler(handler: (() => void) | null) {
  onUnauthorized = handler;
}

export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  const headers = new Headers(init.headers);
  headers.set('Accept', 'application/json, application/problem+json');
  if (init.body && typeof init.body === 'string' && !headers.has('Content-Type')) headers.set('Content-Type', 'application/json');
  if (accessToken) headers.set('Authorization', `Bearer ${accessToken}`);
  const res = await fetch(`${BASE_URL}${path}`, { ...init, headers, credentials: 'include' });
  const text = await res.text();
  let body: unknown = null;
  if (text) {
    try { body = JSON.parse(text); } catch { body = null; }
  }
  if (!res.ok) {
    if (res.status === 401 && headers.has('Authorization')) onUnauthorized?.();
    const p = (body ?? {}) as { code?: string; detail?: string; errors?: FieldError[] };
    throw new ApiError(res.status, p.code ?? 'http_error', p.detail ?? `The server answered ${res.status}.`, p.errors ?? [], (body ?? {}) as Record<string, unknown>);
  }
  return body as T;
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
  const headers = new Headers({ Accept: `${accept}, application/problem+json` });
  if (accessToken) headers.set('Authorization', `Bearer ${accessToken}`);
  const res = await fetch(`${BASE_URL}${path}`, { headers, credentials: 'include' });
  if (res.ok) return res.blob();
  if (res.status === 401 && accessToken) onUnauthorized?.();
  const p = (await res.json().catch(() => ({}))) as { code?: string; detail?: string; errors?: FieldError[] };
  throw new ApiError(res.status, p.code ?? 'http_error', p.detail ?? `The server answered ${res.status}.`, p.errors ?? [], p as Record<string, unknown>);
}
