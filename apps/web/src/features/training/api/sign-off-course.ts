// POST /api/training/courses/:courseId/sign-offs: the lead signs an apprentice's course off as
// complete. Stored with the date and who signed; a 409 means it is signed off already.
import { signOffResponseSchema, type SignOffRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export interface SignOffInput {
  courseId: string;
  signOff: SignOffRequest;
}

export function signOffCourse({ courseId, signOff }: SignOffInput) {
  return apiRequest(
    `/api/training/courses/${encodeURIComponent(courseId)}/sign-offs`,
    signOffResponseSchema,
    { method: 'POST', body: signOff },
  );
}

export function useSignOffCourse() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOffCourse,
    // A 409 (signed off already, perhaps from another screen) also means the list is stale.
    onSettled: () => queryClient.invalidateQueries({ queryKey: trainingKeys.progress() }),
  });
}
