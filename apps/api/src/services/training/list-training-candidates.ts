// Finished cases the lead could teach from: diagnosed, with an outcome, not yet marked.
import { Op } from 'sequelize';
import type { TrainingCandidate } from '@heatpath/contracts';
import {
  Attachment,
  CaseEvent,
  DiagnosticCase,
  TrainingCase,
  TreeVersion,
  Vehicle,
} from '../../db/models/index';
import { compiledTreeOf } from '../../lib/compiled-trees';
import { finishedCaseStatuses as finishedStatuses } from '../../policies/case-policy';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { caseReference } from '../cases/case-search-text';
import { outcomeTitle } from './training-case-summary';

export async function listTrainingCandidates(options: {
  actor: Actor;
}): Promise<TrainingCandidate[]> {
  const { actor } = options;
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
