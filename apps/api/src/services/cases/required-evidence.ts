// The server's side of required evidence: an answer at a step that asks for a photo or log with
// `required: true` is refused until the case holds one on that step, and so is "Mark diagnosed"
// over a walk that passed such a step without it. Steps back are never refused.
import type { Transaction } from 'sequelize';
import { evidenceNeededMessage, unmetEvidence } from '@heatpath/contracts';
import type { CompiledTree, WalkEvent } from '@heatpath/fault-tree';
import { Attachment } from '../../db/models/index';
import { unmetRequirement } from '../../errors';

const reason = 'evidence-required';

const needsEvidence = (tree: CompiledTree, nodeId: string): boolean => {
  const node = tree.nodes.get(nodeId);
  return node !== undefined && node.kind !== 'outcome' && node.evidence.some((r) => r.required);
};

async function evidenceOf(caseId: string, nodeIds: string[], transaction: Transaction) {
  return Attachment.findAll({
    where: { caseId, nodeId: nodeIds },
    attributes: ['kind', 'nodeId'],
    transaction,
  });
}

/** Refuses (422) an answer at a step whose required evidence the case does not hold yet. */
export async function assertEvidenceForAnswer(options: {
  tree: CompiledTree;
  caseId: string;
  event: WalkEvent;
  transaction: Transaction;
}): Promise<void> {
  const { tree, caseId, event, transaction } = options;
  if (event.type === 'walk.back' || !needsEvidence(tree, event.nodeId)) return;
  const held = await evidenceOf(caseId, [event.nodeId], transaction);
  const unmet = unmetEvidence(tree.nodes.get(event.nodeId), event.nodeId, held);
  if (unmet.length > 0) throw unmetRequirement(evidenceNeededMessage(unmet, 'answer'), reason);
}

/** Refuses (422) marking a case diagnosed while a step on its walk lacks its required evidence. */
export async function assertEvidenceOnPath(options: {
  tree: CompiledTree;
  caseId: string;
  path: readonly { nodeId: string; title: string }[];
  transaction: Transaction;
}): Promise<void> {
  const { tree, caseId, transaction } = options;
  const steps = options.path.filter((step) => needsEvidence(tree, step.nodeId));
  if (steps.length === 0) return;
  const held = await evidenceOf(
    caseId,
    steps.map((s) => s.nodeId),
    transaction,
  );
  for (const step of steps) {
    const unmet = unmetEvidence(tree.nodes.get(step.nodeId), step.nodeId, held);
    if (unmet.length > 0)
      throw unmetRequirement(
        evidenceNeededMessage(unmet, 'mark the case diagnosed', step.title),
        reason,
      );
  }
}
