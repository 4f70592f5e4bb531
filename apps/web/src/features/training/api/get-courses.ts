// GET /api/training/courses: the workshop's courses, each an ordered list of training cases.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from './keys';
import { trainingCoursesSchema } from './response-schemas';

export function getCourses(signal?: AbortSignal) {
  return apiRequest('/api/training/courses', trainingCoursesSchema, { signal });
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
