// POST /api/cases/:caseId/notes: a free note on the case or one of its steps. Like answers, a
// note carries an idempotency key made once and reused on retry.
import { caseNoteSchema, type AddNoteRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys } from '../../../lib/query-keys';

export interface AddCaseNoteInput {
  caseId: string;
  note: AddNoteRequest;
  signal?: AbortSignal | undefined;
}

export function addCaseNote({ caseId, note, signal }: AddCaseNoteInput) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}/notes`, caseNoteSchema, {
    method: 'POST',
    body: note,
    signal,
  });
}

export function useAddCaseNote() {
  const queryClient = useQueryClient();
  return useMutation({
    // Fail at once when offline, so the screen can say so instead of the request waiting silently.
    networkMode: 'always',
    mutationFn: addCaseNote,
    onSuccess: (_note, { caseId }) =>
      queryClient.invalidateQueries({ queryKey: casesKeys.detail(caseId) }),
  });
}
