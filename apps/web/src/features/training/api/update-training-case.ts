// PATCH /api/training/cases/:trainingCaseId: a new note, difficulty or hiding, or withdraw it
// from the casebook (and put it back).
import { trainingCaseSummarySchema, type UpdateTrainingCaseRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export interface UpdateTrainingCaseInput {
  trainingCaseId: string;
  changes: UpdateTrainingCaseRequest;
}

export function updateTrainingCase({ trainingCaseId, changes }: UpdateTrainingCaseInput) {
  return apiRequest(
    `/api/training/cases/${encodeURIComponent(trainingCaseId)}`,
    trainingCaseSummarySchema,
    { method: 'PATCH', body: changes },
  );
}

export function useUpdateTrainingCase() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateTrainingCase,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trainingKeys.all }),
  });
}
