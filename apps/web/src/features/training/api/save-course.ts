// POST /api/training/courses (a new course) and PUT /api/training/courses/:courseId (the whole
// course again, with its cases in their new order).
import { trainingCourseSchema, type CourseRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export interface SaveCourseInput {
  /** Absent for a new course. */
  courseId?: string | undefined;
  course: CourseRequest;
}

export function saveCourse({ courseId, course }: SaveCourseInput) {
  return courseId
    ? apiRequest(`/api/training/courses/${encodeURIComponent(courseId)}`, trainingCourseSchema, {
        method: 'PUT',
        body: course,
      })
    : apiRequest('/api/training/courses', trainingCourseSchema, { method: 'POST', body: course });
}

export function useSaveCourse() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveCourse,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trainingKeys.all }),
  });
}
