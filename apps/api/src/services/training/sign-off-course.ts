// The lead signs an apprentice off for a course (once per apprentice and course).
import { UniqueConstraintError } from 'sequelize';
import type { SignOffRequest } from '@heatpath/contracts';
import { TrainingCourse, TrainingSignOff, User } from '../../db/models/index';
import { AppError, conflict, notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentSignOff } from '../../presenters/training.presenter';

export async function signOffCourse(options: {
  actor: Actor;
  courseId: string;
  request: SignOffRequest;
}) {
  const { actor, courseId, request } = options;
  assertCan(actor, 'training.manage');
  const course = await TrainingCourse.findOne({
    where: { id: courseId, workshopId: actor.workshopId },
  });
  if (!course) throw notFound('That course');
  const apprentice = await User.findOne({
    where: { id: request.apprenticeId, workshopId: actor.workshopId },
  });
  if (!apprentice) throw notFound('That apprentice');
  if (apprentice.role !== 'apprentice')
    throw new AppError('validation_failed', `${apprentice.name} is not an apprentice.`, {
      apprenticeId: 'Choose an apprentice.',
    });
  if (course.apprenticeId !== null && course.apprenticeId !== apprentice.id)
    throw conflict(`“${course.title}” is a course for another apprentice.`);
  try {
    const signed = await TrainingSignOff.create({
      courseId: course.id,
      apprenticeId: apprentice.id,
      workshopId: actor.workshopId,
      signedBy: actor.userId,
      note: request.note ?? null,
    });
    const signer = await User.findByPk(actor.userId, { attributes: ['id', 'name'] });
    return presentSignOff(signed, signer);
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw conflict(`${apprentice.name} is already signed off for “${course.title}”.`);
    throw error;
  }
}
