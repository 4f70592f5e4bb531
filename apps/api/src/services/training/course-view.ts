// A course as the lead reads it: its cases in order and the apprentice it is for.
import type { TrainingCourse as TrainingCourseView } from '@heatpath/contracts';
import { DiagnosticCase, TrainingCase, TrainingCourseItem, User } from '../../db/models/index';
import type { TrainingCourse } from '../../db/models/index';
import type { Actor } from '../../policies/permissions';
import { presentCourse } from '../../presenters/training.presenter';

/** A course with its cases (in order) and apprentice, shaped for the lead. */
export async function loadCourseView(options: {
  actor: Actor;
  course: TrainingCourse;
}): Promise<TrainingCourseView> {
  const { actor, course } = options;
  const items = await TrainingCourseItem.findAll({
    where: { courseId: course.id },
    include: [
      {
        model: TrainingCase,
        as: 'trainingCase',
        where: { workshopId: actor.workshopId },
        include: [{ model: DiagnosticCase, as: 'case', attributes: ['symptom'] }],
      },
    ],
    order: [['position', 'ASC']],
  });
  const apprentice = course.apprenticeId
    ? await User.findOne({
        where: { id: course.apprenticeId, workshopId: actor.workshopId },
        attributes: ['id', 'name'],
      })
    : null;
  return presentCourse(course, items, apprentice);
}
