// GET /api/training/courses: the workshop's courses, each an ordered list of training cases.
import { trainingCoursesResponseSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function getCourses(signal?: AbortSignal) {
  return apiRequest('/api/training/courses', trainingCoursesResponseSchema, { signal });
}

export function coursesQueryOptions() {
  return queryOptions({
    queryKey: trainingKeys.courses(),
    queryFn: ({ signal }) => getCourses(signal),
  });
}

export function useCourses() {
  return useQuery(coursesQueryOptions());
}
