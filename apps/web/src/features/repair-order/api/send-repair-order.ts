// POST /api/cases/:caseId/findings/send: e-mails an approved revision with its PDF. The message
// goes to the outbox at once; its status on this screen follows the worker.
import { repairOrderSendSchema, type SendRepairOrderRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { repairOrderKeys } from '../../../lib/query-keys';

export function sendRepairOrder({ caseId, ...body }: SendRepairOrderRequest & { caseId: string }) {
  return apiRequest(
    `/api/cases/${encodeURIComponent(caseId)}/findings/send`,
    repairOrderSendSchema,
    { method: 'POST', body },
  );
}

export function useSendRepairOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: sendRepairOrder,
    onSuccess: (_sent, { caseId }) =>
      queryClient.invalidateQueries({ queryKey: repairOrderKeys.detail(caseId) }),
  });
}
