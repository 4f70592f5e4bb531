// What a delivered item changes in the cached case: an answer's reply carries the walk and the
// case's status, permissions and findings (so the case is not read again after each answer); a
// note or a photo is added to the case as the server stored it.
import type { CaseDetail } from '@heatpath/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { casesKeys } from '../query-keys';
import type { Delivery } from './send-item';

export function applyDelivery(queryClient: QueryClient, delivery: Delivery): void {
  const key = casesKeys.detail(delivery.item.caseId);
  queryClient.setQueryData<CaseDetail>(key, (old) => {
    if (!old) return old;
    switch (delivery.item.kind) {
      case 'walk': {
        const { walk, case: changes } = delivery.reply as Extract<
          Delivery,
          { item: { kind: 'walk' } }
        >['reply'];
        return {
          ...old,
          walk,
          ...(changes ?? { status: old.status === 'open' ? 'in_diagnosis' : old.status }),
        };
      }
      case 'note': {
        const note = delivery.reply as Extract<Delivery, { item: { kind: 'note' } }>['reply'];
        return old.notes.some((known) => known.id === note.id)
          ? old
          : { ...old, notes: [...old.notes, note] };
      }
      case 'photo': {
        const attachment = delivery.reply as Extract<
          Delivery,
          { item: { kind: 'photo' } }
        >['reply'];
        return old.attachments.some((known) => known.id === attachment.id)
          ? old
          : { ...old, attachments: [...old.attachments, attachment] };
      }
    }
  });
  // The case lists show status and dates: they are read again when next shown.
  void queryClient.invalidateQueries({ queryKey: casesKeys.lists(), refetchType: 'none' });
  // A server without the case's changes in its reply: read the case again for them.
  if (delivery.item.kind === 'walk' && !('case' in delivery.reply && delivery.reply.case)) {
    void queryClient.invalidateQueries({ queryKey: casesKeys.detail(delivery.item.caseId) });
  }
}
