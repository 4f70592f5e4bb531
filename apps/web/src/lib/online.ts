// Whether the tablet has a network, as TanStack Query sees it: queries pause while it is false
// and carry on when it returns, and the screens read the same flag through useOnline().
import { onlineManager } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';

function subscribe(onChange: () => void): () => void {
  return onlineManager.subscribe(onChange);
}

function isOnline(): boolean {
  return onlineManager.isOnline();
}

export function useOnline(): boolean {
  return useSyncExternalStore(subscribe, isOnline, () => true);
}

/**
 * Starts from what the browser knows at page load. TanStack Query assumes a network until the
 * first `offline` event, but a page reloaded with no network never receives one.
 */
export function startOnlineFromBrowser(): void {
  if (typeof navigator !== 'undefined' && typeof navigator.onLine === 'boolean') {
    onlineManager.setOnline(navigator.onLine);
  }
}
