// The workshop's courses, oldest first.
import type { TrainingCourse as TrainingCourseView } from '@heatpath/contracts';
import { TrainingCourse } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { loadCourseView } from './course-view';

export async function listCourses(options: { actor: Actor }): Promise<TrainingCourseView[]> {
  const { actor } = options;
  assertCan(actor, 'training.manage');
  const courses = await TrainingCourse.findAll({
    where: { workshopId: actor.workshopId },
    order: [['createdAt', 'ASC']],
  });
  return Promise.all(courses.map((course) => loadCourseView({ actor, course })));
}
