import { onlineManager } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';

/** True while the server can be reached (browser events and failed requests, see hooks/connection.ts). */
export function useIsOnline(): boolean {
  return useSyncExternalStore(
    (listener) => onlineManager.subscribe(listener),
    () => onlineManager.isOnline(),
    () => true,
  );
}
