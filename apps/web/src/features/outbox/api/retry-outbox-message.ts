// POST /api/outbox/:messageId/retry: sends once more a message Heatpath gave up on.
import { outboxMessageSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { outboxKeys } from '../../../lib/query-keys';

export function retryOutboxMessage(messageId: string) {
  return apiRequest(`/api/outbox/${encodeURIComponent(messageId)}/retry`, outboxMessageSchema, {
    method: 'POST',
  });
}

export function useRetryOutboxMessage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryOutboxMessage,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: outboxKeys.all }),
  });
}
