// Apprentices' progress as the lead reads it (and each apprentice reads their own): cases
// reviewed, attempts, the average of their best scores, the steps they most often got wrong,
// each course's completion, and signing a course off.
import { Op, UniqueConstraintError } from 'sequelize';
import type {
  ApprenticeProgress,
  ApprenticeProgressDetail,
  SignOffRequest,
  WeakSpot,
} from '@heatpath/contracts';
import {
  DiagnosticCase,
  TrainingAttempt,
  TrainingCase,
  TrainingCourse,
  TrainingCourseItem,
  TrainingPrediction,
  TrainingSignOff,
  User,
} from '../../db/models/index';
import { AppError, conflict, notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

const weakSpotCount = 3;

function weakSpotsOf(predictions: readonly TrainingPrediction[]): WeakSpot[] {
  const byTitle = new Map<string, WeakSpot>();
  for (const p of predictions) {
    const spot = byTitle.get(p.stepTitle) ?? { title: p.stepTitle, wrong: 0, asked: 0 };
    spot.asked += 1;
    if (p.points < p.maxPoints) spot.wrong += 1;
    byTitle.set(p.stepTitle, spot);
  }
  return [...byTitle.values()]
    .filter((spot) => spot.wrong > 0)
    .sort(
      (a, b) =>
        b.wrong - a.wrong ||
        b.wrong / b.asked - a.wrong / a.asked ||
        a.title.localeCompare(b.title),
    )
    .slice(0, weakSpotCount);
}

async function progressOf(actor: Actor, apprentice: User): Promise<ApprenticeProgressDetail> {
  const attempts = await TrainingAttempt.findAll({
    where: { workshopId: actor.workshopId, apprenticeId: apprentice.id },
    include: [
      {
        model: TrainingCase,
        as: 'trainingCase',
        include: [{ model: DiagnosticCase, as: 'case', attributes: ['symptom'] }],
      },
    ],
    order: [['startedAt', 'DESC']],
  });
  const predictions = attempts.length
    ? await TrainingPrediction.findAll({
        where: { attemptId: { [Op.in]: attempts.map((a) => a.id) } },
      })
    : [];
  const best = new Map<string, number>();
  for (const a of attempts) {
    if (a.status !== 'finished') continue;
    const percent = a.maxScore === 0 ? 100 : (100 * a.score) / a.maxScore;
    best.set(a.trainingCaseId, Math.max(best.get(a.trainingCaseId) ?? 0, percent));
  }
  const courses = await TrainingCourse.findAll({
    where: {
      workshopId: actor.workshopId,
      [Op.or]: [{ apprenticeId: null }, { apprenticeId: apprentice.id }],
    },
    include: [{ model: TrainingCourseItem, as: 'items' }],
    order: [['createdAt', 'ASC']],
  });
  const signOffs = await TrainingSignOff.findAll({
    where: { workshopId: actor.workshopId, apprenticeId: apprentice.id },
    include: [{ model: User, as: 'signer', attributes: ['id', 'name'] }],
  });
  const percents = [...best.values()];
  return {
    apprentice: { id: apprentice.id, name: apprentice.name },
    casesReviewed: best.size,
    attempts: attempts.length,
    averageScorePercent:
      percents.length === 0
        ? null
        : Math.round((10 * percents.reduce((s, p) => s + p, 0)) / percents.length) / 10,
    weakSpots: weakSpotsOf(predictions),
    courses: courses.map((course) => {
      const items = course.items ?? [];
      const signOff = signOffs.find((s) => s.courseId === course.id);
      return {
        id: course.id,
        title: course.title,
        completedCases: items.filter((item) => best.has(item.trainingCaseId)).length,
        totalCases: items.length,
        signOff: signOff
          ? {
              signedAt: signOff.signedAt.toISOString(),
              signedBy: { id: signOff.signedBy, name: signOff.signer?.name ?? 'Unknown' },
              note: signOff.note,
            }
          : null,
      };
    }),
    history: attempts.map((a) => ({
      id: a.id,
      trainingCaseId: a.trainingCaseId,
      symptom:
        (a.trainingCase as (TrainingCase & { case?: DiagnosticCase }) | undefined)?.case?.symptom ??
        '',
      status: a.status,
      score: a.score,
      maxScore: a.maxScore,
      startedAt: a.startedAt.toISOString(),
      finishedAt: a.finishedAt?.toISOString() ?? null,
    })),
  };
}

async function findApprentice(actor: Actor, apprenticeId: string): Promise<User> {
  const apprentice = await User.findOne({
    where: { id: apprenticeId, workshopId: actor.workshopId, role: 'apprentice' },
  });
  if (!apprentice) throw notFound('That apprentice');
  return apprentice;
}

export async function listProgress(actor: Actor): Promise<ApprenticeProgress[]> {
  assertCan(actor, 'training.manage');
  const apprentices = await User.findAll({
    where: { workshopId: actor.workshopId, role: 'apprentice', active: true },
    order: [['name', 'ASC']],
  });
  const all = await Promise.all(apprentices.map((a) => progressOf(actor, a)));
  return all.map(({ history: _history, ...progress }) => progress);
}

export async function apprenticeProgress(options: {
  actor: Actor;
  apprenticeId: string;
}): Promise<ApprenticeProgressDetail> {
  assertCan(options.actor, 'training.manage');
  return progressOf(options.actor, await findApprentice(options.actor, options.apprenticeId));
}

/** The caller's own progress: an apprentice never reads another's. */
export async function myProgress(actor: Actor): Promise<ApprenticeProgressDetail> {
  assertCan(actor, 'training.learn');
  const me = await User.findOne({ where: { id: actor.userId, workshopId: actor.workshopId } });
  if (!me) throw notFound('Your account');
  return progressOf(actor, me);
}

export async function signOffCourse(options: {
  actor: Actor;
  courseId: string;
  request: SignOffRequest;
}) {
  const { actor, courseId, request } = options;
  assertCan(actor, 'training.manage');
  const course = await TrainingCourse.findOne({
    where: { id: courseId, workshopId: actor.workshopId },
  });
  if (!course) throw notFound('That course');
  const apprentice = await User.findOne({
    where: { id: request.apprenticeId, workshopId: actor.workshopId },
  });
  if (!apprentice) throw notFound('That apprentice');
  if (apprentice.role !== 'apprentice')
    throw new AppError('validation_failed', `${apprentice.name} is not an apprentice.`, {
      apprenticeId: 'Choose an apprentice.',
    });
  if (course.apprenticeId !== null && course.apprenticeId !== apprentice.id)
    throw conflict(`“${course.title}” is a course for another apprentice.`);
  try {
    const signed = await TrainingSignOff.create({
      courseId: course.id,
      apprenticeId: apprentice.id,
      workshopId: actor.workshopId,
      signedBy: actor.userId,
      note: request.note ?? null,
    });
    const signer = await User.findByPk(actor.userId, { attributes: ['id', 'name'] });
    return {
      signedAt: signed.signedAt.toISOString(),
      signedBy: { id: actor.userId, name: signer?.name ?? 'Unknown' },
      note: signed.note,
    };
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw conflict(`${apprentice.name} is already signed off for “${course.title}”.`);
    throw error;
  }
}
