// A photo of a training case as learners may see it: a photo of the case's own, not hidden by
// the lead, in the actor's workshop.
import { Attachment } from '../../db/models/index';
import { notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';
import { findTrainingCase } from './find-training-case';

export async function findTrainingPhoto(options: {
  actor: Actor;
  trainingCaseId: string;
  attachmentId: string;
}): Promise<Attachment> {
  const { actor, trainingCaseId, attachmentId } = options;
  const training = await findTrainingCase({ actor, trainingCaseId, forLearner: true });
  const photo = training.hiddenAttachmentIds.includes(attachmentId)
    ? null
    : await Attachment.findOne({
        where: {
          id: attachmentId,
          caseId: training.caseId,
          workshopId: actor.workshopId,
          kind: 'photo',
        },
      });
  if (!photo) throw notFound('That photo');
  return photo;
}
