// What a learner sees: the casebook (courses meant for them and every training case, with their
// own attempts and best score but never the answer).
import { Op } from 'sequelize';
import type { Casebook } from '@heatpath/contracts';
import {
  TrainingCase,
  TrainingCourse,
  TrainingCourseItem,
  TrainingSignOff,
  User,
} from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentCasebook } from '../../presenters/training.presenter';
import { trainingCaseIncludes } from './find-training-case';
import type { LoadedTrainingCase } from './find-training-case';
import { countLearnerAttempts } from './learner-attempts';
import { trainingStoryOf } from './training-story';

export async function getCasebook(options: { actor: Actor }): Promise<Casebook> {
  const { actor } = options;
  assertCan(actor, 'training.learn');
  const trainings = (await TrainingCase.findAll({
    where: { workshopId: actor.workshopId, withdrawn: false },
    include: trainingCaseIncludes,
    order: [['createdAt', 'ASC']],
  })) as LoadedTrainingCase[];
  const stories = await Promise.all(trainings.map(trainingStoryOf));
  const mine = await countLearnerAttempts({ actor, trainingCaseIds: trainings.map((t) => t.id) });
  const available = new Set(trainings.map((t) => t.id));
  const courses = await TrainingCourse.findAll({
    where: {
      workshopId: actor.workshopId,
      ...(actor.role === 'apprentice'
        ? { [Op.or]: [{ apprenticeId: null }, { apprenticeId: actor.userId }] }
        : {}),
    },
    include: [{ model: TrainingCourseItem, as: 'items' }],
    order: [['createdAt', 'ASC']],
  });
  const signOffs = await TrainingSignOff.findAll({
    where: { workshopId: actor.workshopId, apprenticeId: actor.userId },
    include: [{ model: User, as: 'signer' }],
  });
  return presentCasebook({ courses, signOffs, available, stories, mine });
}
