// Required evidence, checked on the tablet with the API's own rule (contracts' unmetEvidence):
// a step that requires a photo or log cannot be answered until the case holds one on that step
// or a photo of it waits in the outbox; the case cannot be marked diagnosed while a step on its
// path lacks its evidence, or while anything still waits to be sent.
import {
  evidenceNeededMessage,
  unmetEvidence,
  type CaseDetail,
  type EvidenceAtHand,
} from '@heatpath/contracts';
import type { CompiledTree, NodeView, WalkSummary } from '@heatpath/fault-tree';
import { useMemo } from 'react';
import { isPending, useOutbox, useQueuedPhotos } from '../../../lib/outbox';

export function useAnswerBlockedReason(detail: CaseDetail, node: NodeView): string | null {
  const queued = useQueuedPhotos(detail.id, node.id);
  return useMemo(() => {
    const atHand: EvidenceAtHand[] = [
      ...detail.attachments,
      ...queued.map((photo) => ({ kind: 'photo', nodeId: photo.nodeId })),
    ];
    const unmet = unmetEvidence(node, node.id, atHand);
    return unmet.length > 0 ? evidenceNeededMessage(unmet, 'answer') : null;
  }, [detail.attachments, node, queued]);
}

export function useDiagnoseBlockedReason(
  detail: CaseDetail,
  walk: WalkSummary,
  tree: CompiledTree | null,
): string | null {
  const items = useOutbox(detail.id);
  const waiting = items.some(isPending);
  return useMemo(() => {
    if (waiting) return 'Wait until the answers and photos on this tablet are sent.';
    for (const step of walk.path) {
      const unmet = unmetEvidence(tree?.nodes.get(step.nodeId), step.nodeId, detail.attachments);
      if (unmet.length > 0) {
        return evidenceNeededMessage(unmet, 'mark the case diagnosed', step.title);
      }
    }
    return null;
  }, [detail.attachments, tree, waiting, walk.path]);
}
