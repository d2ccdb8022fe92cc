import { useSyncExternalStore } from 'react';

const subscribe = () => () => undefined;

/**
 * False during the static (server) render and while hydrating, true after: parts that depend on the
 * window's width, the session or the history render only then, so hydration sees the same HTML.
 * (useSyncExternalStore's server snapshot is what React uses for both.)
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => true,
    () => false,
  );
}
