// An answer into the outbox: its note first (stored on its step before the answer moves the case
// on), then the answer with the key it was given.
import type { WalkEvent } from '@heatpath/fault-tree';
import { enqueueNote, enqueueWalk } from '../../lib/outbox';

export function queueAnswer(
  caseId: string,
  key: string,
  event: WalkEvent,
  label: string,
  note?: string,
): void {
  const text = note?.trim();
  if (text) void enqueueNote({ caseId, nodeId: event.nodeId, text });
  void enqueueWalk({ key, caseId, event, label });
}
