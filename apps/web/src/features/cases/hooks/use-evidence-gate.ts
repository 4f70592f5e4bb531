// Required evidence, checked on the tablet with the API's own rule (contracts' unmetEvidence):
// a step that requires a photo or log cannot be answered until the case holds one on that step
// or a photo of it waits in the outbox; the case cannot be marked diagnosed while a step on its
// path lacks its evidence, or while anything still waits to be sent.
import type { CaseDetail } from '@heatpath/contracts';
import type {
  CompiledTree,
  EvidenceRequest,
  NodeView,
  TreeNode,
  WalkSummary,
} from '@heatpath/fault-tree';
import { useMemo } from 'react';
import { isPending, useOutbox, useQueuedPhotos } from '../../../lib/outbox';

// TODO(issue 16): the same rule is in contracts' required-evidence.ts (the API's); use it from
// there once it is committed.
interface EvidenceAtHand {
  kind: string;
  nodeId: string | null;
}

function unmetEvidence(
  node: TreeNode | undefined,
  nodeId: string,
  attachments: readonly EvidenceAtHand[],
): EvidenceRequest[] {
  if (!node || node.kind === 'outcome') return [];
  return node.evidence.filter(
    (request) =>
      request.required && !attachments.some((a) => a.nodeId === nodeId && a.kind === request.kind),
  );
}

const kindWords: Record<EvidenceRequest['kind'], string> = { photo: 'a photo', log: 'a log' };

function evidenceNeededMessage(
  unmet: readonly EvidenceRequest[],
  then: 'answer' | 'mark the case diagnosed',
  stepTitle?: string,
): string {
  const kinds = [...new Set(unmet.map((r) => kindWords[r.kind]))].join(' and ');
  const labels = unmet.map((r) => r.label).join('; ');
  const step = stepTitle === undefined ? 'This step' : `The step “${stepTitle}”`;
  return `${step} needs ${kinds} first: ${labels}. Add ${unmet.length > 1 ? 'them' : 'it'}, then ${then}.`;
}

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
