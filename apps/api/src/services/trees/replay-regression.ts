// Regression replay: the recorded answers of the tree's finished cases, from any earlier version,
// replayed against a draft. Each case reaches the same outcome, a different one, stops short of
// any outcome, or diverges at a step that no longer fits — said where and why.
import { Op } from 'sequelize';
import type { Transaction } from 'sequelize';
import type { RegressionReport, RegressionResult, RegressionVerdict } from '@heatpath/contracts';
import { replayWalk, currentNodeIdOf } from '@heatpath/fault-tree';
import type { CompiledTree } from '@heatpath/fault-tree';
import { DiagnosticCase, RegressionCase, TreeVersion } from '../../db/models/index';
import type { Actor } from '../../policies/permissions';
import { caseReference } from '../cases/case-search-text';
import { walkEventsOf } from '../cases/walk-state';

function titleIn(definition: unknown, nodeId: string | null): string | null {
  if (!nodeId) return null;
  const node = (definition as { nodes?: Record<string, { title?: unknown }> } | null)?.nodes?.[
    nodeId
  ];
  return typeof node?.title === 'string' ? node.title : null;
}

export async function replayRegression(options: {
  actor: Actor;
  treeId: string;
  draft: TreeVersion;
  compiled: CompiledTree;
  onlyRegressionSet?: boolean;
  transaction?: Transaction;
}): Promise<RegressionReport> {
  const { actor, treeId, draft, compiled, transaction } = options;
  const versions = await TreeVersion.findAll({
    where: { treeId, workshopId: actor.workshopId, status: { [Op.ne]: 'draft' } },
    attributes: ['id', 'version', 'definition'],
    transaction,
  });
  const byId = new Map(versions.map((v) => [v.id, v]));
  const set = new Set(
    (
      await RegressionCase.findAll({ where: { treeId, workshopId: actor.workshopId }, transaction })
    ).map((r) => r.caseId),
  );
  const cases = await DiagnosticCase.findAll({
    where: {
      workshopId: actor.workshopId,
      treeVersionId: { [Op.in]: [...byId.keys()] },
      ...(options.onlyRegressionSet
        ? { id: { [Op.in]: [...set] } }
        : { status: { [Op.in]: ['diagnosed', 'closed'] } }),
    },
    order: [['number', 'ASC']],
    transaction,
  });
  const results: RegressionResult[] = [];
  for (const kase of cases) {
    const from = byId.get(kase.treeVersionId);
    const events = await walkEventsOf(kase.id, transaction);
    const replay = replayWalk(compiled, events);
    const reached = currentNodeIdOf(replay.snapshot);
    const reachedOutcome = compiled.nodes.get(reached)?.kind === 'outcome' ? reached : null;
    let verdict: RegressionVerdict;
    if (replay.divergence) verdict = 'diverged';
    else if (!reachedOutcome) verdict = 'no-outcome';
    else verdict = reachedOutcome === kase.outcomeNodeId ? 'same-outcome' : 'different-outcome';
    results.push({
      caseId: kase.id,
      reference: caseReference(kase.number),
      fromVersion: from?.version ?? 0,
      inRegressionSet: set.has(kase.id),
      expectedOutcome: kase.outcomeNodeId,
      expectedOutcomeTitle: titleIn(from?.definition, kase.outcomeNodeId),
      verdict,
      newOutcome: replay.divergence ? null : reachedOutcome,
      newOutcomeTitle: replay.divergence ? null : titleIn(draft.definition, reachedOutcome),
      divergence: replay.divergence
        ? {
            step: replay.divergence.divergedAt + 1,
            nodeId: replay.divergence.nodeId,
            nodeTitle: titleIn(draft.definition, replay.divergence.nodeId),
            reason: replay.divergence.reason,
          }
        : !reachedOutcome
          ? {
              // Every recorded answer still fits, but the draft asks more than the case answered.
              step: events.length + 1,
              nodeId: reached,
              nodeTitle: titleIn(draft.definition, reached),
              reason:
                'Every recorded answer still fits, but the draft asks this step next, which the case never answered, so no finding is reached.',
            }
          : null,
    });
  }
  const summary: Record<RegressionVerdict, number> = {
    'same-outcome': 0,
    'different-outcome': 0,
    diverged: 0,
    'no-outcome': 0,
  };
  for (const r of results) summary[r.verdict] += 1;
  return { draftRevision: draft.revision, results, summary };
}
