// Whether a newer build of Heatpath has taken over this tablet's service worker while a page of
// the older one is open. The page is never reloaded for it: a technician may be typing a reading,
// so the shell offers the reload and the person chooses when.
import { useSyncExternalStore } from 'react';

let updateReady = false;
const listeners = new Set<() => void>();

function subscribe(onChange: () => void): () => void {
  listeners.add(onChange);
  return () => listeners.delete(onChange);
}

/** Called when the service worker of a newer build controls a page an older one controlled. */
export function announceUpdate(): void {
  updateReady = true;
  for (const listener of listeners) listener();
}

export function useUpdateReady(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => updateReady,
    () => false,
  );
}
