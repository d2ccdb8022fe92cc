import { ApiError } from './client';

/** One sentence a technician can act on, for any failure of an API call. */
export function describeError(err: unknown): string {
  if (err instanceof ApiError) {
    if (err.status === 404) return 'That item is not in the library (it may have been removed).';
    if (err.status === 401) return 'Please sign in to do this.';
    if (err.status === 403) return 'Your account is not allowed to do this.';
    if (err.status === 429) return 'Too many attempts. Wait a minute and try again.';
    if (err.status === 503) return 'The library is briefly unavailable. Try again in a moment.';
    if (err.status >= 500) return 'The server had a problem. Try again; if it keeps happening, tell your shop lead.';
    return err.message;
  }
  if (err instanceof TypeError) return 'No connection to Specbench. Check the network and try again.';
  return 'Something went wrong. Try again.';
}
