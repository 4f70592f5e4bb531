// What a learner sees: the casebook (courses meant for them and every training case, with their
// own attempts and best score but never the answer) and a case's replay with every step shown.
import { Op } from 'sequelize';
import type {
  Casebook,
  CasebookEntry,
  TrainingReplay,
  TrainingScore as Score,
} from '@heatpath/contracts';
import {
  TrainingAttempt,
  TrainingCase,
  TrainingCourse,
  TrainingCourseItem,
  TrainingSignOff,
  User,
} from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findTrainingCase, trainingCaseIncludes } from './find-training-case';
import type { LoadedTrainingCase } from './find-training-case';
import { trainingStoryOf } from './training-story';
import type { TrainingStory } from './training-story';

function better(a: Score | null, b: Score): Score {
  if (a === null) return b;
  const ratio = (s: Score) => (s.maxScore === 0 ? 1 : s.score / s.maxScore);
  return ratio(b) > ratio(a) ? b : a;
}

async function attemptsOf(actor: Actor, trainingCaseIds: string[]) {
  const rows = await TrainingAttempt.findAll({
    where: {
      workshopId: actor.workshopId,
      apprenticeId: actor.userId,
      trainingCaseId: { [Op.in]: trainingCaseIds },
    },
    attributes: ['trainingCaseId', 'status', 'score', 'maxScore'],
  });
  const byCase = new Map<string, { attempts: number; best: Score | null }>();
  for (const row of rows) {
    const entry = byCase.get(row.trainingCaseId) ?? { attempts: 0, best: null };
    entry.attempts += 1;
    if (row.status === 'finished')
      entry.best = better(entry.best, { score: row.score, maxScore: row.maxScore });
    byCase.set(row.trainingCaseId, entry);
  }
  return byCase;
}

/** The story's entry with the caller's own attempts and best score. */
export async function learnerEntry(actor: Actor, story: TrainingStory): Promise<CasebookEntry> {
  const mine = (await attemptsOf(actor, [story.entry.id])).get(story.entry.id);
  return { ...story.entry, attempts: mine?.attempts ?? 0, bestScore: mine?.best ?? null };
}

export async function getCasebook(actor: Actor): Promise<Casebook> {
  assertCan(actor, 'training.learn');
  const trainings = (await TrainingCase.findAll({
    where: { workshopId: actor.workshopId, withdrawn: false },
    include: trainingCaseIncludes,
    order: [['createdAt', 'ASC']],
  })) as LoadedTrainingCase[];
  const stories = await Promise.all(trainings.map(trainingStoryOf));
  const mine = await attemptsOf(
    actor,
    trainings.map((t) => t.id),
  );
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
  return {
    courses: courses.map((course) => {
      const signOff = signOffs.find((s) => s.courseId === course.id);
      return {
        id: course.id,
        title: course.title,
        description: course.description,
        forEveryone: course.apprenticeId === null,
        trainingCaseIds: [...(course.items ?? [])]
          .sort((a, b) => a.position - b.position)
          .map((item) => item.trainingCaseId)
          .filter((id) => available.has(id)),
        signOff: signOff
          ? {
              signedAt: signOff.signedAt.toISOString(),
              signedBy: { id: signOff.signedBy, name: signOff.signer?.name ?? 'The lead' },
              note: signOff.note,
            }
          : null,
      };
    }),
    cases: stories.map((story) => ({
      ...story.entry,
      attempts: mine.get(story.entry.id)?.attempts ?? 0,
      bestScore: mine.get(story.entry.id)?.best ?? null,
    })),
  };
}

export async function getReplay(options: {
  actor: Actor;
  trainingCaseId: string;
}): Promise<TrainingReplay> {
  const { actor, trainingCaseId } = options;
  assertCan(actor, 'training.learn');
  const training = await findTrainingCase({ actor, trainingCaseId, forLearner: true });
  const story = await trainingStoryOf(training);
  return {
    trainingCase: await learnerEntry(actor, story),
    teachingNote: story.teachingNote,
    steps: story.steps,
    outcome: story.outcome,
    findings: story.findings,
  };
}
