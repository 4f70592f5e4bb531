// The lead's side of marking: finished cases that could be taught from, the training cases
// already marked, marking one (with a teaching note and what to hide) and changing or
// withdrawing it later. A withdrawn case leaves the casebook; attempts made on it are kept.
import { Op, UniqueConstraintError } from 'sequelize';
import type {
  MarkTrainingCaseRequest,
  TrainingCandidate,
  TrainingCaseSummary,
  UpdateTrainingCaseRequest,
} from '@heatpath/contracts';
import {
  Attachment,
  CaseEvent,
  DiagnosticCase,
  TrainingAttempt,
  TrainingCase,
  TreeVersion,
  User,
  Vehicle,
} from '../../db/models/index';
import { AppError, conflict, notFound } from '../../errors';
import { compiledTreeOf } from '../../lib/compiled-trees';
import { finishedCaseStatuses as finishedStatuses } from '../../policies/case-policy';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { caseReference } from '../cases/case-search-text';
import { trainingCaseIncludes } from './find-training-case';
import type { LoadedTrainingCase } from './find-training-case';

function outcomeTitle(kase: DiagnosticCase & { treeVersion?: TreeVersion }): string {
  if (!kase.treeVersion || !kase.outcomeNodeId) return 'No outcome';
  return compiledTreeOf(kase.treeVersion).nodes.get(kase.outcomeNodeId)?.title ?? 'No outcome';
}

async function present(training: LoadedTrainingCase): Promise<TrainingCaseSummary> {
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

async function reload(actor: Actor, id: string) {
  const found = await TrainingCase.findOne({
    where: { id, workshopId: actor.workshopId },
    include: trainingCaseIncludes,
  });
  if (!found) throw notFound('That training case');
  return found as LoadedTrainingCase;
}

export async function listTrainingCases(actor: Actor): Promise<TrainingCaseSummary[]> {
  assertCan(actor, 'training.manage');
  const rows = (await TrainingCase.findAll({
    where: { workshopId: actor.workshopId },
    include: trainingCaseIncludes,
    order: [['createdAt', 'DESC']],
  })) as LoadedTrainingCase[];
  return Promise.all(rows.map(present));
}

export async function listCandidates(actor: Actor): Promise<TrainingCandidate[]> {
  assertCan(actor, 'training.manage');
  const marked = await TrainingCase.findAll({
    where: { workshopId: actor.workshopId },
    attributes: ['caseId'],
  });
  const cases = await DiagnosticCase.findAll({
    where: {
      workshopId: actor.workshopId,
      status: { [Op.in]: finishedStatuses },
      outcomeNodeId: { [Op.ne]: null },
      ...(marked.length > 0 ? { id: { [Op.notIn]: marked.map((m) => m.caseId) } } : {}),
    },
    include: [
      { model: Vehicle, as: 'vehicle' },
      { model: TreeVersion, as: 'treeVersion' },
    ],
    order: [['diagnosedAt', 'DESC NULLS LAST']],
    limit: 100,
  });
  const ids = cases.map((c) => c.id);
  const [notes, photos] = await Promise.all([
    ids.length
      ? CaseEvent.findAll({
          where: { caseId: { [Op.in]: ids }, kind: 'note' },
          order: [['seq', 'ASC']],
        })
      : [],
    ids.length
      ? Attachment.findAll({
          where: { caseId: { [Op.in]: ids }, kind: 'photo' },
          order: [['createdAt', 'ASC']],
        })
      : [],
  ]);
  return cases.map((kase) => ({
    caseId: kase.id,
    reference: caseReference(kase.number),
    symptom: kase.symptom,
    treeTitle: kase.treeVersion ? compiledTreeOf(kase.treeVersion).definition.title : '',
    complaint: kase.complaint,
    vehicle: [kase.vehicle?.make, kase.vehicle?.model, kase.vehicle?.year]
      .filter(Boolean)
      .join(' '),
    outcomeTitle: outcomeTitle(kase),
    diagnosedAt: kase.diagnosedAt?.toISOString() ?? null,
    notes: notes
      .filter((n) => n.caseId === kase.id)
      .map((n) => ({ id: n.id, text: String((n.payload as { text?: unknown }).text ?? '') })),
    photos: photos
      .filter((p) => p.caseId === kase.id)
      .map((p) => ({
        id: p.id,
        name: p.originalName,
        thumbnailUrl: p.thumbnailKey ? `/api/cases/${kase.id}/attachments/${p.id}/thumbnail` : null,
      })),
  }));
}

async function assertPhotosOfCase(caseId: string, ids: readonly string[]) {
  if (ids.length === 0) return;
  const count = await Attachment.count({ where: { caseId, id: { [Op.in]: [...ids] } } });
  if (count !== new Set(ids).size)
    throw new AppError('validation_failed', 'Some of the photos to hide are not on this case.', {
      hiddenAttachmentIds: 'Choose photos of this case only.',
    });
}

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
    return present(await reload(actor, created.id));
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw conflict(`Case ${caseReference(kase.number)} is already in the casebook.`);
    throw error;
  }
}

export async function updateTrainingCase(options: {
  actor: Actor;
  trainingCaseId: string;
  request: UpdateTrainingCaseRequest;
}): Promise<TrainingCaseSummary> {
  const { actor, trainingCaseId, request } = options;
  assertCan(actor, 'training.manage');
  const training = await reload(actor, trainingCaseId);
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
  return present(await reload(actor, trainingCaseId));
}
