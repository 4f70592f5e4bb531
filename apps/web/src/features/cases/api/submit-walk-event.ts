// POST /api/cases/:caseId/walk: one answer or step back. The idempotency key is made once per
// answer and sent again on every retry, so an answer whose reply was lost is stored only once.
import { walkEventResponseSchema } from '@heatpath/contracts';
import type { WalkEvent } from '@heatpath/fault-tree';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export interface SubmitWalkEventInput {
  caseId: string;
  idempotencyKey: string;
  event: WalkEvent;
  signal?: AbortSignal | undefined;
}

export function submitWalkEvent({ caseId, idempotencyKey, event, signal }: SubmitWalkEventInput) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}/walk`, walkEventResponseSchema, {
    method: 'POST',
    body: { idempotencyKey, event },
    signal,
  });
}

/**
 * The cache is updated by the caller (useWalkAnswers), which also owns retries. Sent even when
 * the browser says it is offline, so a failure shows at once as "not saved yet" instead of the
 * request waiting silently; the caller retries when the connection returns.
 */
export function useSubmitWalkEvent() {
  return useMutation({ mutationFn: submitWalkEvent, networkMode: 'always' });
}
