// A training case's replay for a learner: every step shown, with the teaching note and outcome.
import type { TrainingReplay } from '@heatpath/contracts';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findTrainingCase } from './find-training-case';
import { getLearnerEntry } from './learner-attempts';
import { trainingStoryOf } from './training-story';

export async function getTrainingReplay(options: {
  actor: Actor;
  trainingCaseId: string;
}): Promise<TrainingReplay> {
  const { actor, trainingCaseId } = options;
  assertCan(actor, 'training.learn');
  const training = await findTrainingCase({ actor, trainingCaseId, forLearner: true });
  const story = await trainingStoryOf(training);
  return {
    trainingCase: await getLearnerEntry({ actor, story }),
    teachingNote: story.teachingNote,
    steps: story.steps,
    outcome: story.outcome,
    findings: story.findings,
  };
}
