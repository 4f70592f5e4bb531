// The training cases the lead has marked, newest first.
import type { TrainingCaseSummary } from '@heatpath/contracts';
import { TrainingCase } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { trainingCaseIncludes } from './find-training-case';
import type { LoadedTrainingCase } from './find-training-case';
import { summariseTrainingCase } from './training-case-summary';

export async function listTrainingCases(options: { actor: Actor }): Promise<TrainingCaseSummary[]> {
  const { actor } = options;
  assertCan(actor, 'training.manage');
  const rows = (await TrainingCase.findAll({
    where: { workshopId: actor.workshopId },
    include: trainingCaseIncludes,
    order: [['createdAt', 'DESC']],
  })) as LoadedTrainingCase[];
  return Promise.all(rows.map(summariseTrainingCase));
}
