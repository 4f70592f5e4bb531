// Loads one case of the caller's workshop (or 404), optionally locked for the rest of a
// transaction so concurrent answers to the same case queue up instead of racing.
import type { Transaction } from 'sequelize';
import { Customer, DiagnosticCase, TreeVersion, User, Vehicle } from '../../db/models/index';
import { notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';

export async function findCase(options: {
  actor: Actor;
  caseId: string;
  transaction?: Transaction;
  lock?: boolean;
  withDetails?: boolean;
  /** Only the case row itself (with lock, the locked row): no tree definition is read. */
  bare?: boolean;
}): Promise<DiagnosticCase> {
  const { actor, caseId, transaction, lock, withDetails } = options;
  if (lock && options.bare) {
    const locked = await DiagnosticCase.findOne({
      where: { id: caseId, workshopId: actor.workshopId },
      transaction,
      lock: transaction?.LOCK.UPDATE,
    });
    if (!locked) throw notFound('That case');
    return locked;
  }
  if (lock) {
    // Lock the bare row first: FOR UPDATE cannot apply to the nullable side of outer joins.
    const locked = await DiagnosticCase.findOne({
      where: { id: caseId, workshopId: actor.workshopId },
      transaction,
      lock: transaction?.LOCK.UPDATE,
    });
    if (!locked) throw notFound('That case');
  }
  const found = await DiagnosticCase.findOne({
    where: { id: caseId, workshopId: actor.workshopId },
    include: withDetails
      ? [
          { model: Vehicle, as: 'vehicle', include: [{ model: Customer, as: 'customer' }] },
          { model: Customer, as: 'customer' },
          { model: TreeVersion, as: 'treeVersion' },
          { model: User, as: 'assignee' },
        ]
      : [{ model: TreeVersion, as: 'treeVersion' }],
    transaction,
  });
  if (!found) throw notFound('That case');
  return found;
}
