// Loads one training case of the caller's workshop with everything its story needs (or 404).
// Learners never reach a withdrawn one.
import type { Transaction } from 'sequelize';
import {
  Customer,
  DiagnosticCase,
  TrainingCase,
  TreeVersion,
  Vehicle,
} from '../../db/models/index';
import { notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';

export type LoadedTrainingCase = TrainingCase & {
  case: DiagnosticCase & { vehicle: Vehicle; treeVersion: TreeVersion };
};

export const trainingCaseIncludes = [
  {
    model: DiagnosticCase,
    as: 'case',
    required: true,
    include: [
      { model: Vehicle, as: 'vehicle', include: [{ model: Customer, as: 'customer' }] },
      { model: Customer, as: 'customer' },
      { model: TreeVersion, as: 'treeVersion' },
    ],
  },
];

export async function findTrainingCase(options: {
  actor: Actor;
  trainingCaseId: string;
  /** A learner's view: withdrawn cases are not found. */
  forLearner: boolean;
  transaction?: Transaction;
}): Promise<LoadedTrainingCase> {
  const { actor, trainingCaseId, forLearner, transaction } = options;
  const found = await TrainingCase.findOne({
    where: {
      id: trainingCaseId,
      workshopId: actor.workshopId,
      ...(forLearner ? { withdrawn: false } : {}),
    },
    include: trainingCaseIncludes,
    transaction,
  });
  if (!found) throw notFound('That training case');
  return found as LoadedTrainingCase;
}
