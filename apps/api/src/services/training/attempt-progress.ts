// Where a prediction attempt stands: the step it waits on, and loading it for its learner.
import type { Transaction } from 'sequelize';
import { TrainingAttempt, TrainingPrediction } from '../../db/models/index';
import { notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';
import { findTrainingCase } from './find-training-case';
import { getLearnerEntry } from './learner-attempts';
import { trainingStoryOf } from './training-story';
import type { TrainingStory } from './training-story';

/** The first step still waiting for a prediction, or null when every asked step is answered. */
export function currentIndex(story: TrainingStory, predicted: ReadonlySet<number>): number | null {
  const index = story.plans.findIndex((plan, i) => plan !== null && !predicted.has(i));
  return index === -1 ? null : index;
}

/** The attempt, locked for update inside `transaction`; only its learner or the lead reach it. */
export async function findTrainingAttempt(options: {
  actor: Actor;
  attemptId: string;
  transaction?: Transaction;
}) {
  const { actor, attemptId, transaction } = options;
  const attempt = await TrainingAttempt.findOne({
    where: { id: attemptId, workshopId: actor.workshopId },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  // An apprentice reaches only their own attempts; the lead may read any in the workshop.
  if (!attempt || (actor.role !== 'lead' && attempt.apprenticeId !== actor.userId))
    throw notFound('That attempt');
  return attempt;
}

/** What showing an attempt needs: its case's story, its predictions and the learner's entry. */
export async function loadAttemptView(options: {
  actor: Actor;
  attempt: TrainingAttempt;
  transaction?: Transaction;
}) {
  const { actor, attempt, transaction } = options;
  const training = await findTrainingCase({
    actor,
    trainingCaseId: attempt.trainingCaseId,
    forLearner: false,
    transaction,
  });
  const story = await trainingStoryOf(training);
  const predictions = await TrainingPrediction.findAll({
    where: { attemptId: attempt.id },
    order: [['stepIndex', 'ASC']],
    transaction,
  });
  const entry = await getLearnerEntry({ actor, story });
  return { story, predictions, entry };
}
