// A training case as the lead's list shows it, and the checks marking and editing share.
import { Op } from 'sequelize';
import type { TrainingCaseSummary } from '@heatpath/contracts';
import { Attachment, TrainingAttempt, TrainingCase, User } from '../../db/models/index';
import type { DiagnosticCase, TreeVersion } from '../../db/models/index';
import { AppError, notFound } from '../../errors';
import { compiledTreeOf } from '../../lib/compiled-trees';
import type { Actor } from '../../policies/permissions';
import { caseReference } from '../cases/case-search-text';
import { trainingCaseIncludes } from './find-training-case';
import type { LoadedTrainingCase } from './find-training-case';

export function outcomeTitle(kase: DiagnosticCase & { treeVersion?: TreeVersion }): string {
  if (!kase.treeVersion || !kase.outcomeNodeId) return 'No outcome';
  return compiledTreeOf(kase.treeVersion).nodes.get(kase.outcomeNodeId)?.title ?? 'No outcome';
}

/** The summary of a loaded training case: who marked it and how many attempts it has. */
export async function summariseTrainingCase(
  training: LoadedTrainingCase,
): Promise<TrainingCaseSummary> {
  const [marker, attempts] = await Promise.all([
    User.findByPk(training.markedBy, { attributes: ['id', 'name'] }),
    TrainingAttempt.count({ where: { trainingCaseId: training.id } }),
  ]);
  const kase = training.case;
  return {
    id: training.id,
    caseId: kase.id,
    caseReference: caseReference(kase.number),
    symptom: kase.symptom,
    treeTitle: compiledTreeOf(kase.treeVersion).definition.title,
    outcomeTitle: outcomeTitle(kase),
    difficulty: training.difficulty,
    teachingNote: training.teachingNote,
    hideNotes: training.hideNotes,
    hiddenAttachmentIds: [...training.hiddenAttachmentIds],
    withdrawn: training.withdrawn,
    markedBy: { id: training.markedBy, name: marker?.name ?? 'Unknown' },
    createdAt: training.createdAt.toISOString(),
    attempts,
  };
}

/** The workshop's training case (withdrawn or not) with everything a summary reads. */
export async function loadTrainingCase(options: { actor: Actor; id: string }) {
  const { actor, id } = options;
  const found = await TrainingCase.findOne({
    where: { id, workshopId: actor.workshopId },
    include: trainingCaseIncludes,
  });
  if (!found) throw notFound('That training case');
  return found as LoadedTrainingCase;
}

/** Refuses photos to hide that are not the case's own. */
export async function assertPhotosOfCase(caseId: string, ids: readonly string[]) {
  if (ids.length === 0) return;
  const count = await Attachment.count({ where: { caseId, id: { [Op.in]: [...ids] } } });
  if (count !== new Set(ids).size)
    throw new AppError('validation_failed', 'Some of the photos to hide are not on this case.', {
      hiddenAttachmentIds: 'Choose photos of this case only.',
    });
}
