// Publishing a draft: only a clean draft; the regression set is replayed first, and if any of
// its cases would now reach another outcome the lead must confirm, and the confirmation is
// recorded with the version. The published version is then frozen by the database.
import type { PublishDraftRequest } from '@heatpath/contracts';
import { compileTree } from '@heatpath/fault-tree';
import { AppError } from '../../errors';
import type { PublishConfirmation } from '../../db/models/tree-version';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findDraft, findTree } from './find-tree';
import { replayRegression } from './replay-regression';
import { withTransaction } from '../../db/with-transaction';

/** Why a publish came back 409, as `error.reason`. */
export const publishRefusals = {
  staleRevision: 'stale_revision',
  draftHasProblems: 'draft_has_problems',
  outcomesChanged: 'regression_outcomes_changed',
} as const;

export async function publishDraft(options: {
  actor: Actor;
  treeId: string;
  input: PublishDraftRequest;
}) {
  const { actor, treeId, input } = options;
  assertCan(actor, 'trees.edit');
  return withTransaction(async (transaction) => {
    await findTree({ actor, treeId, transaction, lock: true });
    const draft = await findDraft({ actor, treeId, transaction, lock: true });
    if (draft.revision !== input.revision) {
      throw new AppError(
        'conflict',
        `The draft changed after you reviewed it (now revision ${draft.revision}); review it again before publishing.`,
        undefined,
        publishRefusals.staleRevision,
      );
    }
    const compiled = compileTree(draft.definition);
    if (!compiled.ok) {
      throw new AppError(
        'conflict',
        `The draft has ${compiled.problems.length} problem(s) to fix before it can be published: ${compiled.problems[0]?.message ?? ''}`,
        Object.fromEntries(
          compiled.problems
            .slice(0, 50)
            .map((p, i) => [p.nodeId ? `${p.nodeId}.${i}` : `tree.${i}`, p.message]),
        ),
        publishRefusals.draftHasProblems,
      );
    }
    const report = await replayRegression({
      actor,
      treeId,
      draft,
      compiled: compiled.tree,
      onlyRegressionSet: true,
      transaction,
    });
    const changed = report.results.filter((r) => r.verdict !== 'same-outcome');
    let confirmation: PublishConfirmation | null = null;
    if (changed.length > 0) {
      if (!input.confirmChangedOutcomes) {
        throw new AppError(
          'conflict',
          `${changed.length} case(s) in the regression set would no longer reach the outcome they reached (${changed.map((c) => c.reference).join(', ')}). Confirm to publish anyway.`,
          Object.fromEntries(changed.map((c) => [c.reference, c.verdict])),
          publishRefusals.outcomesChanged,
        );
      }
      confirmation = {
        confirmedBy: actor.userId,
        confirmedAt: new Date().toISOString(),
        changedCases: changed.map((c) => ({
          caseId: c.caseId,
          reference: c.reference,
          from: c.expectedOutcome,
          to: c.newOutcome,
        })),
      };
    }
    return draft.update(
      {
        status: 'published',
        publishedAt: new Date(),
        publishedBy: actor.userId,
        changeNote: input.changeNote,
        publishConfirmation: confirmation,
      },
      { transaction },
    );
  });
}
