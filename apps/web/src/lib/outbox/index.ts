// The outbox's public face: queue answers, notes and photos; read what waits.
export type { NoteItem, OutboxItem, OutboxState, PhotoItem, WalkItem } from './outbox-item';
export { isPending } from './outbox-item';
export {
  discardOutboxItem,
  enqueueNote,
  enqueuePhoto,
  enqueueWalk,
  holdOutboxItems,
  newOutboxKey,
  outboxSender,
  resetOutboxForTests,
} from './outbox';
export { signInToSend, type SenderStatus } from './outbox-sender';
export {
  useOutbox,
  useOutboxConnection,
  useOutboxReady,
  useOutboxStatus,
  usePhotoUrl,
  useQueuedPhotos,
} from './use-outbox';
