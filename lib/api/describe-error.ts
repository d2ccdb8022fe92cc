import { ApiError } from './client';

/** "45 seconds", "2 minutes 23 seconds", "1 hour 5 minutes": the wait as a person says it. */
export function waitPhrase(seconds: number): string {
  const s = Math.max(1, Math.ceil(seconds));
  const unit = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  if (s < 60) return unit(s, 'second');
  if (s < 3600) return [unit(Math.floor(s / 60), 'minute'), s % 60 ? unit(s % 60, 'second') : ''].join(' ').trim();
  const m = Math.ceil((s % 3600) / 60);
  return [unit(Math.floor(s / 3600), 'hour'), m ? unit(m, 'minute') : ''].join(' ').trim();
}

/** One sentence a technician can act on, for any failure of an API call. */
export function describeError(err: unknown): string {
  if (err instanceof ApiError) {
    if (err.status === 404) return 'That item is not in the library (it may have been removed).';
    if (err.status === 401) return 'Please sign in to do this.';
    if (err.status === 403) return 'Your account is not allowed to do this.';
    if (err.status === 429)
      return err.retryAfter !== null
        ? `Too many attempts. Wait ${waitPhrase(err.retryAfter)} and try again.`
        : 'Too many attempts. Wait a few minutes and try again.';
    if (err.status === 503) return 'The library is briefly unavailable. Try again in a moment.';
    if (err.status >= 500) return 'The server had a problem. Try again; if it keeps happening, tell your shop lead.';
    return err.message;
  }
  if (err instanceof TypeError) return 'No connection to Specbench. Check the network and try again.';
  return 'Something went wrong. Try again.';
}
