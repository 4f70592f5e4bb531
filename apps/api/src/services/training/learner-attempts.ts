// A learner's own attempts on training cases: how many, and the best finished score of each.
import { Op } from 'sequelize';
import type { CasebookEntry, TrainingScore as Score } from '@heatpath/contracts';
import { TrainingAttempt } from '../../db/models/index';
import type { Actor } from '../../policies/permissions';
import type { TrainingStory } from './training-story';

function better(a: Score | null, b: Score): Score {
  if (a === null) return b;
  const ratio = (s: Score) => (s.maxScore === 0 ? 1 : s.score / s.maxScore);
  return ratio(b) > ratio(a) ? b : a;
}

/** The caller's attempts and best score on each of the given training cases. */
export async function countLearnerAttempts(options: { actor: Actor; trainingCaseIds: string[] }) {
  const { actor, trainingCaseIds } = options;
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
export async function getLearnerEntry(options: {
  actor: Actor;
  story: TrainingStory;
}): Promise<CasebookEntry> {
  const { actor, story } = options;
  const mine = (await countLearnerAttempts({ actor, trainingCaseIds: [story.entry.id] })).get(
    story.entry.id,
  );
  return { ...story.entry, attempts: mine?.attempts ?? 0, bestScore: mine?.best ?? null };
}
