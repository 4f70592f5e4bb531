// Loads what every repair-order operation starts from: a diagnosed (or closed) case of the
// caller's workshop with its vehicle, customer, tree version and technician, and its findings.
import type { Transaction } from 'sequelize';
import { Finding, User, Workshop } from '../../db/models/index';
import type { DiagnosticCase } from '../../db/models/index';
import { AppError, notFound } from '../../errors';
import { isDiagnosisFinished } from '../../policies/case-policy';
import type { Actor } from '../../policies/permissions';
import { findCase } from '../cases/find-case';

export interface RepairOrderCase {
  kase: DiagnosticCase;
  finding: Finding;
  workshop: Workshop;
  technician: User | null;
}

export async function loadRepairOrderCase(options: {
  actor: Actor;
  caseId: string;
  transaction?: Transaction;
  lock?: boolean;
}): Promise<RepairOrderCase> {
  const { actor, transaction } = options;
  const kase = await findCase({ ...options, withDetails: true });
  if (!isDiagnosisFinished(kase))
    throw new AppError(
      'conflict',
      'This case is not diagnosed yet: the technician is still working on its findings.',
    );
  const [finding, workshop, creator] = await Promise.all([
    Finding.findOne({ where: { caseId: kase.id }, transaction }),
    Workshop.findByPk(actor.workshopId, { transaction }),
    kase.assignee ? null : User.findByPk(kase.createdBy, { transaction }),
  ]);
  if (!finding || !workshop) throw notFound('The findings of that case');
  return { kase, finding, workshop, technician: kase.assignee ?? creator };
}
