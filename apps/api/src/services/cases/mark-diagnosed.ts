// The technician's "diagnosed": only when the walk stands on an outcome, findings exist and
// every step on the way that requires a photo or log has one.
import { Finding } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError } from '../../errors';
import { compiledTreeOf } from '../../lib/compiled-trees';
import { isOpenToWalking } from '../../policies/case-policy';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { appendCaseEvent } from './append-case-event';
import { findCase } from './find-case';
import { assertEvidenceOnPath } from './required-evidence';
import { walkOf } from './walk-state';

export async function markDiagnosed(options: { actor: Actor; caseId: string }) {
  const { actor, caseId } = options;
  assertCan(actor, 'cases.walk');
  await withTransaction(async (transaction) => {
    const kase = await findCase({ actor, caseId, transaction, lock: true });
    if (!isOpenToWalking(kase)) {
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
    if (!kase.treeVersion) throw new Error('markDiagnosed needs the tree version loaded.');
    await assertEvidenceOnPath({
      tree: compiledTreeOf(kase.treeVersion),
      caseId: kase.id,
      path: walk.path,
      transaction,
    });
    await appendCaseEvent({
      actor,
      kase,
      kind: 'status',
      nodeId: walk.currentNodeId,
      payload: { from: kase.status, to: 'diagnosed' },
      caseChanges: { status: 'diagnosed', diagnosedAt: new Date() },
      transaction,
    });
  });
}
