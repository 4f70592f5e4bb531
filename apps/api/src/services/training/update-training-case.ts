// The lead changes a training case later, or withdraws it (a withdrawn case leaves the
// casebook; attempts made on it are kept).
import type { TrainingCaseSummary, UpdateTrainingCaseRequest } from '@heatpath/contracts';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import {
  assertPhotosOfCase,
  loadTrainingCase,
  summariseTrainingCase,
} from './training-case-summary';

export async function updateTrainingCase(options: {
  actor: Actor;
  trainingCaseId: string;
  request: UpdateTrainingCaseRequest;
}): Promise<TrainingCaseSummary> {
  const { actor, trainingCaseId, request } = options;
  assertCan(actor, 'training.manage');
  const training = await loadTrainingCase({ actor, id: trainingCaseId });
  if (request.hiddenAttachmentIds)
    await assertPhotosOfCase(training.caseId, request.hiddenAttachmentIds);
  await training.update({
    ...(request.teachingNote !== undefined ? { teachingNote: request.teachingNote } : {}),
    ...(request.difficulty !== undefined ? { difficulty: request.difficulty } : {}),
    ...(request.hideNotes !== undefined ? { hideNotes: request.hideNotes } : {}),
    ...(request.hiddenAttachmentIds !== undefined
      ? { hiddenAttachmentIds: [...new Set(request.hiddenAttachmentIds)] }
      : {}),
    ...(request.withdrawn !== undefined ? { withdrawn: request.withdrawn } : {}),
  });
  return summariseTrainingCase(await loadTrainingCase({ actor, id: trainingCaseId }));
}
