import { useEffect, useState } from 'react';

/**
 * False during the static (server) render and the first client render, true after: parts that depend on
 * the window's width, the session or the history render only then, so hydration sees the same HTML.
 */
export function useHydrated(): boolean {
  const [hydrated, setHydrated] = useState(false);
  useEffect(() => setHydrated(true), []);
  return hydrated;
}
