// The request that delivers each kind of item, with the idempotency key it was queued with.
// A request that has had no reply after `requestTimeoutMs` is treated as lost and tried again.
import {
  caseAttachmentSchema,
  caseDetailSchema,
  caseNoteSchema,
  walkEventResponseSchema,
  type CaseAttachment,
  type CaseNote,
} from '@heatpath/contracts';
import type { z } from 'zod';
import { apiRequest, apiRequestForm } from '../api-client';
import type { NoteItem, OutboxItem, PhotoItem, WalkItem } from './outbox-item';

const requestTimeoutMs = 20_000;

/** The answer's reply: the walk and what else changed on the case (read as optional, so a reply
 * without it still counts as delivered; the case is then read again). */
export const deliveredWalkSchema = walkEventResponseSchema.extend({
  case: caseDetailSchema
    .pick({ status: true, updatedAt: true, diagnosedAt: true, can: true, findings: true })
    .optional(),
});
export type DeliveredWalk = z.infer<typeof deliveredWalkSchema>;

export type Delivery =
  | { item: WalkItem; reply: DeliveredWalk }
  | { item: NoteItem; reply: CaseNote }
  | { item: PhotoItem; reply: CaseAttachment };

function timeout(): AbortSignal | undefined {
  return typeof AbortSignal.timeout === 'function'
    ? AbortSignal.timeout(requestTimeoutMs)
    : undefined;
}

function casePath(caseId: string, rest: string): string {
  return `/api/cases/${encodeURIComponent(caseId)}/${rest}`;
}

export async function sendItem(item: OutboxItem): Promise<Delivery> {
  const signal = timeout();
  switch (item.kind) {
    case 'walk':
      return {
        item,
        reply: await apiRequest(casePath(item.caseId, 'walk'), deliveredWalkSchema, {
          method: 'POST',
          body: { idempotencyKey: item.key, event: item.event },
          signal,
        }),
      };
    case 'note':
      return {
        item,
        reply: await apiRequest(casePath(item.caseId, 'notes'), caseNoteSchema, {
          method: 'POST',
          body: { idempotencyKey: item.key, nodeId: item.nodeId, text: item.text },
          signal,
        }),
      };
    case 'photo': {
      const form = new FormData();
      form.append('file', new File([item.bytes], item.name, { type: item.mediaType }), item.name);
      if (item.nodeId) form.append('nodeId', item.nodeId);
      form.append('photoOnly', 'true');
      form.append('idempotencyKey', item.key);
      return {
        item,
        reply: await apiRequestForm(
          casePath(item.caseId, 'attachments'),
          caseAttachmentSchema,
          form,
          signal ? { signal } : {},
        ),
      };
    }
  }
}
