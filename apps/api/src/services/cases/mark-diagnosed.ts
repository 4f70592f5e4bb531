// The technician's "diagnosed": only when the walk stands on an outcome and findings exist.
import { CaseEvent, Finding } from '../../db/models/index';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findCase } from './find-case';
import { walkOf } from './walk-state';

export async function markDiagnosed(options: { actor: Actor; caseId: string }) {
  const { actor, caseId } = options;
  assertCan(actor, 'cases.walk');
  const sequelize = CaseEvent.sequelize;
  if (!sequelize) throw new Error('Models are not initialised.');
  await sequelize.transaction(async (transaction) => {
    const kase = await findCase({ actor, caseId, transaction, lock: true });
    if (kase.status === 'diagnosed' || kase.status === 'closed') {
      throw new AppError('conflict', 'This case is already marked diagnosed.');
    }
    const walk = await walkOf(kase, transaction);
    if (walk.status !== 'reached-outcome') {
      throw new AppError(
        'conflict',
        'The walk has not reached a finding yet; finish the checks first.',
      );
    }
    const finding = await Finding.findOne({ where: { caseId: kase.id }, transaction });
    if (!finding || finding.outcomeNodeId !== walk.currentNodeId) {
      throw new AppError(
        'conflict',
        'The findings do not match the outcome reached; reload the case.',
      );
    }
    await CaseEvent.create(
      {
        caseId: kase.id,
        workshopId: actor.workshopId,
        seq: kase.eventCount + 1,
        kind: 'status',
        nodeId: walk.currentNodeId,
        payload: { from: kase.status, to: 'diagnosed' },
        idempotencyKey: null,
        actorId: actor.userId,
      },
      { transaction },
    );
    await kase.update(
      { status: 'diagnosed', diagnosedAt: new Date(), eventCount: kase.eventCount + 1 },
      { transaction },
    );
  });
}
