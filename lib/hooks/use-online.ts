/** Whether the device is online, as TanStack Query's onlineManager sees it (browser events on the web). */
import { useSyncExternalStore } from 'react';
import { onlineManager } from '@tanstack/react-query';

const subscribe = (fn: () => void) => onlineManager.subscribe(fn);
const isOnline = () => onlineManager.isOnline();

/** The static render and the first hydrated paint count as online. */
export function useOnline(): boolean {
  return useSyncExternalStore(subscribe, isOnline, () => true);
}
