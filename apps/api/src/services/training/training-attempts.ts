// Scored prediction attempts. Each prediction is checked against the attempt's current step,
// stored as its own row, and only then is the step revealed; a retry of a stored prediction
// gets the same answer, a different one for a step already answered is refused.
import { UniqueConstraintError } from 'sequelize';
import type { Transaction } from 'sequelize';
import { maxScoreOf, scorePrediction } from '@heatpath/fault-tree';
import type {
  AttemptStep,
  CasebookEntry,
  PredictionRequest,
  TrainingAttempt as TrainingAttemptView,
} from '@heatpath/contracts';
import { TrainingAttempt, TrainingPrediction } from '../../db/models/index';
import { AppError, conflict, notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findTrainingCase } from './find-training-case';
import { concealed, trainingStoryOf } from './training-story';
import type { TrainingStory } from './training-story';
import { learnerEntry } from './casebook';
import { withTransaction } from '../../db/with-transaction';

/** The first step still waiting for a prediction, or null when every asked step is answered. */
function currentIndex(story: TrainingStory, predicted: ReadonlySet<number>): number | null {
  const index = story.plans.findIndex((plan, i) => plan !== null && !predicted.has(i));
  return index === -1 ? null : index;
}

export function presentAttempt(
  story: TrainingStory,
  entry: CasebookEntry,
  attempt: TrainingAttempt,
  predictions: readonly TrainingPrediction[],
): TrainingAttemptView {
  const byIndex = new Map(predictions.map((p) => [p.stepIndex, p]));
  const steps: AttemptStep[] = [];
  let current: TrainingAttemptView['current'] = null;
  for (const [index, step] of story.steps.entries()) {
    const plan = story.plans[index] ?? null;
    const made = byIndex.get(index);
    if (plan === null) {
      steps.push({ step, prediction: null });
      continue;
    }
    if (made === undefined) {
      current = {
        step: concealed(step),
        ask: {
          kind: plan.kind,
          question: plan.question,
          options: plan.options.map((o) => ({ id: o.id, label: o.label })),
          maxPoints: plan.maxPoints,
        },
      };
      break;
    }
    steps.push({
      step,
      prediction: {
        kind: plan.kind,
        question: plan.question,
        options: plan.options.map((o) => ({ id: o.id, label: o.label })),
        maxPoints: plan.maxPoints,
        chosenId: made.chosenId,
        correctId: made.correctId,
        correct: made.points === made.maxPoints,
        points: made.points,
      },
    });
  }
  const finished = attempt.status === 'finished';
  return {
    id: attempt.id,
    trainingCaseId: attempt.trainingCaseId,
    status: attempt.status,
    startedAt: attempt.startedAt.toISOString(),
    finishedAt: attempt.finishedAt?.toISOString() ?? null,
    score: attempt.score,
    maxScore: attempt.maxScore,
    steps,
    current,
    trainingCase: entry,
    teachingNote: finished ? story.teachingNote : null,
    outcome: finished ? story.outcome : null,
    findings: finished ? story.findings : null,
  };
}

async function loadAttempt(actor: Actor, attemptId: string, transaction?: Transaction) {
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

async function view(actor: Actor, attempt: TrainingAttempt, transaction?: Transaction) {
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
  const entry = await learnerEntry(actor, story);
  return { story, predictions, present: () => presentAttempt(story, entry, attempt, predictions) };
}

export async function startAttempt(options: { actor: Actor; trainingCaseId: string }) {
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
  return presentAttempt(story, await learnerEntry(actor, story), attempt, []);
}

export async function getAttempt(options: { actor: Actor; attemptId: string }) {
  assertCan(options.actor, 'training.learn');
  const attempt = await loadAttempt(options.actor, options.attemptId);
  return (await view(options.actor, attempt)).present();
}

export async function submitPrediction(options: {
  actor: Actor;
  attemptId: string;
  prediction: PredictionRequest;
}): Promise<TrainingAttemptView> {
  const { actor, attemptId, prediction } = options;
  assertCan(actor, 'training.learn');
  try {
    return await withTransaction(async (transaction) => {
      const attempt = await loadAttempt(actor, attemptId, transaction);
      if (attempt.apprenticeId !== actor.userId) throw notFound('That attempt');
      const { story, predictions, present } = await view(actor, attempt, transaction);
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
