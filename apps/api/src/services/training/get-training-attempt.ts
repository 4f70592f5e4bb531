// One prediction attempt, as its learner (or the lead) sees it.
import type { TrainingAttempt as TrainingAttemptView } from '@heatpath/contracts';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentAttempt } from '../../presenters/training.presenter';
import { findTrainingAttempt, loadAttemptView } from './attempt-progress';

export async function getTrainingAttempt(options: {
  actor: Actor;
  attemptId: string;
}): Promise<TrainingAttemptView> {
  const { actor, attemptId } = options;
  assertCan(actor, 'training.learn');
  const attempt = await findTrainingAttempt({ actor, attemptId });
  const { story, entry, predictions } = await loadAttemptView({ actor, attempt });
  return presentAttempt(story, entry, attempt, predictions);
}
