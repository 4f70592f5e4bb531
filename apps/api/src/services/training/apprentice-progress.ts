// Apprentices' progress as the lead reads it (and each apprentice reads their own): cases
// reviewed, attempts, the average of their best scores, the steps they most often got wrong and
// each course's completion.
import { Op } from 'sequelize';
import type { ApprenticeProgressDetail, WeakSpot } from '@heatpath/contracts';
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
import type { Actor } from '../../policies/permissions';
import { presentSignOff } from '../../presenters/training.presenter';

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

/** One apprentice's progress: attempts, best scores, weak spots and each course's completion. */
export async function loadApprenticeProgress(options: {
  actor: Actor;
  apprentice: User;
}): Promise<ApprenticeProgressDetail> {
  const { actor, apprentice } = options;
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
        signOff: signOff ? presentSignOff(signOff) : null,
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
