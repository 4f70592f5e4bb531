// The lead marks a finished case for training, with a teaching note and what to hide.
import { UniqueConstraintError } from 'sequelize';
import type { MarkTrainingCaseRequest, TrainingCaseSummary } from '@heatpath/contracts';
import { DiagnosticCase, TrainingCase } from '../../db/models/index';
import { conflict, notFound } from '../../errors';
import { finishedCaseStatuses as finishedStatuses } from '../../policies/case-policy';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { caseReference } from '../cases/case-search-text';
import {
  assertPhotosOfCase,
  loadTrainingCase,
  summariseTrainingCase,
} from './training-case-summary';

export async function markTrainingCase(options: {
  actor: Actor;
  request: MarkTrainingCaseRequest;
}): Promise<TrainingCaseSummary> {
  const { actor, request } = options;
  assertCan(actor, 'training.manage');
  const kase = await DiagnosticCase.findOne({
    where: { id: request.caseId, workshopId: actor.workshopId },
  });
  if (!kase) throw notFound('That case');
  if (
    !finishedStatuses.includes(kase.status as (typeof finishedStatuses)[number]) ||
    !kase.outcomeNodeId
  )
    throw conflict(
      `Case ${caseReference(kase.number)} is not finished yet; only a diagnosed case can be used for training.`,
    );
  await assertPhotosOfCase(kase.id, request.hiddenAttachmentIds);
  try {
    const created = await TrainingCase.create({
      workshopId: actor.workshopId,
      caseId: kase.id,
      teachingNote: request.teachingNote,
      difficulty: request.difficulty,
      hideNotes: request.hideNotes,
      hiddenAttachmentIds: [...new Set(request.hiddenAttachmentIds)],
      markedBy: actor.userId,
    });
    return summariseTrainingCase(await loadTrainingCase({ actor, id: created.id }));
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw conflict(`Case ${caseReference(kase.number)} is already in the casebook.`);
    throw error;
  }
}
