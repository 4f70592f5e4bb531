// Starts a scored prediction attempt on a training case for the learner (finished at once when
// the case asks nothing).
import { maxScoreOf } from '@heatpath/fault-tree';
import type { TrainingAttempt as TrainingAttemptView } from '@heatpath/contracts';
import { TrainingAttempt } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentAttempt } from '../../presenters/training.presenter';
import { currentIndex } from './attempt-progress';
import { findTrainingCase } from './find-training-case';
import { getLearnerEntry } from './learner-attempts';
import { trainingStoryOf } from './training-story';

export async function startTrainingAttempt(options: {
  actor: Actor;
  trainingCaseId: string;
}): Promise<TrainingAttemptView> {
  const { actor, trainingCaseId } = options;
  assertCan(actor, 'training.learn');
  const training = await findTrainingCase({ actor, trainingCaseId, forLearner: true });
  const story = await trainingStoryOf(training);
  const maxScore = maxScoreOf(story.plans);
  const nothingToAsk = currentIndex(story, new Set()) === null;
  const attempt = await TrainingAttempt.create({
    workshopId: actor.workshopId,
    trainingCaseId: training.id,
    apprenticeId: actor.userId,
    maxScore,
    ...(nothingToAsk ? { status: 'finished' as const, finishedAt: new Date() } : {}),
  });
  return presentAttempt(story, await getLearnerEntry({ actor, story }), attempt, []);
}
