// Courses: an ordered set of training cases for one apprentice or for all of them. Saving a
// course replaces its list in one transaction, so the order is never half written.
import { Op } from 'sequelize';
import type { CourseRequest, TrainingCourse as TrainingCourseView } from '@heatpath/contracts';
import { TrainingCase, TrainingCourse, TrainingCourseItem, User } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError, notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { loadCourseView } from './course-view';

async function checkRequest(actor: Actor, request: CourseRequest) {
  if (request.apprenticeId) {
    const apprentice = await User.findOne({
      where: { id: request.apprenticeId, workshopId: actor.workshopId, role: 'apprentice' },
    });
    if (!apprentice)
      throw new AppError('validation_failed', 'Choose an apprentice of this workshop.', {
        apprenticeId: 'Choose an apprentice of this workshop, or everyone.',
      });
  }
  const found = await TrainingCase.count({
    where: { workshopId: actor.workshopId, id: { [Op.in]: request.trainingCaseIds } },
  });
  if (found !== request.trainingCaseIds.length)
    throw new AppError('validation_failed', 'Some of those cases are not in the casebook.', {
      trainingCaseIds: 'Choose training cases of this workshop.',
    });
}

export async function saveCourse(options: {
  actor: Actor;
  courseId?: string;
  request: CourseRequest;
}): Promise<TrainingCourseView> {
  const { actor, courseId, request } = options;
  assertCan(actor, 'training.manage');
  if (
    courseId &&
    !(await TrainingCourse.count({ where: { id: courseId, workshopId: actor.workshopId } }))
  )
    throw notFound('That course');
  await checkRequest(actor, request);
  const course = await withTransaction(async (transaction) => {
    const fields = {
      title: request.title,
      description: request.description ?? null,
      apprenticeId: request.apprenticeId,
    };
    let saved: TrainingCourse;
    if (courseId) {
      const existing = await TrainingCourse.findOne({
        where: { id: courseId, workshopId: actor.workshopId },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!existing) throw notFound('That course');
      saved = await existing.update(fields, { transaction });
      await TrainingCourseItem.destroy({ where: { courseId }, transaction });
    } else {
      saved = await TrainingCourse.create(
        { ...fields, workshopId: actor.workshopId, createdBy: actor.userId },
        { transaction },
      );
    }
    await TrainingCourseItem.bulkCreate(
      request.trainingCaseIds.map((trainingCaseId, position) => ({
        courseId: saved.id,
        trainingCaseId,
        position,
      })),
      { transaction },
    );
    return saved;
  });
  return loadCourseView({ actor, course });
}
