// Required evidence: a step whose `evidence` lists a request with `required: true` is answered
// only once the case holds an attachment of that kind (photo or log) on that step. The API
// refuses such an answer (and "Mark diagnosed" over such a step) with these words; the case page
// uses the same functions to say why its answer buttons wait.
import type { EvidenceRequest, TreeNode } from '@heatpath/fault-tree';

/** What the check needs of an attachment, stored or waiting to be sent. */
export interface EvidenceAtHand {
  kind: string;
  nodeId: string | null;
}

/** The step's required evidence requests that no attachment of that kind on the step meets yet. */
export function unmetEvidence(
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

/**
 * Why the step cannot be answered yet, in a technician's words: "This step needs a photo first:
 * Photo of the test fluid. Add it, then answer." With `stepTitle` the step is named (for "Mark
 * diagnosed", which is pressed on a later screen).
 */
export function evidenceNeededMessage(
  unmet: readonly EvidenceRequest[],
  then: 'answer' | 'mark the case diagnosed',
  stepTitle?: string,
): string {
  const kinds = [...new Set(unmet.map((r) => kindWords[r.kind]))].join(' and ');
  const labels = unmet.map((r) => r.label).join('; ');
  const step = stepTitle === undefined ? 'This step' : `The step “${stepTitle}”`;
  return `${step} needs ${kinds} first: ${labels}. Add ${unmet.length > 1 ? 'them' : 'it'}, then ${then}.`;
}
