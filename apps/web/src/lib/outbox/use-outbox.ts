// Screens read the outbox through these hooks: a case's queued items, its queued photos, whether
// the queue on this device has been read yet, and whether sending waits for a sign-in.
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useSyncExternalStore } from 'react';
import type { OutboxItem, PhotoItem } from './outbox-item';
import { connectOutbox, outboxSender, outboxStore } from './outbox';
import type { SenderStatus } from './outbox-sender';

export function useOutbox(caseId: string): readonly OutboxItem[] {
  const store = outboxStore();
  return useSyncExternalStore(store.subscribe, () => store.forCase(caseId));
}

export function useOutboxReady(): boolean {
  const store = outboxStore();
  return useSyncExternalStore(store.subscribe, store.isReady);
}

export function useQueuedPhotos(caseId: string, nodeId: string | null): readonly PhotoItem[] {
  const items = useOutbox(caseId);
  return useMemo(
    () =>
      items.filter(
        (item): item is PhotoItem =>
          item.kind === 'photo' && item.nodeId === nodeId && item.state !== 'refused',
      ),
    [items, nodeId],
  );
}

export function useOutboxStatus(): SenderStatus {
  const sender = outboxSender();
  return useSyncExternalStore(sender.subscribe, sender.status);
}

/** Keeps the outbox connected to this query client and person, and sends when back online. */
export function useOutboxConnection(userId: string): void {
  const queryClient = useQueryClient();
  useEffect(() => {
    connectOutbox(queryClient, userId);
    const onOnline = () => outboxSender().kick();
    window.addEventListener('online', onOnline);
    return () => window.removeEventListener('online', onOnline);
  }, [queryClient, userId]);
}

/** A photo's bytes as an object URL for its thumbnail, released when it is no longer shown. */
export function usePhotoUrl(photo: PhotoItem): string | null {
  const url = useMemo(() => {
    try {
      return URL.createObjectURL(new Blob([photo.bytes], { type: photo.mediaType }));
    } catch {
      // No object URLs here (an old browser, a test): the tile shows the word "Photo".
      return null;
    }
  }, [photo.bytes, photo.mediaType]);
  useEffect(() => () => (url ? URL.revokeObjectURL(url) : undefined), [url]);
  return url;
}
