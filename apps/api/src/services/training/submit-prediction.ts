// Scored predictions. Each prediction is checked against the attempt's current step, stored as
// its own row, and only then is the step revealed; a retry of a stored prediction gets the same
// answer, a different one for a step already answered is refused.
import { UniqueConstraintError } from 'sequelize';
import { scorePrediction } from '@heatpath/fault-tree';
import type {
  PredictionRequest,
  TrainingAttempt as TrainingAttemptView,
} from '@heatpath/contracts';
import { TrainingPrediction } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError, conflict, notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentAttempt } from '../../presenters/training.presenter';
import { currentIndex, findTrainingAttempt, loadAttemptView } from './attempt-progress';

export async function submitPrediction(options: {
  actor: Actor;
  attemptId: string;
  prediction: PredictionRequest;
}): Promise<TrainingAttemptView> {
  const { actor, attemptId, prediction } = options;
  assertCan(actor, 'training.learn');
  try {
    return await withTransaction(async (transaction) => {
      const attempt = await findTrainingAttempt({ actor, attemptId, transaction });
      if (attempt.apprenticeId !== actor.userId) throw notFound('That attempt');
      const { story, predictions, entry } = await loadAttemptView({ actor, attempt, transaction });
      const present = () => presentAttempt(story, entry, attempt, predictions);
      const stored = predictions.find((p) => p.stepIndex === prediction.index);
      if (stored) {
        // The same prediction sent again (a retry on a bad connection) gets the same answer.
        if (stored.chosenId === prediction.optionId) return present();
        throw conflict(
          `Step ${prediction.index + 1} was already answered in this attempt; start a new attempt to choose again.`,
        );
      }
      if (attempt.status === 'finished')
        throw conflict('This attempt is finished; start a new one to try again.');
      const index = currentIndex(story, new Set(predictions.map((p) => p.stepIndex)));
      if (index !== prediction.index)
        throw conflict(
          index === null
            ? 'Every step of this attempt is answered.'
            : `Answer step ${index + 1} first; this attempt is there now.`,
        );
      const plan = story.plans[index];
      const step = story.steps[index];
      if (!plan || !step) throw new Error('current step without a plan');
      if (!plan.options.some((o) => o.id === prediction.optionId))
        throw new AppError('validation_failed', 'That is not one of the options for this step.', {
          optionId: 'Choose one of the options shown.',
        });
      const points = scorePrediction(plan, prediction.optionId);
      const made = await TrainingPrediction.create(
        {
          attemptId: attempt.id,
          stepIndex: index,
          workshopId: actor.workshopId,
          kind: plan.kind,
          nodeId: step.nodeId,
          stepTitle: step.title.slice(0, 200),
          chosenId: prediction.optionId,
          correctId: plan.correctId,
          points,
          maxPoints: plan.maxPoints,
        },
        { transaction },
      );
      predictions.push(made);
      const done = currentIndex(story, new Set(predictions.map((p) => p.stepIndex))) === null;
      await attempt.update(
        {
          score: attempt.score + points,
          ...(done ? { status: 'finished' as const, finishedAt: new Date() } : {}),
        },
        { transaction },
      );
      return present();
    });
  } catch (error) {
    // Two tabs sending different predictions for one step at the same moment: one is kept.
    if (error instanceof UniqueConstraintError)
      throw conflict('That step was answered a moment ago; reload to see what was kept.');
    throw error;
  }
}
